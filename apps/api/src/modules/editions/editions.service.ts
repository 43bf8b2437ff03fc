import { In, type DataSource } from 'typeorm';
import { writeJcamp } from '@ionfolio/chem';
import { AppError, notFound } from '../../shared/app-error';
import { recordAudit } from '../audit/audit.service';
import type { SessionUser } from '../users/users.schemas';
import { entriesRepository, loadUserRefs, revisionsRepository } from '../entries/entries.repository';
import { toRevisionView } from '../entries/revision-view';
import { revisionToJcampInput } from '../entries/revision-jcamp';

export interface EditionView {
  label: string;
  notes: string;
  revisionCount: number;
  createdAt: string;
  createdBy: string;
}

interface EditionRow {
  id: number;
  label: string;
  notes: string;
  revisionCount: number;
  createdAt: Date;
  createdBy: string;
}

const SELECT_EDITION = `SELECT e.id, e.label, e.notes, e.revision_count AS "revisionCount", e.created_at AS "createdAt",
  u.display_name AS "createdBy" FROM editions e JOIN users u ON u.id = e.created_by`;

const toView = (e: EditionRow): EditionView => ({
  label: e.label,
  notes: e.notes,
  revisionCount: e.revisionCount,
  createdAt: new Date(e.createdAt).toISOString(),
  createdBy: e.createdBy,
});

/** Freezes the published revisions of this moment as a named edition, in one transaction. */
export async function freezeEdition(ds: DataSource, actor: SessionUser, label: string, notes: string): Promise<EditionView> {
  return ds.transaction(async (m) => {
    const exists = await m.query(`SELECT 1 FROM editions WHERE label = $1`, [label]);
    if (exists.length) throw new AppError('EDITION_EXISTS', 409, `An edition named ${label} exists already`);
    // Block publishing while the snapshot is taken, so the edition is one consistent moment.
    await m.query(`LOCK TABLE revisions IN SHARE MODE`);
    const inserted: { id: number }[] = await m.query(
      `INSERT INTO editions (label, notes, revision_count, created_by)
       VALUES ($1, $2, (SELECT count(*) FROM revisions WHERE state = 'published'), $3) RETURNING id`,
      [label, notes, actor.id],
    );
    const id = inserted[0]!.id;
    await m.query(
      `INSERT INTO edition_revisions (edition_id, revision_id, entry_id)
       SELECT $1, id, entry_id FROM revisions WHERE state = 'published'`,
      [id],
    );
    await recordAudit(m, { actorId: actor.id, action: 'edition.frozen', subjectType: 'edition', subjectId: label, data: { notes } });
    const rows: EditionRow[] = await m.query(`${SELECT_EDITION} WHERE e.id = $1`, [id]);
    return toView(rows[0]!);
  });
}

export async function listEditions(ds: DataSource): Promise<EditionView[]> {
  const rows: EditionRow[] = await ds.query(`${SELECT_EDITION} ORDER BY e.created_at DESC, e.id DESC`);
  return rows.map(toView);
}

async function findEdition(ds: DataSource, label: string): Promise<EditionRow> {
  const rows: EditionRow[] = await ds.query(`${SELECT_EDITION} WHERE e.label = $1`, [label]);
  if (!rows[0]) throw notFound(`Edition ${label}`);
  return rows[0];
}

interface MemberRow {
  entryId: number;
  accession: string;
  revision: number;
  name: string;
  formula: string;
}

async function members(ds: DataSource, editionId: number): Promise<MemberRow[]> {
  return ds.query(
    `SELECT er.entry_id AS "entryId", e.accession, r.number AS revision, r.name, r.formula
       FROM edition_revisions er JOIN revisions r ON r.id = er.revision_id JOIN entries e ON e.id = er.entry_id
      WHERE er.edition_id = $1 ORDER BY e.accession`,
    [editionId],
  );
}

