import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readJcamp } from '@ionfolio/chem';
import type { Response } from 'superagent';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';
import { chlorobenzeneContent } from '../../testing/fixtures';
import { publishEntry } from '../../testing/curation';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  await ctx.close();
});

const W = { 'X-Requested-With': 'ionfolio' };
// JCAMP-DX is served as chemical/x-jcamp-dx, which supertest does not buffer as text by itself.
const asText = (res: Response, done: (err: Error | null, body: string) => void) => {
  const stream = res as unknown as NodeJS.ReadableStream;
  let text = '';
  stream.setEncoding('utf8');
  stream.on('data', (chunk: string) => (text += chunk));
  stream.on('end', () => done(null, text));
};
const label = () => `t${Date.now().toString(36)}${Math.floor(Math.random() * 1000)}`;

describe('editions', () => {
  it('freezes the published set, diffs it with the previous edition and exports it', async () => {
    const author = await signInAs(ctx, 'contributor');
    const curator = await signInAs(ctx, 'curator');
    const a = await publishEntry(author.agent, curator.agent, chlorobenzeneContent({ name: 'Edition test A' }));
    const first = label();
    const e1 = await curator.agent.post('/api/v1/editions').set(W).send({ label: first, notes: 'first' }).expect(201);
    expect(e1.body.edition.revisionCount).toBeGreaterThan(0);

    const b = await publishEntry(author.agent, curator.agent, chlorobenzeneContent({ name: 'Edition test B' }));
    const r2 = (await author.agent.post(`/api/v1/entries/${a.accession}/revisions`).set(W).send({}).expect(201)).body.revision;
    const r2s = (await author.agent.post(`/api/v1/revisions/${r2.id}/submit`).set(W).send({ lockVersion: r2.lockVersion }).expect(200)).body.revision;
    await curator.agent.post(`/api/v1/revisions/${r2.id}/decision`).set(W).send({ decision: 'publish', lockVersion: r2s.lockVersion }).expect(200);
    const second = label();
    await curator.agent.post('/api/v1/editions').set(W).send({ label: second, notes: '' }).expect(201);
    await curator.agent.post('/api/v1/editions').set(W).send({ label: second, notes: '' }).expect(409);

    const shown = (await author.agent.get(`/api/v1/editions/${second}`).expect(200)).body;
    expect(shown.previous).toBe(first);
    expect(shown.diff.added.map((i: { accession: string }) => i.accession)).toContain(b.accession);
    expect(shown.diff.changed).toContainEqual(expect.objectContaining({ accession: a.accession, revision: 2, previousRevision: 1 }));

    // The export reads back to the same peaks (round trip through our JCAMP-DX writer and reader).
    const withEditions = (await author.agent.get(`/api/v1/entries/${a.accession}`).expect(200)).body.entry.editions;
    expect(withEditions.slice(0, 2)).toEqual([
      expect.objectContaining({ label: second, revision: 2 }),
      expect.objectContaining({ label: first, revision: 1 }),
    ]);
    const jdx = await author.agent.get(`/api/v1/editions/${second}/jcamp`).buffer(true).parse(asText).expect(200);
    const blocks = readJcamp(jdx.body as string);
    expect(blocks.length).toBe(shown.edition.revisionCount);
    const entryA = (await author.agent.get(`/api/v1/entries/${a.accession}`).expect(200)).body.entry.revision;
    const blockA = blocks.find((s) => s.title.includes(`${a.accession} r2`));
    expect(blockA?.peaks).toEqual(entryA.peaks);
    const csv = await author.agent.get(`/api/v1/editions/${second}/csv`).expect(200);
    expect(csv.text.split('\n')[0]).toMatch(/^accession,revision,name,formula/);
    expect(csv.text).toContain(`${a.accession},2,Edition test A`);
  });

  it('a contributor cannot freeze an edition; a bad label is a 400', async () => {
    const author = await signInAs(ctx, 'contributor');
    const curator = await signInAs(ctx, 'curator');
    await author.agent.post('/api/v1/editions').set(W).send({ label: '2026.99' }).expect(403);
    const bad = await curator.agent.post('/api/v1/editions').set(W).send({ label: '../etc' }).expect(400);
    expect(bad.body.error.details[0].path).toBe('label');
  });

  it('a single entry exports as JCAMP-DX that imports back to the same peaks and formula', async () => {
    const author = await signInAs(ctx, 'contributor');
    const curator = await signInAs(ctx, 'curator');
    const a = await publishEntry(author.agent, curator.agent, chlorobenzeneContent({ name: 'Round trip' }));
    const jdx = await author.agent.get(`/api/v1/entries/${a.accession}/jcamp`).buffer(true).parse(asText).expect(200);
    const up = await author.agent.post('/api/v1/uploads/spectra').set(W).attach('file', Buffer.from(jdx.body as string), 'back.jdx').expect(200);
    const entry = (await author.agent.get(`/api/v1/entries/${a.accession}`).expect(200)).body.entry.revision;
    expect(up.body.blocks[0].peaks).toEqual(entry.peaks);
    const created = await author.agent
      .post('/api/v1/entries')
      .set(W)
      .send({ ...chlorobenzeneContent(), formula: up.body.blocks[0].formula, peaks: up.body.blocks[0].peaks })
      .expect(201);
    expect(created.body.revision.formula).toBe('C6H5Cl');
  });
});

describe('outbox and audit', () => {
  it('admins read the outbox, curators the audit log; readers neither', async () => {
    const admin = await signInAs(ctx, 'admin');
    const curator = await signInAs(ctx, 'curator');
    const reader = await signInAs(ctx, 'reader');
    const outbox = await admin.agent.get('/api/v1/admin/outbox').expect(200);
    expect(Array.isArray(outbox.body.messages)).toBe(true);
    await curator.agent.get('/api/v1/admin/outbox').expect(403);
    const audit = await curator.agent.get('/api/v1/audit?action=user.&limit=2').expect(200);
    expect(audit.body.events.length).toBeLessThanOrEqual(2);
    expect(audit.body.events.every((e: { action: string }) => e.action.startsWith('user.'))).toBe(true);
    await reader.agent.get('/api/v1/audit').expect(403);
  });
});
