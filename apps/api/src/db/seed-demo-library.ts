import type { DataSource } from 'typeorm';
import type { RevisionContent } from '@ionfolio/contracts';
import { createEntry, newRevision, submitRevision, updateRevision, withdrawEntry } from '../modules/entries/entries.service';
import { decide } from '../modules/reviews/reviews.service';
import { freezeEdition } from '../modules/editions/editions.service';
import { findSessionUser } from '../modules/users/users.service';
import type { SessionUser } from '../modules/users/users.schemas';
import { buildDemoLibrary, DEMO_MARK, type DemoEntryPlan, type DemoRevisionPlan } from './demo/build-demo-library';

function content(plan: DemoEntryPlan, rev: DemoRevisionPlan): RevisionContent {
  const c = plan.compound;
  return {
    name: c.name,
    synonyms: c.synonyms,
    formula: c.formula,
    structure: c.smiles,
    structureFormat: 'smiles',
    casRn: null,
    peaks: rev.peaks,
    conditions: rev.conditions,
    retentionIndex: c.retentionIndex ? { value: c.retentionIndex.value, column: c.retentionIndex.columnClass } : null,
    // The demo plans' sample notes already carry the mark; keep it there even if a plan forgets.
    sampleNotes: rev.sampleNotes.includes(DEMO_MARK) ? rev.sampleNotes : `${rev.sampleNotes} (${DEMO_MARK})`,
    changeNote: rev.changeNote,
  };
}

async function publish(ds: DataSource, author: SessionUser, reviewer: SessionUser, id: string, lockVersion: number) {
  const sent = await submitRevision(ds, author, id, lockVersion);
  await decide(ds, reviewer, id, { decision: 'publish', comment: '', lockVersion: sent.lockVersion });
}

/**
 * The demo is loaded in seconds, but a lab's library grows over months: spread the invented
 * history over about fourteen months (older accessions earlier, each later revision some weeks
 * after the one before, a few hours to days between sending and deciding). Only the demo's own
 * timestamps move; content and states stay as the services wrote them, and the audit log keeps
 * the real times of the load.
 */
async function spreadDemoHistory(ds: DataSource): Promise<void> {
  await ds.transaction(async (m) => {
    await m.query(`
      WITH e AS (SELECT id, (max(id) OVER () - id) * 420.0 / greatest(count(*) OVER (), 1) AS days FROM entries)
      UPDATE entries SET created_at = entries.created_at - make_interval(days => (e.days + 60)::int)
        FROM e WHERE e.id = entries.id`);
    await m.query(`
      WITH e AS (SELECT id, (max(id) OVER () - id) * 420.0 / greatest(count(*) OVER (), 1) AS days FROM entries),
           r AS (SELECT r.id, e.days, max(r.number) OVER (PARTITION BY r.entry_id) - r.number AS later,
                        4 + (('x' || substr(md5(r.id::text), 1, 6))::bit(24)::int % 90) AS review_hours
                   FROM revisions r JOIN e ON e.id = r.entry_id)
      UPDATE revisions SET
        created_at = revisions.created_at - make_interval(days => (r.days + 25 * r.later)::int, hours => r.review_hours + 24),
        updated_at = revisions.updated_at - make_interval(days => (r.days + 25 * r.later)::int),
        submitted_at = revisions.submitted_at - make_interval(days => (r.days + 25 * r.later)::int, hours => r.review_hours),
        decided_at = revisions.decided_at - make_interval(days => (r.days + 25 * r.later)::int),
        published_at = revisions.published_at - make_interval(days => (r.days + 25 * r.later)::int)
        FROM r WHERE r.id = revisions.id`);
  });
}

/**
 * Loads the invented demo library (PRODUCT.md "Demo scenario") through the same service functions
 * the API uses, so every entry has a real history: submissions, decisions, superseded revisions,
 * returned and withdrawn entries, and one edition frozen part-way. Runs once: an existing library
 * is left alone.
 */
export async function seedDemoLibrary(ds: DataSource): Promise<number> {
  const existing: { n: number }[] = await ds.query(`SELECT count(*)::int AS n FROM entries`);
  if (existing[0]!.n > 0) return 0;
  const users = new Map<string, SessionUser>();
  const rows: { id: string; login: string }[] = await ds.query(`SELECT id, login FROM users`);
  for (const r of rows) {
    const u = await findSessionUser(ds, r.id);
    if (u) users.set(r.login, u);
  }
  const who = (login: string) => {
    const u = users.get(login);
    if (!u) throw new Error(`demo user ${login} is missing; run the user seed first`);
    return u;
  };
  const startedAt: { t: Date }[] = await ds.query(`SELECT now() AS t`);
  const plans = buildDemoLibrary();
  const editionAt = Math.floor(plans.length * 0.7);
  for (const [i, plan] of plans.entries()) {
    if (i === editionAt) {
      await freezeEdition(ds, who('dana.okafor'), '2026.11', 'First frozen edition of the demo library (simulated — demo only).');
    }
    const author = who(plan.authorLogin);
    const reviewer = who(plan.reviewerLogin);
    const [first, ...later] = plan.revisions;
    let rev = await createEntry(ds, author, content(plan, first!), { simulated: true });
    const accession = rev.accession;
    const steps = [first!, ...later];
    for (const [n, step] of steps.entries()) {
      const last = n === steps.length - 1;
      if (n > 0) {
        rev = await newRevision(ds, author, accession, { changeNote: step.changeNote });
        rev = await updateRevision(ds, author, rev.id, { lockVersion: rev.lockVersion, ...content(plan, step) });
      }
      if (!last || plan.finalState === 'published' || plan.finalState === 'withdrawn') {
        await publish(ds, author, reviewer, rev.id, rev.lockVersion);
      } else if (plan.finalState === 'in_review') {
        await submitRevision(ds, author, rev.id, rev.lockVersion);
      } else if (plan.finalState === 'needs_changes') {
        const sent = await submitRevision(ds, author, rev.id, rev.lockVersion);
        await decide(ds, reviewer, rev.id, {
          decision: 'needs_changes',
          comment: plan.decisionComment ?? 'Please add the purity evidence of the standard.',
          lockVersion: sent.lockVersion,
        });
      }
    }
    if (plan.finalState === 'withdrawn') {
      await withdrawEntry(ds, reviewer, accession, plan.decisionComment ?? 'Standard found contaminated (demo).');
    }
  }
  await spreadDemoHistory(ds);
  // The mails these invented events queued describe a history nobody needs to be told about.
  await ds.query(`DELETE FROM mail_messages WHERE created_at >= $1`, [startedAt[0]!.t]);
  return plans.length;
}
