import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';
import { chlorobenzeneContent } from '../../testing/fixtures';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  await ctx.close();
});

const W = { 'X-Requested-With': 'ionfolio' };

async function auditFor(accession: string) {
  const rows: { action: string; subject_id: string; data: Record<string, unknown> }[] = await ctx.ds.query(
    `SELECT action, subject_id, data FROM audit_events WHERE subject_id LIKE $1 ORDER BY id`,
    [`${accession}%`],
  );
  return rows.map((r) => `${r.action} ${r.subject_id}`);
}

async function mailsTo(login: string) {
  const rows: { subject: string }[] = await ctx.ds.query(
    `SELECT subject FROM mail_messages WHERE to_address = $1 ORDER BY created_at`,
    [`${login}@users.stand-in.example`],
  );
  return rows.map((r) => r.subject);
}

describe('the life of an entry', () => {
  it('draft → in_review → needs_changes → in_review → r1 published → r2 published, r1 kept byte for byte → withdrawn', async () => {
    const author = await signInAs(ctx, 'contributor');
    const curator = await signInAs(ctx, 'curator');

    const created = await author.agent.post('/api/v1/entries').set(W).send(chlorobenzeneContent()).expect(201);
    const r1 = created.body.revision;
    expect(r1).toMatchObject({ number: 1, state: 'draft', formula: 'C6H5Cl', nominalMass: 112, basePeakMz: 112, simulated: false });
    expect(r1.accession).toMatch(/^IF-\d{6}$/);
    expect(r1.checks.length).toBeGreaterThan(3);
    const accession: string = r1.accession;

    // A reader cannot see a draft.
    const reader = await signInAs(ctx, 'reader');
    await reader.agent.get(`/api/v1/entries/${accession}`).expect(404);

    const sent = await author.agent.post(`/api/v1/revisions/${r1.id}/submit`).set(W).send({ lockVersion: r1.lockVersion }).expect(200);
    expect(sent.body.revision.state).toBe('in_review');
    // Frozen while in review: the author cannot edit it.
    const frozen = await author.agent
      .patch(`/api/v1/revisions/${r1.id}`)
      .set(W)
      .send({ lockVersion: sent.body.revision.lockVersion, name: 'Changed' })
      .expect(409);
    expect(frozen.body.error.code).toBe('REVISION_FROZEN');

    const queue = await curator.agent.get('/api/v1/review-queue').expect(200);
    expect(queue.body.items.map((i: { label: string }) => i.label)).toContain(`${accession} r1`);

    const returned = await curator.agent
      .post(`/api/v1/revisions/${r1.id}/decision`)
      .set(W)
      .send({ decision: 'needs_changes', comment: 'Please add the purity evidence.', lockVersion: sent.body.revision.lockVersion })
      .expect(200);
    expect(returned.body.revision.state).toBe('needs_changes');
    const comments = await author.agent.get(`/api/v1/revisions/${r1.id}/comments`).expect(200);
    expect(comments.body.comments).toMatchObject([{ kind: 'decision', body: 'Please add the purity evidence.' }]);

    const fixed = await author.agent
      .patch(`/api/v1/revisions/${r1.id}`)
      .set(W)
      .send({ lockVersion: returned.body.revision.lockVersion, sampleNotes: 'Test standard, invented lot T-0001, 99.5 % by GC-FID' })
      .expect(200);
    await author.agent.post(`/api/v1/revisions/${r1.id}/comments`).set(W).send({ body: 'Added the purity.' }).expect(201);
    const resent = await author.agent.post(`/api/v1/revisions/${r1.id}/submit`).set(W).send({ lockVersion: fixed.body.revision.lockVersion }).expect(200);
    const published = await curator.agent
      .post(`/api/v1/revisions/${r1.id}/decision`)
      .set(W)
      .send({ decision: 'publish', comment: '', lockVersion: resent.body.revision.lockVersion })
      .expect(200);
    expect(published.body.revision).toMatchObject({ state: 'published', reviewer: { login: curator.login } });
    const r1Published = (await reader.agent.get(`/api/v1/entries/${accession}`).expect(200)).body.entry.revision;

    // r2: a correction, made as a new revision.
    const r2 = (await author.agent.post(`/api/v1/entries/${accession}/revisions`).set(W).send({}).expect(201)).body.revision;
    expect(r2).toMatchObject({ number: 2, state: 'draft' });
    const r2edit = await author.agent
      .patch(`/api/v1/revisions/${r2.id}`)
      .set(W)
      .send({ lockVersion: r2.lockVersion, peaks: [...chlorobenzeneContent().peaks, [39, 8]], changeNote: 'Added m/z 39' })
      .expect(200);
    const r2sent = await author.agent.post(`/api/v1/revisions/${r2.id}/submit`).set(W).send({ lockVersion: r2edit.body.revision.lockVersion }).expect(200);
    await curator.agent
      .post(`/api/v1/revisions/${r2.id}/decision`)
      .set(W)
      .send({ decision: 'publish', comment: 'Fine.', lockVersion: r2sent.body.revision.lockVersion })
      .expect(200);

    const now = (await reader.agent.get(`/api/v1/entries/${accession}`).expect(200)).body.entry;
    expect(now.revision).toMatchObject({ number: 2, state: 'published' });
    expect(now.revisions.map((r: { number: number; state: string }) => `${r.number}:${r.state}`)).toEqual(['1:superseded', '2:published']);
    const old = (await reader.agent.get(`/api/v1/entries/${accession}?revision=1`).expect(200)).body.entry.revision;
    // Everything r1 said is still there, unchanged; only its state moved on.
    const { state: _s1, lockVersion: _l1, updatedAt: _u1, ...r1Content } = r1Published;
    const { state: _s2, lockVersion: _l2, updatedAt: _u2, ...oldContent } = old;
    expect(oldContent).toEqual(r1Content);
    expect(old.state).toBe('superseded');

    await curator.agent.post(`/api/v1/entries/${accession}/withdraw`).set(W).send({ reason: 'Standard found contaminated' }).expect(200);
    const gone = (await reader.agent.get(`/api/v1/entries/${accession}`).expect(200)).body.entry;
    expect(gone).toMatchObject({ withdrawnReason: 'Standard found contaminated', revision: { number: 2, state: 'withdrawn' } });

    expect(await auditFor(accession)).toEqual([
      `entry.created ${accession}`,
      `revision.submitted ${accession} r1`,
      `revision.returned ${accession} r1`,
      `revision.edited ${accession} r1`,
      `comment.added ${accession} r1`,
      `revision.submitted ${accession} r1`,
      `revision.published ${accession} r1`,
      `revision.created ${accession} r2`,
      `revision.edited ${accession} r2`,
      `revision.submitted ${accession} r2`,
      `revision.superseded ${accession} r1`,
      `revision.published ${accession} r2`,
      `entry.withdrawn ${accession}`,
    ]);
    expect(await mailsTo(author.login)).toEqual([
      `Ionfolio: ${accession} r1 Chlorobenzene (test) needs changes`,
      `Ionfolio: ${accession} r1 Chlorobenzene (test) was published`,
      `Ionfolio: ${accession} r2 Chlorobenzene (test) was published`,
      `Ionfolio: ${accession} was withdrawn`,
    ]);
    const curatorMail = await mailsTo(curator.login);
    expect(curatorMail.filter((s) => s.includes(`${accession} r1`) && s.includes('waiting for review'))).toHaveLength(2);
  });

  it('the database refuses to change a published revision even behind the app', async () => {
    const author = await signInAs(ctx, 'contributor');
    const curator = await signInAs(ctx, 'curator');
    const r1 = (await author.agent.post('/api/v1/entries').set(W).send(chlorobenzeneContent()).expect(201)).body.revision;
    const sent = (await author.agent.post(`/api/v1/revisions/${r1.id}/submit`).set(W).send({ lockVersion: 1 }).expect(200)).body.revision;
    await curator.agent.post(`/api/v1/revisions/${r1.id}/decision`).set(W).send({ decision: 'publish', comment: '', lockVersion: sent.lockVersion }).expect(200);
    await expect(ctx.ds.query(`UPDATE revisions SET peaks = '[[1,100]]' WHERE id = $1`, [r1.id])).rejects.toThrow(/frozen/);
    await expect(ctx.ds.query(`DELETE FROM revisions WHERE id = $1`, [r1.id])).rejects.toThrow(/cannot be deleted/);
    await expect(ctx.ds.query(`DELETE FROM audit_events`)).rejects.toThrow(/append-only/);
  });
});

