import type { DataSource, EntityManager } from 'typeorm';
import type { QueryDeepPartialEntity } from 'typeorm/query-builder/QueryPartialEntity.js';
import type { RevisionContent, RevisionPatch } from '@ionfolio/contracts';
import { RevisionContentSchema } from '@ionfolio/contracts';
import { AppError, notFound } from '../../shared/app-error';
import { roleAtLeast } from '../../shared/require-role';
import { recordAudit } from '../audit/audit.service';
import { queueMail } from '../mail/mail.service';
import type { SessionUser } from '../users/users.schemas';
import {
  curatorEmails,
  entriesRepository,
  loadUserRefs,
  lockEntry,
  revisionsRepository,
} from './entries.repository';
import type { EntryRow } from './entry.entity';
import type { RevisionRow } from './revision.entity';
import { toContent, toContentColumns } from './revision-content';
import { canSee, toRevisionSummary, toRevisionView, type RevisionSummary, type RevisionView } from './revision-view';

export interface EntryView {
  accession: string;
  createdAt: string;
  withdrawnAt: string | null;
  withdrawnReason: string | null;
  revision: RevisionView;
  revisions: RevisionSummary[];
  /** The frozen editions that hold one of this entry's revisions, newest first. */
  editions: { label: string; revision: number; createdAt: string }[];
}

async function revisionViews(m: EntityManager, entry: EntryRow, rows: RevisionRow[]): Promise<RevisionView[]> {
  const users = await loadUserRefs(m, rows.flatMap((r) => [r.authorId, r.reviewerId]));
  return rows.map((r) => toRevisionView(r, entry.accession, users));
}

export async function viewOf(m: EntityManager, entry: EntryRow, r: RevisionRow): Promise<RevisionView> {
  return (await revisionViews(m, entry, [r]))[0]!;
}

/** A new entry with its draft r1. `simulated` is only for the demo seed. */
export async function createEntry(
  ds: DataSource,
  actor: SessionUser,
  input: RevisionContent,
  options: { simulated?: boolean; manager?: EntityManager } = {},
): Promise<RevisionView> {
  const content = RevisionContentSchema.parse(input);
  const columns = toContentColumns(content);
  const work = async (m: EntityManager) => {
    const entry = await entriesRepository(m).save(entriesRepository(m).create({ createdBy: actor.id }));
    const saved = await entriesRepository(m).findOneByOrFail({ id: entry.id });
    const revision = await revisionsRepository(m).save(
      revisionsRepository(m).create({
        ...columns,
        entryId: saved.id,
        number: 1,
        state: 'draft',
        lockVersion: 1,
        simulated: options.simulated ?? false,
        authorId: actor.id,
      }),
    );
    await recordAudit(m, {
      actorId: actor.id,
      action: 'entry.created',
      subjectType: 'entry',
      subjectId: saved.accession,
      data: { revision: 1, name: columns.name, formula: columns.formula },
    });
    return viewOf(m, saved, await revisionsRepository(m).findOneByOrFail({ id: revision.id }));
  };
  return options.manager ? work(options.manager) : ds.transaction(work);
}

async function findRevisionForUpdate(m: EntityManager, id: string): Promise<{ entry: EntryRow; revision: RevisionRow }> {
  const revision = await revisionsRepository(m).findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
  if (!revision) throw notFound(`Revision ${id}`);
  const entry = await entriesRepository(m).findOneByOrFail({ id: revision.entryId });
  return { entry, revision };
}

function assertLock(revision: RevisionRow, lockVersion: number, entry: EntryRow): void {
  if (revision.lockVersion !== lockVersion) {
    throw new AppError(
      'STALE_REVISION',
      409,
      `${entry.accession} r${revision.number} changed since you loaded it (version ${revision.lockVersion}, you had ${lockVersion}); reload and try again`,
      { details: { currentLockVersion: revision.lockVersion, state: revision.state } },
    );
  }
}

function assertAuthorCanEdit(actor: SessionUser, entry: EntryRow, revision: RevisionRow): void {
  if (revision.authorId !== actor.id) {
    throw new AppError('NOT_AUTHOR', 403, `Only the author of ${entry.accession} r${revision.number} can change it`);
  }
  if (revision.state !== 'draft' && revision.state !== 'needs_changes') {
    throw new AppError(
      'REVISION_FROZEN',
      409,
      `${entry.accession} r${revision.number} is ${revision.state}; start a new revision to change it`,
    );
  }
}

