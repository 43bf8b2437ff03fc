import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type { Peak } from '@ionfolio/chem';
import { searchServiceOf } from '../../app';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';
import { noisyReplicate, publishEntry, seeded, simulatedPeaks, W, withdrawAll } from './identify-test-helpers';
import { IDENTIFY_CAUTION } from './caution';

// Invented formula for every simulated entry: its nominal mass (312) lies above every simulated peak.
const FORMULA = 'C21H44O';
const ENTRY_COUNT = 32;
const seed = Date.now() % 2 ** 31;

let ctx: TestContext;
let author: Awaited<ReturnType<typeof signInAs>>;
let curator: Awaited<ReturnType<typeof signInAs>>;
let reader: Awaited<ReturnType<typeof signInAs>>;
const published: { accession: string; name: string; peaks: Peak[] }[] = [];

beforeAll(async () => {
  // A high limit here; the 429 test below builds its own app with a low one.
  ctx = await createTestContext({ IDENTIFY_RATE_PER_MINUTE: '100000' });
  author = await signInAs(ctx, 'contributor');
  curator = await signInAs(ctx, 'curator');
  reader = await signInAs(ctx, 'reader');
  const random = seeded(seed);
  for (let i = 0; i < ENTRY_COUNT; i++) {
    const peaks = simulatedPeaks(random);
    const name = `Simulated compound ${seed}-${i} (test)`;
    published.push({ accession: await publishEntry(author.agent, curator.agent, { name, formula: FORMULA, peaks }), name, peaks });
  }
  console.log(`identify tests: ${ENTRY_COUNT} simulated entries published (seed ${seed})`);
}, 180_000);

afterAll(async () => {
  await withdrawAll(curator.agent, published.map((p) => p.accession));
  await searchServiceOf(ctx.app).stop();
  await ctx.close();
}, 60_000);

const identify = (body: object) => reader.agent.post('/api/v1/identify').set(W).send(body);