describe('who may do what', () => {
  it('a contributor cannot publish; a reader cannot create or submit', async () => {
    const author = await signInAs(ctx, 'contributor');
    const other = await signInAs(ctx, 'contributor');
    const reader = await signInAs(ctx, 'reader');
    await reader.agent.post('/api/v1/entries').set(W).send(chlorobenzeneContent()).expect(403);
    const r1 = (await author.agent.post('/api/v1/entries').set(W).send(chlorobenzeneContent()).expect(201)).body.revision;
    await reader.agent.post(`/api/v1/revisions/${r1.id}/submit`).set(W).send({ lockVersion: 1 }).expect(403);
    const notMine = await other.agent.post(`/api/v1/revisions/${r1.id}/submit`).set(W).send({ lockVersion: 1 }).expect(403);
    expect(notMine.body.error.code).toBe('NOT_AUTHOR');
    const sent = (await author.agent.post(`/api/v1/revisions/${r1.id}/submit`).set(W).send({ lockVersion: 1 }).expect(200)).body.revision;
    await author.agent.post(`/api/v1/revisions/${r1.id}/decision`).set(W).send({ decision: 'publish', lockVersion: sent.lockVersion }).expect(403);
  });

  it('a curator cannot decide on their own revision', async () => {
    const curator = await signInAs(ctx, 'curator');
    const r1 = (await curator.agent.post('/api/v1/entries').set(W).send(chlorobenzeneContent()).expect(201)).body.revision;
    const sent = (await curator.agent.post(`/api/v1/revisions/${r1.id}/submit`).set(W).send({ lockVersion: 1 }).expect(200)).body.revision;
    const res = await curator.agent.post(`/api/v1/revisions/${r1.id}/decision`).set(W).send({ decision: 'publish', lockVersion: sent.lockVersion }).expect(403);
    expect(res.body.error.code).toBe('SELF_REVIEW');
    const row = await ctx.ds.query(`SELECT state, lock_version FROM revisions WHERE id = $1`, [r1.id]);
    expect(row[0]).toEqual({ state: 'in_review', lock_version: sent.lockVersion });
  });

  it('two concurrent decisions on one revision: exactly one winner and one 409', async () => {
    const author = await signInAs(ctx, 'contributor');
    const c1 = await signInAs(ctx, 'curator');
    const c2 = await signInAs(ctx, 'curator');
    const r1 = (await author.agent.post('/api/v1/entries').set(W).send(chlorobenzeneContent()).expect(201)).body.revision;
    const sent = (await author.agent.post(`/api/v1/revisions/${r1.id}/submit`).set(W).send({ lockVersion: 1 }).expect(200)).body.revision;
    const [a, b] = await Promise.all([
      c1.agent.post(`/api/v1/revisions/${r1.id}/decision`).set(W).send({ decision: 'publish', lockVersion: sent.lockVersion }),
      c2.agent.post(`/api/v1/revisions/${r1.id}/decision`).set(W).send({ decision: 'needs_changes', comment: 'No.', lockVersion: sent.lockVersion }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const loser = a.status === 409 ? a : b;
    expect(loser.body.error.code).toBe('STALE_REVISION');
    const audit = await ctx.ds.query(
      `SELECT count(*)::int AS n FROM audit_events WHERE subject_id = $1 AND action IN ('revision.published', 'revision.returned')`,
      [`${r1.accession} r1`],
    );
    expect(audit[0].n).toBe(1);
  });
});

describe('bad input', () => {
  it('an entry with bad peaks and an unknown element is a 400 naming the fields; nothing is written', async () => {
    const author = await signInAs(ctx, 'contributor');
    const before = await ctx.ds.query(`SELECT count(*)::int AS n FROM revisions`);
    const res = await author.agent
      .post('/api/v1/entries')
      .set(W)
      .send(chlorobenzeneContent({ formula: 'C6H5Xx', peaks: [[112, 100], [-3, 5]] }))
      .expect(400);
    expect(res.body.error.code).toBe('VALIDATION');
    const paths = res.body.error.details.map((d: { path: string }) => d.path);
    expect(paths).toContain('formula');
    expect(paths).toContain('peaks.1.0');
    const after = await ctx.ds.query(`SELECT count(*)::int AS n FROM revisions`);
    expect(after[0].n).toBe(before[0].n);
  });

  it('an unknown accession is a 404 and a malformed one a 400', async () => {
    const reader = await signInAs(ctx, 'reader');
    await reader.agent.get('/api/v1/entries/IF-999999').expect(404);
    const bad = await reader.agent.get('/api/v1/entries/XX-1').expect(400);
    expect(bad.body.error.details[0].path).toBe('accession');
  });

  it('a stale lock version on edit is a 409 and the edit is not applied', async () => {
    const author = await signInAs(ctx, 'contributor');
    const r1 = (await author.agent.post('/api/v1/entries').set(W).send(chlorobenzeneContent()).expect(201)).body.revision;
    await author.agent.patch(`/api/v1/revisions/${r1.id}`).set(W).send({ lockVersion: 1, name: 'First edit' }).expect(200);
    const stale = await author.agent.patch(`/api/v1/revisions/${r1.id}`).set(W).send({ lockVersion: 1, name: 'Second edit' }).expect(409);
    expect(stale.body.error.code).toBe('STALE_REVISION');
    const row = await ctx.ds.query(`SELECT name FROM revisions WHERE id = $1`, [r1.id]);
    expect(row[0].name).toBe('First edit');
  });
});