/** Edits a draft (or a returned revision) by its author; the checks are computed again. */
export async function updateRevision(ds: DataSource, actor: SessionUser, id: string, patch: RevisionPatch): Promise<RevisionView> {
  return ds.transaction(async (m) => {
    const { entry, revision } = await findRevisionForUpdate(m, id);
    assertAuthorCanEdit(actor, entry, revision);
    assertLock(revision, patch.lockVersion, entry);
    const { lockVersion: _lv, ...fields } = patch;
    const content = RevisionContentSchema.parse({ ...toContent(revision), ...fields });
    const columns = toContentColumns(content);
    const changed = Object.keys(fields);
    await revisionsRepository(m).update(
      { id },
      { ...columns, lockVersion: revision.lockVersion + 1, updatedAt: new Date() } as QueryDeepPartialEntity<RevisionRow>,
    );
    await recordAudit(m, {
      actorId: actor.id,
      action: 'revision.edited',
      subjectType: 'revision',
      subjectId: `${entry.accession} r${revision.number}`,
      data: { fields: changed, before: revision.contentSha256, after: columns.contentSha256 },
    });
    return viewOf(m, entry, await revisionsRepository(m).findOneByOrFail({ id }));
  });
}

/** The author sends a draft or a returned revision to the review desk; curators hear of it. */
export async function submitRevision(ds: DataSource, actor: SessionUser, id: string, lockVersion: number): Promise<RevisionView> {
  return ds.transaction(async (m) => {
    const { entry, revision } = await findRevisionForUpdate(m, id);
    assertAuthorCanEdit(actor, entry, revision);
    assertLock(revision, lockVersion, entry);
    const now = new Date();
    await revisionsRepository(m).update(
      { id },
      { state: 'in_review', lockVersion: revision.lockVersion + 1, submittedAt: now, updatedAt: now },
    );
    const label = `${entry.accession} r${revision.number}`;
    await recordAudit(m, {
      actorId: actor.id,
      action: 'revision.submitted',
      subjectType: 'revision',
      subjectId: label,
      data: { from: revision.state, to: 'in_review' },
    });
    for (const to of await curatorEmails(m, actor.id)) {
      await queueMail(m, {
        to,
        subject: `Ionfolio: ${label} ${revision.name} is waiting for review`,
        text: `${actor.displayName} sent ${label} (${revision.name}, ${revision.formula}) to the review desk.\nChecks: ${revision.checksWorst}.\n`,
      });
    }
    return viewOf(m, entry, await revisionsRepository(m).findOneByOrFail({ id }));
  });
}

/**
 * A new draft for an entry: a copy of its current published revision, or (curators) of any
 * earlier revision to restore its content. The old revisions are never touched.
 */
export async function newRevision(
  ds: DataSource,
  actor: SessionUser,
  accession: string,
  body: { fromRevision?: number | undefined; changeNote?: string | undefined },
): Promise<RevisionView> {
  return ds.transaction(async (m) => {
    const entry = await lockEntry(m, accession);
    if (!entry) throw notFound(`Entry ${accession}`);
    const all = await revisionsRepository(m).find({ where: { entryId: entry.id }, order: { number: 'ASC' } });
    const open = all.find((r) => r.state === 'draft' || r.state === 'in_review' || r.state === 'needs_changes');
    if (open) {
      throw new AppError('OPEN_REVISION_EXISTS', 409, `${accession} r${open.number} is still ${open.state}; finish it first`, {
        details: { revision: open.number, state: open.state },
      });
    }
    let source: RevisionRow | undefined;
    if (body.fromRevision !== undefined) {
      if (!roleAtLeast(actor.role, 'curator')) {
        throw new AppError('FORBIDDEN', 403, 'Restoring an earlier revision needs the curator role');
      }
      source = all.find((r) => r.number === body.fromRevision);
      if (!source) throw notFound(`${accession} r${body.fromRevision}`);
    } else {
      source = all.find((r) => r.state === 'published');
      if (!source) {
        throw new AppError('NOTHING_PUBLISHED', 409, `${accession} has no published revision to start from`);
      }
    }
    if (entry.withdrawnAt && body.fromRevision === undefined) {
      throw new AppError('ENTRY_WITHDRAWN', 409, `${accession} was withdrawn; a curator can restore one of its revisions`);
    }
    const number = Math.max(...all.map((r) => r.number)) + 1;
    const changeNote =
      body.changeNote ?? (body.fromRevision !== undefined ? `Restored the content of r${body.fromRevision}` : '');
    const columns = toContentColumns({ ...toContent(source), changeNote });
    const created = await revisionsRepository(m).save(
      revisionsRepository(m).create({
        ...columns,
        entryId: entry.id,
        number,
        state: 'draft',
        lockVersion: 1,
        simulated: source.simulated,
        restoredFrom: body.fromRevision ?? null,
        authorId: actor.id,
      }),
    );
    await recordAudit(m, {
      actorId: actor.id,
      action: body.fromRevision !== undefined ? 'revision.restored' : 'revision.created',
      subjectType: 'revision',
      subjectId: `${accession} r${number}`,
      data: { from: source.number },
    });
    return viewOf(m, entry, await revisionsRepository(m).findOneByOrFail({ id: created.id }));
  });
}

