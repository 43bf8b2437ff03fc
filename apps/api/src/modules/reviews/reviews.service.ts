import type { DataSource, EntityManager } from 'typeorm';
import type { Decision } from '@ionfolio/contracts';
import { AppError, notFound } from '../../shared/app-error';
import { roleAtLeast } from '../../shared/require-role';
import { recordAudit } from '../audit/audit.service';
import { queueMail } from '../mail/mail.service';
import type { SessionUser } from '../users/users.schemas';
import { curatorEmails, entriesRepository, loadUserRefs, revisionsRepository, userEmail, type UserRef } from '../entries/entries.repository';
import { viewOf } from '../entries/entries.service';
import type { RevisionView } from '../entries/revision-view';
import { canSee } from '../entries/revision-view';
import { ReviewCommentEntity, type ReviewCommentRow } from './review-comment.entity';

const comments = (m: EntityManager) => m.getRepository<ReviewCommentRow>(ReviewCommentEntity);

/**
 * A curator's decision on a revision in review. Exactly one decision wins: the first statement
 * claims the row only if its state and lock version are still what the curator saw; a second
 * curator deciding at the same moment waits for the row lock, then finds the version moved on and
 * gets 409. Publishing supersedes the previous published revision in the same transaction.
 */
export async function decide(ds: DataSource, actor: SessionUser, revisionId: string, decision: Decision): Promise<RevisionView> {
  return ds.transaction(async (m) => {
    const claimed = await revisionsRepository(m)
      .createQueryBuilder()
      .update()
      .set({ lockVersion: () => 'lock_version + 1' })
      .where('id = :id AND state = :state AND lock_version = :v', { id: revisionId, state: 'in_review', v: decision.lockVersion })
      .execute();
    const revision = await revisionsRepository(m).findOneBy({ id: revisionId });
    if (!revision) throw notFound(`Revision ${revisionId}`);
    const entry = await entriesRepository(m).findOneByOrFail({ id: revision.entryId });
    const label = `${entry.accession} r${revision.number}`;
    if (claimed.affected !== 1) {
      throw new AppError(
        'STALE_REVISION',
        409,
        revision.state === 'in_review'
          ? `${label} changed since you loaded it; reload it and decide again`
          : `${label} is ${revision.state} now; someone else decided first`,
        { details: { state: revision.state, currentLockVersion: revision.lockVersion } },
      );
    }
    if (revision.authorId === actor.id) {
      throw new AppError('SELF_REVIEW', 403, `You wrote ${label}; another curator must decide on it`);
    }
    const now = new Date();
    if (decision.decision === 'publish') {
      const previous = await revisionsRepository(m).findOne({ where: { entryId: entry.id, state: 'published' }, lock: { mode: 'pessimistic_write' } });
      if (previous) {
        await revisionsRepository(m).update({ id: previous.id }, { state: 'superseded', lockVersion: previous.lockVersion + 1, updatedAt: now });
        await recordAudit(m, {
          actorId: actor.id,
          action: 'revision.superseded',
          subjectType: 'revision',
          subjectId: `${entry.accession} r${previous.number}`,
          data: { from: 'published', to: 'superseded', by: revision.number },
        });
      }
      await revisionsRepository(m).update(
        { id: revision.id },
        { state: 'published', reviewerId: actor.id, decidedAt: now, publishedAt: now, updatedAt: now },
      );
      if (entry.withdrawnAt) await entriesRepository(m).update({ id: entry.id }, { withdrawnAt: null, withdrawnReason: null });
      await m.query(`SELECT pg_notify('ionfolio_library', $1)`, [JSON.stringify({ accession: entry.accession, change: 'published' })]);
    } else {
      await revisionsRepository(m).update({ id: revision.id }, { state: 'needs_changes', reviewerId: actor.id, decidedAt: now, updatedAt: now });
    }
    const to = decision.decision === 'publish' ? 'published' : 'needs_changes';
    if (decision.comment) {
      await comments(m).insert({ revisionId: revision.id, parentId: null, authorId: actor.id, body: decision.comment, kind: 'decision' });
    }
    await recordAudit(m, {
      actorId: actor.id,
      action: decision.decision === 'publish' ? 'revision.published' : 'revision.returned',
      subjectType: 'revision',
      subjectId: label,
      data: { from: 'in_review', to, comment: decision.comment || undefined },
    });
    const authorEmail = await userEmail(m, revision.authorId);
    if (authorEmail) {
      await queueMail(m, {
        to: authorEmail,
        subject:
          decision.decision === 'publish'
            ? `Ionfolio: ${label} ${revision.name} was published`
            : `Ionfolio: ${label} ${revision.name} needs changes`,
        text:
          decision.decision === 'publish'
            ? `${actor.displayName} published ${label} (${revision.name}).\n${decision.comment ? `\nComment: ${decision.comment}\n` : ''}`
            : `${actor.displayName} returned ${label} (${revision.name}) with this comment:\n\n${decision.comment}\n`,
      });
    }
    return viewOf(m, entry, await revisionsRepository(m).findOneByOrFail({ id: revision.id }));
  });
}

export interface CommentView {
  id: string;
  parentId: string | null;
  author: UserRef | null;
  body: string;
  kind: 'comment' | 'decision';
  createdAt: string;
}