describe('POST /api/v1/identify', () => {
  it('finds every published entry first from its own peaks, with similarity ≥ 99, and answers the whole contract', async () => {
    for (const entry of published) {
      const res = await identify({ peaks: entry.peaks }).expect(200);
      expect(res.body.candidates[0]).toMatchObject({ accession: entry.accession, revision: 1, name: entry.name, formula: FORMULA, nominalMass: 312 });
      expect(res.body.candidates[0].similarity).toBeGreaterThanOrEqual(99);
    }
    const res = await identify({ peaks: published[0]!.peaks, limit: 3 }).expect(200);
    expect(res.body).toMatchObject({ method: 'composite', edition: 'current', caution: IDENTIFY_CAUTION });
    expect(res.body.candidates.length).toBeLessThanOrEqual(3);
    expect(res.body.tookMs).toBeGreaterThanOrEqual(0);
    const [best] = res.body.candidates;
    // Own peaks: every query peak is matched, both sides scaled to the same base peak (the library
    // keeps intensities to 0.01).
    expect(best.matchedPeaks).toHaveLength(published[0]!.peaks.length);
    for (const p of best.matchedPeaks) expect(Math.abs(p.queryRelIntensity - p.libraryRelIntensity)).toBeLessThan(0.01);
    expect(res.body.reading).toHaveProperty('suggestions');
    expect(Number.isInteger(best.similarity * 10)).toBe(true);
  });

  it('with 10 % intensity noise, two peaks dropped and two noise peaks added, keeps ≥ 95 % first', async () => {
    const random = seeded(seed + 1);
    let first = 0;
    for (const entry of published) {
      const res = await identify({ peaks: noisyReplicate(entry.peaks, random) }).expect(200);
      if (res.body.candidates[0]?.accession === entry.accession) first++;
    }
    const rate = first / published.length;
    console.log(`identify: noisy replicate first for ${first}/${published.length} = ${(100 * rate).toFixed(1)} % (seed ${seed})`);
    expect(rate).toBeGreaterThanOrEqual(0.95);
  });

  it('each method ranks the exact spectrum first; reverse mode adds reverseSimilarity', async () => {
    const entry = published[5]!;
    for (const method of ['cosine', 'weighted', 'entropy', 'composite']) {
      const res = await identify({ peaks: entry.peaks, method }).expect(200);
      expect(res.body.method).toBe(method);
      expect(res.body.candidates[0].accession).toBe(entry.accession);
    }
    // Reverse: the query holds extra peaks the library spectrum lacks; reverse similarity ignores them.
    const extra = [...entry.peaks, [299.0, 80] as Peak].filter((p, i, all) => all.findIndex((q) => q[0] === p[0]) === i);
    const res = await identify({ peaks: extra, reverse: true }).expect(200);
    const hit = res.body.candidates.find((c: { accession: string }) => c.accession === entry.accession);
    expect(hit.reverseSimilarity).toBeGreaterThan(hit.similarity);
  });

  it('mass filters exclude candidates outside the window', async () => {
    const res = await identify({ peaks: published[0]!.peaks, maxMass: 311 }).expect(200);
    expect(res.body.candidates.map((c: { accession: string }) => c.accession)).not.toContain(published[0]!.accession);
    const kept = await identify({ peaks: published[0]!.peaks, minMass: 312, maxMass: 312, elements: { required: ['O'], forbidden: ['N'] } }).expect(200);
    expect(kept.body.candidates[0].accession).toBe(published[0]!.accession);
    const noO = await identify({ peaks: published[0]!.peaks, elements: { forbidden: ['O'] } }).expect(200);
    expect(noO.body.candidates.map((c: { accession: string }) => c.accession)).not.toContain(published[0]!.accession);
  });

  it('a retention-index window keeps only entries with an index on that column class within the tolerance', async () => {
    const random = seeded(seed + 2);
    const peaks = simulatedPeaks(random);
    const accession = await publishEntry(author.agent, curator.agent, {
      name: `Simulated compound ${seed}-ri (test)`,
      formula: FORMULA,
      peaks,
      retentionIndex: { value: 1234, column: 'polar' },
    });
    published.push({ accession, name: 'ri', peaks });
    await searchServiceOf(ctx.app).library.settled();
    const window = (value: number, column: string) => identify({ peaks, retentionIndex: { value, column, tolerance: 10 } });
    let inside = await window(1240, 'polar');
    for (let i = 0; i < 40 && inside.body.candidates[0]?.accession !== accession; i++) {
      await new Promise((r) => setTimeout(r, 50));
      inside = await window(1240, 'polar');
    }
    expect(inside.body.candidates[0].accession).toBe(accession);
    expect((await window(1260, 'polar')).body.candidates.map((c: { accession: string }) => c.accession)).not.toContain(accession);
    expect((await window(1234, 'non-polar')).body.candidates.map((c: { accession: string }) => c.accession)).not.toContain(accession);
  });

  it('a newly published revision becomes searchable through NOTIFY within 2 s; a withdrawn one leaves', async () => {
    const random = seeded(seed + 3);
    const peaks = simulatedPeaks(random);
    await identify({ peaks }).expect(200);
    const t0 = performance.now();
    const accession = await publishEntry(author.agent, curator.agent, { name: `Simulated compound ${seed}-new (test)`, formula: FORMULA, peaks });
    const publishedAt = performance.now();
    let seenAt = NaN;
    while (performance.now() - publishedAt < 5000) {
      const res = await identify({ peaks, limit: 1 }).expect(200);
      if (res.body.candidates[0]?.accession === accession) {
        seenAt = performance.now();
        break;
      }
      await new Promise((r) => setTimeout(r, 20));
    }
    console.log(`identify: searchable ${(seenAt - publishedAt).toFixed(0)} ms after the publish call returned (${(publishedAt - t0).toFixed(0)} ms to create, submit and publish)`);
    expect(seenAt - publishedAt).toBeLessThan(2000);

    await curator.agent.post(`/api/v1/entries/${accession}/withdraw`).set(W).send({ reason: 'test' }).expect(200);
    const withdrawnAt = performance.now();
    let goneAt = NaN;
    while (performance.now() - withdrawnAt < 5000) {
      const res = await identify({ peaks, limit: 1 }).expect(200);
      if (res.body.candidates[0]?.accession !== accession) {
        goneAt = performance.now();
        break;
      }
      await new Promise((r) => setTimeout(r, 20));
    }
    console.log(`identify: withdrawn entry left the index ${(goneAt - withdrawnAt).toFixed(0)} ms after the call`);
    expect(goneAt - withdrawnAt).toBeLessThan(2000);
  });

  it('bad input answers 4xx naming the problem, never 500', async () => {
    const cases: [object | string, number, RegExp][] = [
      [{ peaks: [] }, 400, /peaks/],
      [{ peaks: [[43, 'NaN']] }, 400, /peaks\.0\.1/],
      ['{"peaks": [[43, NaN]]}', 400, /JSON/],
      [{ peaks: [[-43, 100]] }, 400, /peaks\.0\.0/],
      [{ peaks: [[43, 0]] }, 400, /peaks/],
      [{ peaks: Array.from({ length: 100_000 }, (_, i) => [1 + (i % 4999), 1]) }, 400, /peaks|large/],
      [{ peaks: [[43, 100]], method: 'fancy' }, 400, /method/],
      [{ peaks: [[43, 100]], limit: 0 }, 400, /limit/],
      [{ peaks: [[43, 100]], limit: 101 }, 400, /limit/],
      [{ peaks: [[43, 100]], minMass: 300, maxMass: 100 }, 400, /maxMass/],
      [{ peaks: [[43, 100]], edition: 'no-such-edition-x' }, 404, /edition/],
      [{ peaks: [[43, 100]], retentionIndex: { value: 1000, column: 'polar' } }, 400, /retentionIndex\.tolerance/],
      [{ peaks: [[43, 100]], elements: { required: ['Xx'] } }, 400, /elements\.required\.0/],
    ];
    for (const [body, status, names] of cases) {
      const req = reader.agent.post('/api/v1/identify').set(W);
      const res = typeof body === 'string' ? await req.set('Content-Type', 'application/json').send(body) : await req.send(body);
      expect(res.status, JSON.stringify(res.body).slice(0, 200)).toBeGreaterThanOrEqual(400);
      expect(res.status).toBeLessThan(500);
      if (res.status !== 413) expect(res.status).toBe(status);
      expect(`${res.body.error.message} ${JSON.stringify(res.body.error.details ?? '')}`).toMatch(names);
    }
  });

  it('without a session or key is 401; browser writes without the CSRF header are refused', async () => {
    await request(ctx.app).post('/api/v1/identify').set(W).send({ peaks: [[43, 100]] }).expect(401);
    const res = await reader.agent.post('/api/v1/identify').send({ peaks: [[43, 100]] }).expect(403);
    expect(res.body.error.code).toBe('CSRF');
  });
});

describe('rate limit', () => {
  it('over the per-session limit answers 429 with Retry-After and a JSON error', async () => {
    const limited = await createTestContext({ IDENTIFY_RATE_PER_MINUTE: '3' });
    try {
      const user = await signInAs(limited, 'reader');
      const statuses: number[] = [];
      let last;
      for (let i = 0; i < 5; i++) {
        last = await user.agent.post('/api/v1/identify').set(W).send({ peaks: [[43, 100], [58, 20]] });
        statuses.push(last.status);
      }
      expect(statuses).toEqual([200, 200, 200, 429, 429]);
      expect(Number(last!.headers['retry-after'])).toBeGreaterThanOrEqual(1);
      expect(last!.body.error.code).toBe('RATE_LIMITED');
      // Another session has its own bucket.
      const other = await signInAs(limited, 'reader');
      await other.agent.post('/api/v1/identify').set(W).send({ peaks: [[43, 100]] }).expect(200);
    } finally {
      await searchServiceOf(limited.app).stop();
      await limited.close();
    }
  });
});
