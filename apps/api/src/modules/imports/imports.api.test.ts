import { randomBytes } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type TestAgent from 'supertest/lib/agent';
import { createLogger } from '../../shared/logger';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';
import type { SessionUser } from '../users/users.schemas';
import type { UploadedBlock } from '../uploads/spectrum-file';
import type { ImportResult } from './import-block';
import { CHUNK_BLOCKS } from './import-chunk';
import { getImport, startImport } from './imports.service';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  await ctx.close();
});

const W = { 'X-Requested-With': 'ionfolio' };
/** A tag in every title, so each test finds its own rows among those of earlier runs. */
const tag = () => randomBytes(3).toString('hex');

/** One invented JCAMP-DX block (simulated test data); `extra` holds further labelled records. */
function block(
  title: string,
  { molform = 'C 3 H 6 O', peaks = '15,20 43,100 58,30', extra = '' } = {},
): string {
  return `##TITLE=${title}\n##JCAMP-DX=5.01\n##DATA TYPE=MASS SPECTRUM\n##MOLFORM=${molform}\n${extra}##PEAK TABLE=(XY..XY)\n${peaks}\n##END=\n`;
}

interface Job {
  id: string;
  status: string;
  total: number;
  done: number;
  imported: number;
  rejected: number;
}

async function waitFor(read: () => Promise<{ job: Job; results: ImportResult[] }>) {
  for (let i = 0; i < 300; i++) {
    const got = await read();
    if (got.job.status !== 'running') return got;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('the import did not finish in 30 s');
}

async function importFile(agent: TestAgent, file: string, target: 'draft' | 'in_review') {
  const start = await agent
    .post(`/api/v1/imports?target=${target}`)
    .set(W)
    .attach('file', Buffer.from(file), 'bulk.jdx')
    .expect(202);
  const id: string = start.body.job.id;
  return waitFor(async () => (await agent.get(`/api/v1/imports/${id}`).expect(200)).body);
}

async function sessionUser(id: string): Promise<SessionUser> {
  const rows: SessionUser[] = await ctx.ds.query(
    `SELECT id, login, display_name AS "displayName", email, role FROM users WHERE id = $1`,
    [id],
  );
  return rows[0]!;
}

const count = async (sql: string, params: unknown[] = []) =>
  ((await ctx.ds.query(sql, params)) as { n: number }[])[0]!.n;

/** A revision as stored, without what differs between any two rows (ids, entry, times). */
async function storedRevision(accession: string) {
  const rows: Record<string, unknown>[] = await ctx.ds.query(
    `SELECT r.*, r.submitted_at IS NOT NULL AS submitted, r.updated_at = r.created_at AS unchanged_since_created
       FROM revisions r JOIN entries e ON e.id = r.entry_id WHERE e.accession = $1`,
    [accession],
  );
  expect(rows).toHaveLength(1);
  const { id: _id, entry_id: _e, created_at: _c, updated_at: _u, submitted_at: _s, ...row } = rows[0]!;
  return row;
}

async function auditLines(accession: string) {
  const rows: { action: string; subject_id: string; data: Record<string, unknown> }[] = await ctx.ds.query(
    `SELECT action, subject_id, data FROM audit_events WHERE subject_id = $1 OR subject_id = $2 ORDER BY id`,
    [accession, `${accession} r1`],
  );
  return rows;
}

const accessionNumber = (a: string | undefined) => Number(a!.slice(3));

describe('bulk import', () => {
  it('imports the good blocks as createEntry would, rejects each bad block with its reason and writes nothing for it', async () => {
    const curator = await signInAs(ctx, 'curator');
    const t = tag();
    const titles = {
      good1: `Import good 1 ${t}`,
      badFormula: `Import bad formula ${t}`,
      badPeak: `Import bad peak ${t}`,
      badCas: `Import bad CAS ${t}`,
      good2: `Import good 2 ${t}`,
      badEnergy: `Import bad energy ${t}`,
    };
    const file = [
      block(titles.good1, { extra: '##CAS REGISTRY NO=1234-56-6\n##$RETENTION INDEX=512\n##.INLET=GC\n' }),
      block(titles.badFormula, { molform: 'C 3 Xx 6' }),
      block(titles.badPeak, { peaks: '43,100 6000,20' }),
      block(titles.badCas, { extra: '##CAS REGISTRY NO=1234-56-7\n' }),
      block(titles.good2, { molform: 'C 2 H 6 O', peaks: '31,100 45,40 46,20' }),
      block(titles.badEnergy, { extra: '##.IONIZATION ENERGY=1000 eV\n' }),
    ].join('');
    const entriesBefore = await count(`SELECT count(*)::int AS n FROM entries`);
    const lastBefore = await count(
      `SELECT (CASE WHEN is_called THEN last_value ELSE last_value - 1 END)::int AS n FROM entry_accession_seq`,
    );

    const { job, results } = await importFile(curator.agent, file, 'draft');

    expect(job).toMatchObject({ status: 'done', total: 6, done: 6, imported: 2, rejected: 4 });
    expect(results.map((r) => [r.block, r.title, r.status])).toEqual([
      [1, titles.good1, 'imported'],
      [2, titles.badFormula, 'rejected'],
      [3, titles.badPeak, 'rejected'],
      [4, titles.badCas, 'rejected'],
      [5, titles.good2, 'imported'],
      [6, titles.badEnergy, 'rejected'],
    ]);
    expect(results[1]!.reason).toMatch(/^formula: .*Xx/);
    expect(results[2]!.reason).toBe('peaks.1.0: m/z above 5000 is not an EI spectrum');
    expect(results[3]!.reason).toBe('casRn: the CAS RN check digit does not match');
    expect(results[5]!.reason).toMatch(/^conditions\.ionizationEnergyEv: /);
    expect(results.filter((r) => r.status === 'rejected').every((r) => r.accession === undefined)).toBe(true);

    // Accessions continue the sequence in block order, with no gap for the rejected blocks.
    const [a1, a2] = [results[0]!.accession!, results[4]!.accession!];
    expect(accessionNumber(a1)).toBe(lastBefore + 1);
    expect(accessionNumber(a2)).toBe(lastBefore + 2);
    expect(await count(`SELECT count(*)::int AS n FROM entries`)).toBe(entriesBefore + 2);
    // Nothing at all for the rejected blocks: no revision, no audit line.
    const badNames = [titles.badFormula, titles.badPeak, titles.badCas, titles.badEnergy];
    expect(await count(`SELECT count(*)::int AS n FROM revisions WHERE name = ANY($1)`, [badNames])).toBe(0);
    expect(
      await count(`SELECT count(*)::int AS n FROM audit_events WHERE data->>'name' = ANY($1)`, [badNames]),
    ).toBe(0);

    // The same content through POST /entries (createEntry) gives the same stored revision.
    const same = await curator.agent
      .post('/api/v1/entries')
      .set(W)
      .send({
        name: titles.good1,
        formula: 'C3H6O',
        peaks: [
          [15, 20],
          [43, 100],
          [58, 30],
        ],
        casRn: '1234-56-6',
        conditions: { ionizationEnergyEv: 70, inlet: 'GC' },
        retentionIndex: { value: 512, column: 'non-polar' },
        changeNote: 'Bulk import',
      })
      .expect(201);
    const imported1 = await storedRevision(a1);
    expect(imported1).toEqual(await storedRevision(same.body.revision.accession));
    expect(imported1).toMatchObject({
      state: 'draft',
      lock_version: 1,
      number: 1,
      submitted: false,
      unchanged_since_created: true,
      author_id: curator.id,
    });
    expect((imported1.checks as unknown[]).length).toBeGreaterThan(3);
    expect(await auditLines(a1)).toEqual([
      {
        action: 'entry.created',
        subject_id: a1,
        data: { revision: 1, name: titles.good1, formula: 'C3H6O' },
      },
    ]);
    expect(await auditLines(a2)).toEqual([
      {
        action: 'entry.created',
        subject_id: a2,
        data: { revision: 1, name: titles.good2, formula: 'C2H6O' },
      },
    ]);
    const finished = await ctx.ds.query(
      `SELECT actor_id, data FROM audit_events WHERE action = 'import.finished' AND subject_id = $1`,
      [job.id],
    );
    expect(finished).toEqual([{ actor_id: curator.id, data: { total: 6, imported: 2 } }]);
  });

  it('target in_review: every imported r1 is submitted, with its revision.submitted audit line', async () => {
    const curator = await signInAs(ctx, 'curator');
    const t = tag();
    const file = [
      block(`Review 1 ${t}`),
      block(`Review bad ${t}`, { molform: 'C 3 Yy 6' }),
      block(`Review 2 ${t}`, { molform: 'C 2 H 6 O', peaks: '31,100 45,40 46,20' }),
    ].join('');
    const { job, results } = await importFile(curator.agent, file, 'in_review');
    expect(job).toMatchObject({ status: 'done', total: 3, imported: 2, rejected: 1 });
    expect(results[1]).toMatchObject({ block: 2, status: 'rejected' });
    expect(results[1]!.reason).toMatch(/^formula: /);
    for (const r of [results[0]!, results[2]!]) {
      const a = r.accession!;
      expect(await storedRevision(a)).toMatchObject({
        state: 'in_review',
        lock_version: 2,
        submitted: true,
        unchanged_since_created: true,
      });
      expect((await auditLines(a)).map((l) => [l.action, l.subject_id, l.data])).toEqual([
        [
          'entry.created',
          a,
          { revision: 1, name: r.title, formula: r.title.startsWith('Review 1') ? 'C3H6O' : 'C2H6O' },
        ],
        ['revision.submitted', `${a} r1`, { from: 'draft', to: 'in_review', import: job.id }],
      ]);
    }
    // The curators' queue shows them, as any submitted revision.
    const queue = (await curator.agent.get('/api/v1/review-queue').expect(200)).body.items.map(
      (i: { label: string }) => i.label,
    );
    expect(queue).toEqual(
      expect.arrayContaining([`${results[0]!.accession} r1`, `${results[2]!.accession} r1`]),
    );
  });

  it(`a file of more than ${CHUNK_BLOCKS} blocks is written in chunks and its results are complete and in order`, async () => {
    const curator = await signInAs(ctx, 'curator');
    const t = tag();
    const total = CHUNK_BLOCKS + 12;
    const bad = new Set([3, CHUNK_BLOCKS + 5]);
    const file = Array.from({ length: total }, (_, i) =>
      block(
        `Chunked ${i + 1} ${t}`,
        bad.has(i + 1) ? { molform: 'Qq' } : { peaks: `15,${10 + (i % 50)} 43,100 58,30` },
      ),
    ).join('');
    const before = await count(`SELECT count(*)::int AS n FROM revisions`);
    const { job, results } = await importFile(curator.agent, file, 'draft');
    expect(job).toMatchObject({ status: 'done', total, done: total, imported: total - 2, rejected: 2 });
    expect(results.map((r) => r.block)).toEqual(Array.from({ length: total }, (_, i) => i + 1));
    expect(results.filter((r) => r.status === 'rejected').map((r) => r.block)).toEqual([...bad]);
    const accessions = results
      .filter((r) => r.status === 'imported')
      .map((r) => accessionNumber(r.accession));
    expect(accessions.slice(1).every((n, i) => n === accessions[i]! + 1)).toBe(true);
    expect(await count(`SELECT count(*)::int AS n FROM revisions`)).toBe(before + total - 2);
    // Each block's row holds that block's content (no shift between blocks and accessions).
    const row = await storedRevision(results[CHUNK_BLOCKS + 1]!.accession!);
    expect(row.name).toBe(`Chunked ${CHUNK_BLOCKS + 2} ${t}`);
    expect(row.peaks).toEqual([
      [15, 10 + ((CHUNK_BLOCKS + 1) % 50)],
      [43, 100],
      [58, 30],
    ]);
  });

  it('when a chunk transaction fails, its blocks are written one at a time: the good ones import the same rows, the one at fault is rejected alone', async () => {
    const curator = await signInAs(ctx, 'curator');
    const t = tag();
    // PostgreSQL itself refuses one row (a trigger made for this test), as an unforeseen failure would.
    await ctx.ds.query(`
      CREATE OR REPLACE FUNCTION import_test_refuse() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN RAISE EXCEPTION 'refused by the import test'; END $$`);
    await ctx.ds.query(`
      CREATE TRIGGER import_test_refuse BEFORE INSERT ON revisions
      FOR EACH ROW WHEN (NEW.name LIKE 'Refused by the database %') EXECUTE FUNCTION import_test_refuse()`);
    let fallback: Awaited<ReturnType<typeof importFile>>;
    try {
      const file = [
        block(`Fallback good ${t}`),
        block(`Refused by the database ${t}`),
        block(`Fallback bad ${t}`, { molform: '' }),
        block(`Fallback last ${t}`),
      ];
      fallback = await importFile(curator.agent, file.join(''), 'in_review');
    } finally {
      await ctx.ds.query(`DROP TRIGGER import_test_refuse ON revisions`);
      await ctx.ds.query(`DROP FUNCTION import_test_refuse`);
    }
    const { job, results } = fallback;
    expect(job).toMatchObject({ status: 'done', total: 4, done: 4, imported: 2, rejected: 2 });
    expect(results.map((r) => [r.block, r.status, r.reason])).toEqual([
      [1, 'imported', undefined],
      [2, 'rejected', 'could not be stored'],
      [3, 'rejected', expect.stringMatching(/^formula: /)],
      [4, 'imported', undefined],
    ]);
    expect(
      await count(`SELECT count(*)::int AS n FROM revisions WHERE name LIKE $1`, [
        `Refused by the database ${t}`,
      ]),
    ).toBe(0);
    expect(
      await count(`SELECT count(*)::int AS n FROM audit_events WHERE data->>'name' = $1`, [
        `Refused by the database ${t}`,
      ]),
    ).toBe(0);

    // The same block through a chunk that does not fail gives the same rows and audit lines.
    const batch = await importFile(curator.agent, block(`Fallback good ${t}`), 'in_review');
    const [viaFallback, viaBatch] = [results[0]!.accession!, batch.results[0]!.accession!];
    expect(await storedRevision(viaFallback)).toEqual(await storedRevision(viaBatch));
    const strip = (lines: Awaited<ReturnType<typeof auditLines>>, a: string, jobId: string) =>
      lines.map((l) => ({
        ...l,
        subject_id: l.subject_id.replace(a, 'A'),
        data: l.data.import === jobId ? { ...l.data, import: 'job' } : l.data,
      }));
    expect(strip(await auditLines(viaFallback), viaFallback, job.id)).toEqual(
      strip(await auditLines(viaBatch), viaBatch, batch.job.id),
    );
    expect((await auditLines(viaBatch)).map((l) => l.action)).toEqual([
      'entry.created',
      'revision.submitted',
    ]);
  });

  it('a block without peaks is rejected with its reason; in a file, an empty peak table refuses the file with a 400', async () => {
    const curator = await signInAs(ctx, 'curator');
    const t = tag();
    const blocks: UploadedBlock[] = [
      {
        index: 1,
        title: `Service good ${t}`,
        formula: 'C3H6O',
        peaks: [
          [43, 100],
          [58, 30],
        ],
      },
      { index: 2, title: `Service empty ${t}`, formula: 'C3H6O', peaks: [] },
    ];
    const actor = await sessionUser(curator.id);
    const started = await startImport(ctx.ds, createLogger('silent'), actor, 'service.jdx', blocks, 'draft');
    const id = (started.job as { id: string }).id;
    const { job, results } = await waitFor(
      async () => (await getImport(ctx.ds, actor, id)) as unknown as { job: Job; results: ImportResult[] },
    );
    expect(job).toMatchObject({ status: 'done', imported: 1, rejected: 1 });
    expect(results[1]).toMatchObject({ block: 2, title: `Service empty ${t}`, status: 'rejected' });
    expect(results[1]!.reason).toMatch(/^peaks: a spectrum needs at least one peak/);
    expect(results[0]).toMatchObject({
      block: 1,
      status: 'imported',
      accession: expect.stringMatching(/^IF-\d{6}$/),
    });

    const jobsBefore = await count(`SELECT count(*)::int AS n FROM import_jobs`);
    const file = block(`File good ${t}`) + block(`File empty ${t}`, { peaks: '43,0 58,0' });
    const refused = await curator.agent
      .post('/api/v1/imports')
      .set(W)
      .attach('file', Buffer.from(file), 'empty.jdx')
      .expect(400);
    expect(refused.body.error.code).toBe('UNREADABLE_FILE');
    expect(refused.body.error.message).toMatch(/block 2.*no peak/);
    expect(await count(`SELECT count(*)::int AS n FROM import_jobs`)).toBe(jobsBefore);
    expect(await count(`SELECT count(*)::int AS n FROM revisions WHERE name LIKE $1`, [`File % ${t}`])).toBe(
      0,
    );
  });

  it('only curators import; a missing file or a bad target is a 400', async () => {
    const contributor = await signInAs(ctx, 'contributor');
    const curator = await signInAs(ctx, 'curator');
    await contributor.agent
      .post('/api/v1/imports')
      .set(W)
      .attach('file', Buffer.from(block('x')), 'x.jdx')
      .expect(403);
    const noFile = await curator.agent.post('/api/v1/imports').set(W).expect(400);
    expect(noFile.body.error.details[0].path).toBe('file');
    await curator.agent
      .post('/api/v1/imports?target=published')
      .set(W)
      .attach('file', Buffer.from(block('x')), 'x.jdx')
      .expect(400);
  });
});