async function visibleRevision(m: EntityManager, viewer: SessionUser, revisionId: string) {
  const revision = await revisionsRepository(m).findOneBy({ id: revisionId });
  if (!revision || !canSee(viewer, revision)) throw notFound(`Revision ${revisionId}`);
  const entry = await entriesRepository(m).findOneByOrFail({ id: revision.entryId });
  return { revision, entry };
}

export async function listComments(ds: DataSource, viewer: SessionUser, revisionId: string): Promise<CommentView[]> {
  await visibleRevision(ds.manager, viewer, revisionId);
  const rows = await comments(ds.manager).find({ where: { revisionId }, order: { createdAt: 'ASC' } });
  const users = await loadUserRefs(ds.manager, rows.map((r) => r.authorId));
  return rows.map((r) => ({
    id: r.id,
    parentId: r.parentId,
    author: users.get(r.authorId) ?? null,
    body: r.body,
    kind: r.kind,
    createdAt: r.createdAt.toISOString(),
  }));
}

/** A comment in the thread of a revision, by its author or a curator; the other side hears of it. */
export async function addComment(
  ds: DataSource,
  actor: SessionUser,
  revisionId: string,
  body: { body: string; parentId: string | null },
): Promise<CommentView> {
  return ds.transaction(async (m) => {
    const { revision, entry } = await visibleRevision(m, actor, revisionId);
    if (revision.authorId !== actor.id && !roleAtLeast(actor.role, 'curator')) {
      throw new AppError('FORBIDDEN', 403, 'Only the author and curators comment on a revision');
    }
    if (body.parentId) {
      const parent = await comments(m).findOneBy({ id: body.parentId });
      if (!parent || parent.revisionId !== revisionId) {
        throw new AppError('VALIDATION', 400, 'parentId must be a comment on the same revision', { details: [{ path: 'parentId', message: 'not in this thread' }] });
      }
    }
    const inserted = await comments(m).save(comments(m).create({ revisionId, parentId: body.parentId, authorId: actor.id, body: body.body, kind: 'comment' }));
    const label = `${entry.accession} r${revision.number}`;
    await recordAudit(m, { actorId: actor.id, action: 'comment.added', subjectType: 'revision', subjectId: label, data: { commentId: inserted.id } });
    const recipients = revision.authorId === actor.id ? await curatorEmails(m, actor.id) : [await userEmail(m, revision.authorId)];
    for (const to of recipients) {
      if (to) await queueMail(m, { to, subject: `Ionfolio: comment on ${label} ${revision.name}`, text: `${actor.displayName} wrote:\n\n${body.body}\n` });
    }
    const saved = await comments(m).findOneByOrFail({ id: inserted.id });
    return { id: saved.id, parentId: saved.parentId, author: { id: actor.id, login: actor.login, displayName: actor.displayName }, body: saved.body, kind: saved.kind, createdAt: saved.createdAt.toISOString() };
  });
}

export interface QueueItem {
  revisionId: string;
  accession: string;
  number: number;
  label: string;
  state: string;
  name: string;
  formula: string;
  checksWorst: string;
  author: string;
  authorLogin: string;
  submittedAt: string | null;
  updatedAt: string;
  hasPublished: boolean;
  simulated: boolean;
}

/** The review desk: open revisions in one state, with counts of every open state. */
export async function reviewQueue(ds: DataSource, query: { state: string; author?: string | undefined; q?: string | undefined }) {
  const params: unknown[] = [query.state];
  let where = `r.state = $1`;
  if (query.author) {
    params.push(query.author);
    where += ` AND u.login = $${params.length}`;
  }
  if (query.q) {
    params.push(`%${query.q}%`);
    where += ` AND (r.name ILIKE $${params.length} OR e.accession ILIKE $${params.length} OR r.formula ILIKE $${params.length})`;
  }
  const items: QueueItem[] = await ds.query(
    `SELECT r.id AS "revisionId", e.accession, r.number, e.accession || ' r' || r.number AS label, r.state, r.name, r.formula,
            r.checks_worst AS "checksWorst", u.display_name AS author, u.login AS "authorLogin", r.submitted_at AS "submittedAt", r.updated_at AS "updatedAt",
            EXISTS (SELECT 1 FROM revisions p WHERE p.entry_id = r.entry_id AND p.state = 'published') AS "hasPublished",
            r.simulated
       FROM revisions r JOIN entries e ON e.id = r.entry_id JOIN users u ON u.id = r.author_id
      WHERE ${where}
      ORDER BY r.submitted_at NULLS LAST, r.updated_at
      LIMIT 500`,
    params,
  );
  const countRows: { state: string; n: number }[] = await ds.query(
    `SELECT state, count(*)::int AS n FROM revisions WHERE state IN ('draft', 'in_review', 'needs_changes') GROUP BY state`,
  );
  const counts = { draft: 0, in_review: 0, needs_changes: 0 } as Record<string, number>;
  for (const c of countRows) counts[c.state] = c.n;
  return {
    items: items.map((i) => ({
      ...i,
      submittedAt: i.submittedAt ? new Date(i.submittedAt).toISOString() : null,
      updatedAt: new Date(i.updatedAt).toISOString(),
    })),
    counts,
  };
}
