import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';
import { chlorobenzeneContent } from '../../testing/fixtures';
import { createScratchDatabase, type ScratchDatabase } from './scratch-database';
import { hostileFile, hostileInput, loadHostileCorpus, type HostileCase } from './hostile-corpus';
import { countRows } from './table-snapshot';

const W = { 'X-Requested-With': 'ionfolio' };
const corpus = loadHostileCorpus();

// A database of its own, so that no other test's rows can move the counts between before and after.
let db: ScratchDatabase;
let ctx: TestContext;
let contributor: TestAgent;
let curator: TestAgent;
const ids = { draft: '', inReview: '' };
beforeAll(async () => {
  db = await createScratchDatabase('ionfolio_hostile');
  ctx = await createTestContext({ DATABASE_URL: db.url });
  contributor = (await signInAs(ctx, 'contributor')).agent;
  curator = (await signInAs(ctx, 'curator')).agent;
  ids.draft = (await contributor.post('/api/v1/entries').set(W).send(chlorobenzeneContent()).expect(201)).body.revision.id;
  const second = (await contributor.post('/api/v1/entries').set(W).send(chlorobenzeneContent()).expect(201)).body.revision;
  await contributor.post(`/api/v1/revisions/${second.id}/submit`).set(W).send({ lockVersion: second.lockVersion }).expect(200);
  ids.inReview = second.id;
}, 60_000);
afterAll(async () => {
  await ctx?.close();
  await db?.drop();
});

function send(c: HostileCase) {
  const [method, template] = c.route.split(' ') as ['POST' | 'PATCH', string];
  const url = template.replace(':draft', ids.draft).replace(':inReview', ids.inReview);
  const agent = /\/editions|\/decision/.test(url) ? curator : contributor;
  const req = (method === 'POST' ? agent.post(url) : agent.patch(url)).set(W);
  const { name, bytes } = hostileInput(c);
  if (c.send === 'upload') return req.attach('file', bytes, name);
  return req.set('Content-Type', c.send === 'json' ? 'application/json' : 'text/plain').send(bytes.toString('utf8'));
}

describe('the hostile corpus (tests/fixtures/hostile)', () => {
  it('holds at least 30 malformed files and bodies, each with a reason', () => {
    expect(corpus.length).toBeGreaterThanOrEqual(30);
    expect(new Set(corpus.map((c) => `${c.file ?? c.generate} ${c.route} ${c.send}`)).size).toBe(corpus.length);
  });

  it.each(corpus.map((c) => [`${c.file ?? c.generate} → ${c.route}: ${c.why}`, c] as const))(
    '%s: a clear 4xx and nothing written',
    async (_title, c) => {
      const before = await countRows(ctx.ds);
      const res = await send(c);
      const after = await countRows(ctx.ds);
      expect(res.status, JSON.stringify(res.body).slice(0, 500)).toBe(c.status);
      expect(res.body.error?.message).toEqual(expect.any(String));
      expect(res.body.error.message).toContain(c.message);
      if (c.code !== null) expect(res.body.error.code).toBe(c.code);
      expect(after).toEqual(before);
    },
  );
});

describe('line endings', () => {
  it.each(['jcamp-crlf.jdx', 'peaks-crlf.csv'])('%s (CRLF) reads like its LF twin', async (name) => {
    const res = await contributor.post('/api/v1/uploads/spectra').set(W).attach('file', hostileFile(name), name).expect(200);
    expect(res.body.blocks[0].peaks.slice(0, 2)).toEqual(name.endsWith('.jdx') ? [[43, 100], [45, 18]] : [[43, 100], [58, 25]]);
  });

  it('a JCAMP-DX file with CR-only line endings reads the same peaks', async () => {
    const res = await contributor.post('/api/v1/uploads/spectra').set(W).attach('file', hostileFile('jcamp-cr-only.jdx'), 'jcamp-cr-only.jdx');
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.blocks[0].peaks).toEqual([[43, 100], [45, 18], [61, 40], [88, 12]]);
  });
});

describe('markup and SQL in text fields', () => {
  it.each(['entry-script-name.json', 'entry-sql-name.json'])('%s is stored and returned verbatim, as text', async (name) => {
    const sent = JSON.parse(hostileFile(name).toString('utf8')) as { name: string; synonyms: string[]; sampleNotes?: string };
    const before = await countRows(ctx.ds);
    const created = await contributor.post('/api/v1/entries').set(W).set('Content-Type', 'application/json').send(hostileFile(name).toString('utf8')).expect(201);
    expect(created.headers['content-type']).toMatch(/^application\/json/);
    const read = await contributor.get(`/api/v1/revisions/${created.body.revision.id}`).expect(200);
    expect(read.body.revision.name).toBe(sent.name);
    expect(read.body.revision.synonyms).toEqual(sent.synonyms);
    if (sent.sampleNotes) expect(read.body.revision.sampleNotes).toBe(sent.sampleNotes);
    const after = await countRows(ctx.ds);
    // One entry and one revision more, and the tables the SQL names are all still there.
    expect(after.entries).toBe(before.entries! + 1);
    expect(after.revisions).toBe(before.revisions! + 1);
    expect(Object.keys(after)).toEqual(Object.keys(before));
    // Searching for the text is a search, not a statement.
    const found = await contributor.get('/api/v1/entries').query({ q: sent.synonyms[0], status: 'any' });
    expect(found.status).toBe(200);
  });
});