/** An entry with the revision asked for (default: the current published one, else the newest the viewer may see). */
export async function getEntry(
  ds: DataSource,
  viewer: SessionUser,
  accession: string,
  revisionNumber?: number,
): Promise<EntryView> {
  const m = ds.manager;
  const entry = await entriesRepository(m).findOneBy({ accession });
  if (!entry) throw notFound(`Entry ${accession}`);
  const rows = (await revisionsRepository(m).find({ where: { entryId: entry.id }, order: { number: 'ASC' } })).filter((r) =>
    canSee(viewer, r),
  );
  if (rows.length === 0) throw notFound(`Entry ${accession}`);
  let chosen: RevisionRow | undefined;
  if (revisionNumber !== undefined) {
    chosen = rows.find((r) => r.number === revisionNumber);
    if (!chosen) throw notFound(`${accession} r${revisionNumber}`);
  } else {
    chosen = rows.find((r) => r.state === 'published') ?? rows.findLast((r) => r.state === 'withdrawn') ?? rows.at(-1)!;
  }
  const views = await revisionViews(m, entry, rows);
  const editions: { label: string; revision: number; createdAt: Date }[] = await m.query(
    `SELECT ed.label, r.number AS revision, ed.created_at AS "createdAt"
       FROM edition_revisions er JOIN editions ed ON ed.id = er.edition_id JOIN revisions r ON r.id = er.revision_id
      WHERE er.entry_id = $1 ORDER BY ed.created_at DESC, ed.id DESC`,
    [entry.id],
  );
  return {
    accession: entry.accession,
    createdAt: entry.createdAt.toISOString(),
    withdrawnAt: entry.withdrawnAt ? entry.withdrawnAt.toISOString() : null,
    withdrawnReason: entry.withdrawnReason,
    revision: views.find((v) => v.id === chosen.id)!,
    revisions: views.map(toRevisionSummary),
    editions: editions.map((e) => ({ label: e.label, revision: e.revision, createdAt: new Date(e.createdAt).toISOString() })),
  };
}

export async function getRevisionById(ds: DataSource, viewer: SessionUser, id: string): Promise<RevisionView> {
  const r = await revisionsRepository(ds.manager).findOneBy({ id });
  if (!r || !canSee(viewer, r)) throw notFound(`Revision ${id}`);
  const entry = await entriesRepository(ds.manager).findOneByOrFail({ id: r.entryId });
  return viewOf(ds.manager, entry, r);
}

/** Withdraws (retires) an entry: its published revision becomes withdrawn; history stays. */
export async function withdrawEntry(ds: DataSource, actor: SessionUser, accession: string, reason: string): Promise<EntryView> {
  await ds.transaction(async (m) => {
    const entry = await lockEntry(m, accession);
    if (!entry) throw notFound(`Entry ${accession}`);
    if (entry.withdrawnAt) throw new AppError('ALREADY_WITHDRAWN', 409, `${accession} was already withdrawn`);
    const published = await revisionsRepository(m).findOne({ where: { entryId: entry.id, state: 'published' }, lock: { mode: 'pessimistic_write' } });
    if (!published) throw new AppError('NOTHING_PUBLISHED', 409, `${accession} has no published revision to withdraw`);
    const now = new Date();
    await revisionsRepository(m).update({ id: published.id }, { state: 'withdrawn', lockVersion: published.lockVersion + 1, decidedAt: now, updatedAt: now });
    await entriesRepository(m).update({ id: entry.id }, { withdrawnAt: now, withdrawnReason: reason });
    await recordAudit(m, {
      actorId: actor.id,
      action: 'entry.withdrawn',
      subjectType: 'entry',
      subjectId: accession,
      data: { revision: published.number, from: 'published', to: 'withdrawn', reason },
    });
    const authorMail: { email: string | null }[] = await m.query(`SELECT email FROM users WHERE id = $1`, [published.authorId]);
    if (authorMail[0]?.email && published.authorId !== actor.id) {
      await queueMail(m, {
        to: authorMail[0].email,
        subject: `Ionfolio: ${accession} was withdrawn`,
        text: `${actor.displayName} withdrew ${accession} (${published.name}).\nReason: ${reason}\n`,
      });
    }
    await m.query(`SELECT pg_notify('ionfolio_library', $1)`, [JSON.stringify({ accession, change: 'withdrawn' })]);
  });
  return getEntry(ds, actor, accession);
}