/** An edition with what changed since the edition before it: entries added, changed (new revision) and withdrawn. */
export async function getEdition(ds: DataSource, label: string) {
  const edition = await findEdition(ds, label);
  const prevRows: EditionRow[] = await ds.query(
    `${SELECT_EDITION} WHERE e.id < $1 ORDER BY e.id DESC LIMIT 1`,
    [edition.id],
  );
  const prev = prevRows[0];
  const now = await members(ds, edition.id);
  const before = prev ? await members(ds, prev.id) : [];
  const beforeByEntry = new Map(before.map((m) => [m.entryId, m]));
  const nowByEntry = new Map(now.map((m) => [m.entryId, m]));
  const item = (m: MemberRow, previousRevision?: number) => ({
    accession: m.accession,
    name: m.name,
    formula: m.formula,
    revision: m.revision,
    ...(previousRevision !== undefined ? { previousRevision } : {}),
  });
  const added = now.filter((m) => !beforeByEntry.has(m.entryId)).map((m) => item(m));
  const changed = now
    .filter((m) => beforeByEntry.has(m.entryId) && beforeByEntry.get(m.entryId)!.revision !== m.revision)
    .map((m) => item(m, beforeByEntry.get(m.entryId)!.revision));
  const withdrawn = before.filter((m) => !nowByEntry.has(m.entryId)).map((m) => item(m));
  return { edition: toView(edition), previous: prev ? prev.label : null, diff: { added, changed, withdrawn } };
}

async function editionRevisionViews(ds: DataSource, label: string) {
  const edition = await findEdition(ds, label);
  const ids: { revisionId: string }[] = await ds.query(
    `SELECT er.revision_id AS "revisionId" FROM edition_revisions er JOIN entries e ON e.id = er.entry_id WHERE er.edition_id = $1 ORDER BY e.accession`,
    [edition.id],
  );
  const rows = ids.length ? await revisionsRepository(ds.manager).findBy({ id: In(ids.map((i) => i.revisionId)) }) : [];
  const entryIds = [...new Set(rows.map((r) => r.entryId))];
  const entries = new Map((entryIds.length ? await entriesRepository(ds.manager).findBy({ id: In(entryIds) }) : []).map((e) => [e.id, e.accession]));
  const users = await loadUserRefs(ds.manager, rows.flatMap((r) => [r.authorId, r.reviewerId]));
  return { edition, views: rows.map((r) => toRevisionView(r, entries.get(r.entryId)!, users)).sort((a, b) => a.accession.localeCompare(b.accession)) };
}

/** The whole edition as one JCAMP-DX LINK file: one child block per revision. */
export async function editionJcamp(ds: DataSource, actor: SessionUser, label: string): Promise<string> {
  const { views } = await editionRevisionViews(ds, label);
  const blocks = views.map((v, i) => {
    const input = revisionToJcampInput(v);
    return writeJcamp({ ...input, labels: { ...input.labels, BLOCK_ID: String(i + 1) } });
  });
  await ds.transaction((m) => recordAudit(m, { actorId: actor.id, action: 'export.edition_jcamp', subjectType: 'edition', subjectId: label, data: { blocks: views.length } }));
  return [
    `##TITLE=Ionfolio edition ${label}`,
    '##JCAMP-DX=5.01',
    '##DATA TYPE=LINK',
    `##BLOCKS=${views.length}`,
    ...blocks.map((b) => b.trimEnd()),
    '##END=',
    '',
  ].join('\n');
}

const csvCell = (v: unknown) => {
  const s = v === null || v === undefined ? '' : String(v);
  // Cells that a spreadsheet would run as a formula are quoted with a leading apostrophe.
  const safe = /^[=+\-@\t\r]/.test(s) ? `'${s}` : s;
  return /[",\n\r]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
};

export async function editionCsv(ds: DataSource, actor: SessionUser, label: string): Promise<string> {
  const { views } = await editionRevisionViews(ds, label);
  const header = ['accession', 'revision', 'name', 'formula', 'nominal_mass', 'monoisotopic_mass', 'base_peak_mz', 'peaks', 'retention_index', 'ri_column', 'cas_rn', 'published_at', 'content_sha256', 'simulated'];
  const lines = views.map((v) =>
    [v.accession, v.number, v.name, v.formula, v.nominalMass, v.monoisotopicMass.toFixed(6), v.basePeakMz, v.peakCount, v.retentionIndex?.value ?? '', v.retentionIndex?.column ?? '', v.casRn ?? '', v.publishedAt ?? '', v.contentSha256, v.simulated]
      .map(csvCell)
      .join(','),
  );
  await ds.transaction((m) => recordAudit(m, { actorId: actor.id, action: 'export.edition_csv', subjectType: 'edition', subjectId: label, data: { rows: views.length } }));
  return [header.join(','), ...lines, ''].join('\n');
}
