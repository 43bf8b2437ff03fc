import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type TestAgent from 'supertest/lib/agent';
import type { Response } from 'supertest';
import { searchServiceOf } from '../../app';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';
import { chlorobenzeneContent } from '../../testing/fixtures';
import { publishEntry } from '../../testing/curation';
import { W } from './security-test-helpers';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  await searchServiceOf(ctx.app).stop();
  await ctx.close();
});

interface Race {
  name: string;
  accession: string;
  /** The requests, started together with every other race's. */
  calls: { who: string; audit: string; send: () => Promise<Response> }[];
}

async function createDraft(author: TestAgent, name: string) {
  const res = await author.post('/api/v1/entries').set(W).send(chlorobenzeneContent({ name }));
  expect(res.status).toBe(201);
  return res.body.revision as { id: string; accession: string; lockVersion: number };
}

async function submit(author: TestAgent, r: { id: string; lockVersion: number }) {
  const res = await author.post(`/api/v1/revisions/${r.id}/submit`).set(W).send({ lockVersion: r.lockVersion });
  expect(res.status).toBe(200);
  return res.body.revision as { id: string; accession: string; lockVersion: number };
}

describe('20 simultaneous decisions and edits on the same entries', () => {
  it('one winner per race, the others 409; no lost or doubled revision; never two published revisions; an audit event for each success only', async () => {
    const author = (await signInAs(ctx, 'contributor')).agent;
    const curators = await Promise.all([1, 2, 3, 4].map(() => signInAs(ctx, 'curator')));
    const c = curators.map((x) => x.agent);

    // A: r1 in review — five curators decide at once (three publish, two return).
    const a = await submit(author, await createDraft(author, 'Race A (test)'));
    // B: published r1 — the author and three curators start r2 at once.
    const b = await publishEntry(author, c[0]!, chlorobenzeneContent({ name: 'Race B (test)' }));
    // C: published r1 — three curators withdraw it at once.
    const cc = await publishEntry(author, c[0]!, chlorobenzeneContent({ name: 'Race C (test)' }));
    // D: a draft — the author sends four edits and a submit, all from the same version.
    const d = await createDraft(author, 'Race D (test)');
    // E: r1 published, r2 in review — two curators publish r2 while a third withdraws the entry.
    const e1 = await publishEntry(author, c[0]!, chlorobenzeneContent({ name: 'Race E (test)' }));
    const e2draft = (await author.post(`/api/v1/entries/${e1.accession}/revisions`).set(W).send({ changeNote: 'second recording' }).expect(201)).body.revision;
    const e2 = await submit(author, e2draft);

    const startAudit: { id: string }[] = await ctx.ds.query(`SELECT coalesce(max(id), 0)::text AS id FROM audit_events`);

    const decide = (who: number, r: { id: string; lockVersion: number }, decision: 'publish' | 'needs_changes') => ({
      who: `curator ${who} ${decision}`,
      audit: decision === 'publish' ? 'revision.published' : 'revision.returned',
      send: () =>
        c[who]!.post(`/api/v1/revisions/${r.id}/decision`)
          .set(W)
          .send({ decision, lockVersion: r.lockVersion, comment: decision === 'publish' ? '' : `returned by curator ${who}` }),
    });
    const withdraw = (who: number, accession: string) => ({
      who: `curator ${who} withdraw`,
      audit: 'entry.withdrawn',
      send: () => c[who]!.post(`/api/v1/entries/${accession}/withdraw`).set(W).send({ reason: `withdrawn by curator ${who}` }),
    });
    const races: Race[] = [
      { name: 'decide A r1', accession: a.accession, calls: [decide(0, a, 'publish'), decide(1, a, 'publish'), decide(2, a, 'publish'), decide(3, a, 'needs_changes'), decide(1, a, 'needs_changes')] },
      {
        name: 'start B r2',
        accession: b.accession,
        calls: [author, ...c.slice(0, 3)].map((agent, i) => ({
          who: `caller ${i} new revision`,
          audit: 'revision.created',
          send: () => agent.post(`/api/v1/entries/${b.accession}/revisions`).set(W).send({ changeNote: `by caller ${i}` }),
        })),
      },
      { name: 'withdraw C', accession: cc.accession, calls: [withdraw(0, cc.accession), withdraw(1, cc.accession), withdraw(2, cc.accession)] },
      {
        name: 'edit or submit D r1',
        accession: d.accession,
        calls: [
          ...[1, 2, 3, 4].map((i) => ({
            who: `author edit ${i}`,
            audit: 'revision.edited',
            send: () => author.patch(`/api/v1/revisions/${d.id}`).set(W).send({ lockVersion: d.lockVersion, name: `Race D edit ${i} (test)` }),
          })),
          { who: 'author submit', audit: 'revision.submitted', send: () => author.post(`/api/v1/revisions/${d.id}/submit`).set(W).send({ lockVersion: d.lockVersion }) },
        ],
      },
      { name: 'publish E r2', accession: e1.accession, calls: [decide(1, e2, 'publish'), decide(2, e2, 'publish')] },
    ];
    // Not a race with the publishers (either order is valid), but it runs at the same moment.
    const extra = withdraw(3, e1.accession);
    const all = [...races.flatMap((r) => r.calls), extra];
    expect(all).toHaveLength(20);

    const answers = await Promise.all(all.map((call) => call.send()));
    const answerOf = new Map(all.map((call, i) => [call, answers[i]!]));

    const expectedAudit: string[] = [];
    for (const race of races) {
      const statuses = race.calls.map((call) => answerOf.get(call)!.status);
      const winners = race.calls.filter((call) => [200, 201].includes(answerOf.get(call)!.status));
      expect(winners, `${race.name}: ${statuses.join(' ')}`).toHaveLength(1);
      expect(statuses.filter((s) => s === 409), `${race.name}: ${statuses.join(' ')}`).toHaveLength(race.calls.length - 1);
      expectedAudit.push(`${winners[0]!.audit} ${race.accession}`);
    }
    // The withdrawal of E succeeds whichever way it interleaves with the publish of r2.
    expect(answerOf.get(extra)!.status, JSON.stringify(answerOf.get(extra)!.body)).toBe(200);
    expectedAudit.push(`entry.withdrawn ${e1.accession}`);

    const accessions = races.map((r) => r.accession);
    // Never two published revisions of one entry.
    const doubled: unknown[] = await ctx.ds.query(
      `SELECT e.accession, count(*) FROM revisions r JOIN entries e ON e.id = r.entry_id
        WHERE e.accession = ANY($1) AND r.state = 'published' GROUP BY e.accession HAVING count(*) > 1`,
      [accessions],
    );
    expect(doubled).toEqual([]);
    // No lost and no doubled revision: numbers run 1..n per entry, and each entry has as many as its history says.
    const numbers: { accession: string; numbers: number[] }[] = await ctx.ds.query(
      `SELECT e.accession, array_agg(r.number ORDER BY r.number) AS numbers FROM revisions r JOIN entries e ON e.id = r.entry_id
        WHERE e.accession = ANY($1) GROUP BY e.accession`,
      [accessions],
    );
    const byAccession = new Map(numbers.map((n) => [n.accession, n.numbers]));
    expect(byAccession.get(a.accession)).toEqual([1]);
    expect(byAccession.get(b.accession)).toEqual([1, 2]);
    expect(byAccession.get(cc.accession)).toEqual([1]);
    expect(byAccession.get(d.accession)).toEqual([1]);
    expect(byAccession.get(e1.accession)).toEqual([1, 2]);

    // The winning edit of D is the one stored, one version up.
    const dWinner = races[3]!.calls.find((call) => answerOf.get(call)!.status === 200)!;
    const dRow: { name: string; state: string; lock_version: number }[] = await ctx.ds.query(`SELECT name, state, lock_version FROM revisions WHERE id = $1`, [d.id]);
    expect(dRow[0]!.lock_version).toBe(d.lockVersion + 1);
    if (dWinner.who === 'author submit') expect(dRow[0]).toMatchObject({ name: 'Race D (test)', state: 'in_review' });
    else expect(dRow[0]).toMatchObject({ name: answerOf.get(dWinner)!.body.revision.name, state: 'draft' });

    // E ends with at most one published revision and r2 decided once.
    const eStates: { number: number; state: string }[] = await ctx.ds.query(
      `SELECT r.number, r.state FROM revisions r JOIN entries e ON e.id = r.entry_id WHERE e.accession = $1 ORDER BY r.number`,
      [e1.accession],
    );
    expect(eStates.filter((s) => s.state === 'published').length).toBeLessThanOrEqual(1);
    expect(['published', 'withdrawn']).toContain(eStates[1]!.state);

    // Audit: one event per successful change, none for the refused ones (supersedes ride along with a publish of E).
    const events: { action: string; subject_id: string }[] = await ctx.ds.query(
      `SELECT action, subject_id FROM audit_events WHERE id > $1 AND subject_type IN ('revision', 'entry') ORDER BY id`,
      [startAudit[0]!.id],
    );
    const seen = events
      .filter((ev) => accessions.some((acc) => ev.subject_id.startsWith(acc)))
      .filter((ev) => ev.action !== 'revision.superseded')
      .map((ev) => `${ev.action} ${ev.subject_id.split(' ')[0]}`);
    expect(seen.sort()).toEqual(expectedAudit.sort());
    const superseded = events.filter((ev) => ev.action === 'revision.superseded');
    expect(superseded.every((ev) => ev.subject_id === `${e1.accession} r1`)).toBe(true);
    expect(superseded.length).toBeLessThanOrEqual(1);
  });
});
