import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Peak } from '@ionfolio/chem';
import { searchServiceOf } from '../../app';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';
import { noisyReplicate, publishEntry, seeded, simulatedPeaks, W, withdrawAll } from './identify-test-helpers';

const seed = (Date.now() + 7) % 2 ** 31;
let ctx: TestContext;
let curator: Awaited<ReturnType<typeof signInAs>>;
let reader: Awaited<ReturnType<typeof signInAs>>;
const library: { accession: string; peaks: Peak[] }[] = [];

beforeAll(async () => {
  ctx = await createTestContext({ IDENTIFY_RATE_PER_MINUTE: '100000' });
  const author = await signInAs(ctx, 'contributor');
  curator = await signInAs(ctx, 'curator');
  reader = await signInAs(ctx, 'reader');
  const random = seeded(seed);
  for (let i = 0; i < 10; i++) {
    const peaks = simulatedPeaks(random);
    library.push({ accession: await publishEntry(author.agent, curator.agent, { name: `Batch compound ${seed}-${i} (test)`, formula: 'C21H44O', peaks }), peaks });
  }
}, 120_000);

afterAll(async () => {
  await withdrawAll(curator.agent, library.map((l) => l.accession));
  await searchServiceOf(ctx.app).stop();
  await ctx.close();
}, 60_000);

async function waitForJob(id: string) {
  const t0 = performance.now();
  for (;;) {
    const res = await reader.agent.get(`/api/v1/identify/batch/${id}`).expect(200);
    if (res.body.job.status === 'done' || res.body.job.status === 'failed' || performance.now() - t0 > 30_000) return { ...res.body, ms: performance.now() - t0 };
    await new Promise((r) => setTimeout(r, 100));
  }
}

describe('batch identify', () => {
  it('a JSON batch of 50 runs to completion; best candidates, top 5, CSV; other users cannot see it', async () => {
    const random = seeded(seed + 1);
    const spectra = Array.from({ length: 50 }, (_, i) => ({ name: `unknown ${i + 1}`, peaks: noisyReplicate(library[i % 10]!.peaks, random) }));
    const accepted = await reader.agent.post('/api/v1/identify/batch').set(W).send({ spectra }).expect(202);
    expect(accepted.body.job).toMatchObject({ status: 'queued', total: 50, done: 0 });
    const { job, results, ms } = await waitForJob(accepted.body.job.id);
    console.log(`batch: 50 spectra done in ${ms.toFixed(0)} ms (polled)`);
    expect(job).toMatchObject({ status: 'done', total: 50, done: 50, method: 'composite', edition: 'current' });
    expect(results).toHaveLength(50);
    const right = results.filter((r: { index: number; best: { accession: string } | null }) => r.best?.accession === library[(r.index - 1) % 10]!.accession);
    expect(right.length).toBeGreaterThanOrEqual(48);
    for (const r of results) expect(r.candidates.length).toBeLessThanOrEqual(5);

    const csv = await reader.agent.get(`/api/v1/identify/batch/${job.id}/csv`).expect(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    const lines = csv.text.trim().split('\r\n');
    expect(lines[0]).toBe('unknown,unknown_name,rank,accession,revision,name,formula,nominal_mass,similarity,method,edition,error');
    expect(lines[1]).toMatch(new RegExp(`^1,unknown 1,1,${library[0]!.accession},1,`));

    const listed = (await reader.agent.get('/api/v1/identify/batch').expect(200)).body.jobs.map((j: { id: string }) => j.id);
    expect(listed).toContain(job.id);
    const other = await signInAs(ctx, 'reader');
    await other.agent.get(`/api/v1/identify/batch/${job.id}`).expect(404);
  });

  it('a CSV upload with one spectrum per block and a multi-block JCAMP-DX file become jobs', async () => {
    const block = (name: string, peaks: Peak[]) => `# ${name}\nm/z,intensity\n${peaks.map(([mz, y]) => `${mz},${y}`).join('\n')}\n`;
    const text = [block('first', library[0]!.peaks), block('second', library[1]!.peaks), block('third', library[2]!.peaks)].join('\n');
    const res = await reader.agent.post('/api/v1/identify/batch').set(W).attach('file', Buffer.from(text), 'unknowns.csv').field('method', 'cosine').expect(202);
    const done = await waitForJob(res.body.job.id);
    expect(done.job).toMatchObject({ status: 'done', total: 3, method: 'cosine', fileName: 'unknowns.csv' });
    expect(done.results.map((r: { name: string; best: { accession: string } }) => [r.name, r.best.accession])).toEqual([
      ['first', library[0]!.accession],
      ['second', library[1]!.accession],
      ['third', library[2]!.accession],
    ]);

    const jdx = (title: string, peaks: Peak[]) =>
      `##TITLE=${title}\n##JCAMP-DX=5.01\n##DATA TYPE=MASS SPECTRUM\n##NPOINTS=${peaks.length}\n##PEAK TABLE=(XY..XY)\n${peaks.map(([mz, y]) => `${mz},${y.toFixed(2)}`).join('\n')}\n##END=\n`;
    const file = jdx('alpha', library[3]!.peaks) + jdx('beta', library[4]!.peaks);
    const j = await reader.agent.post('/api/v1/identify/batch').set(W).attach('file', Buffer.from(file), 'run.jdx').expect(202);
    const jd = await waitForJob(j.body.job.id);
    expect(jd.results.map((r: { name: string; best: { accession: string } }) => [r.name, r.best.accession])).toEqual([
      ['alpha', library[3]!.accession],
      ['beta', library[4]!.accession],
    ]);
  });

  it('bad batches answer 4xx naming the problem', async () => {
    const post = () => reader.agent.post('/api/v1/identify/batch').set(W);
    expect((await post().send({ spectra: [] }).expect(400)).body.error.message).toMatch(/spectra/);
    expect((await post().send({ spectra: [{ peaks: [[-1, 5]] }] }).expect(400)).body.error.message).toMatch(/spectra\.0\.peaks\.0\.0/);
    expect((await post().send({ spectra: [{ peaks: [[43, 100]] }], edition: 'none-such-9' }).expect(404)).body.error.message).toMatch(/dition/);
    const binary = Buffer.from([0, 1, 2, 3, 0, 255, 254, 0]);
    expect((await post().attach('file', binary, 'unknowns.csv').expect(400)).body.error.code).toBe('BINARY_FILE');
    await post().attach('file', Buffer.from('hello'), 'picture.png').expect(415);
    const big = Buffer.alloc(21 * 1024 * 1024, 0x31);
    const tooBig = await post().attach('file', big, 'huge.csv');
    expect(tooBig.status).toBe(413);
    const garbled = await post().attach('file', Buffer.from('# a\n43,100\nfoo,bar\n'), 'u.csv').expect(400);
    expect(garbled.body.error.message).toMatch(/block 1/);
  });
});
