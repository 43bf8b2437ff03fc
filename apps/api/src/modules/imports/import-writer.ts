import type { DataSource, EntityManager } from 'typeorm';
import { recordAudit } from '../audit/audit.service';
import { createEntry } from '../entries/entries.service';
import type { SessionUser } from '../users/users.schemas';
import type { PreparedBlock } from './import-block';

export type ImportTarget = 'draft' | 'in_review';
export type ValidBlock = Extract<PreparedBlock, { ok: true }>;

interface AuditLine {
  action: string;
  subjectType: string;
  subjectId: string;
  data: Record<string, unknown>;
}

/** Many audit lines in one statement, in the order given, inside the caller's transaction. */
async function recordAuditLines(m: EntityManager, actorId: string, lines: AuditLine[]): Promise<void> {
  if (lines.length === 0) return;
  await m.query(
    `INSERT INTO audit_events (actor_id, action, subject_type, subject_id, data)
     SELECT $1, t.action, t.subject_type, t.subject_id, t.data
       FROM json_to_recordset($2::json) AS t(ord int, action varchar, subject_type varchar, subject_id varchar, data jsonb)
      ORDER BY t.ord`,
    [
      actorId,
      JSON.stringify(
        lines.map((l, ord) => ({
          ord,
          action: l.action,
          subject_type: l.subjectType,
          subject_id: l.subjectId,
          data: l.data,
        })),
      ),
    ],
  );
}

/** The audit lines createEntry (and, for review, the submission) writes for one new entry. */
function auditLinesOf(jobId: string, accession: string, b: ValidBlock, target: ImportTarget): AuditLine[] {
  const lines: AuditLine[] = [
    {
      action: 'entry.created',
      subjectType: 'entry',
      subjectId: accession,
      data: { revision: 1, name: b.columns.name, formula: b.columns.formula },
    },
  ];
  if (target === 'in_review') {
    lines.push({
      action: 'revision.submitted',
      subjectType: 'revision',
      subjectId: `${accession} r1`,
      data: { from: 'draft', to: 'in_review', import: jobId },
    });
  }
  return lines;
}

/**
 * Writes many validated blocks inside the caller's transaction with one statement per table: the
 * entries (accessions from the table's own sequence, in block order), their r1 revisions with the
 * precomputed columns, and the audit lines. The rows are the ones createEntry writes one at a time;
 * for review, r1 is stored as the draft-then-submit of the one-at-a-time path leaves it (state
 * in_review, lock version 2, submitted now). Returns the accessions in block order.
 */
export async function writeImportedEntries(
  m: EntityManager,
  actor: SessionUser,
  jobId: string,
  blocks: ValidBlock[],
  target: ImportTarget,
): Promise<string[]> {
  if (blocks.length === 0) return [];
  const entries: { id: number; accession: string }[] = await m.query(
    `INSERT INTO entries (created_by) SELECT $1::uuid FROM generate_series(1, $2::int) RETURNING id, accession`,
    [actor.id, blocks.length],
  );
  // Rows take their serial id and accession in insertion order; RETURNING does not promise an order.
  entries.sort((a, b) => a.id - b.id);
  const rows = blocks.map(({ columns: c }, i) => ({
    entry_id: entries[i]!.id,
    name: c.name,
    synonyms: c.synonyms,
    formula: c.formula,
    nominal_mass: c.nominalMass,
    monoisotopic_mass: c.monoisotopicMass,
    structure: c.structure,
    structure_format: c.structureFormat,
    cas_rn: c.casRn,
    peaks: c.peaks,
    peak_count: c.peakCount,
    base_peak_mz: c.basePeakMz,
    conditions: c.conditions,
    retention_index: c.retentionIndex,
    retention_index_column: c.retentionIndexColumn,
    sample_notes: c.sampleNotes,
    change_note: c.changeNote,
    checks: c.checks,
    checks_worst: c.checksWorst,
    content_sha256: c.contentSha256,
  }));
  const inReview = target === 'in_review';
  await m.query(
    `INSERT INTO revisions (entry_id, number, state, lock_version, name, synonyms, formula, nominal_mass, monoisotopic_mass,
                            structure, structure_format, cas_rn, peaks, peak_count, base_peak_mz, conditions, retention_index,
                            retention_index_column, sample_notes, change_note, simulated, checks, checks_worst, content_sha256,
                            author_id, submitted_at)
     SELECT t.entry_id, 1, $2, $3, t.name, t.synonyms, t.formula, t.nominal_mass, t.monoisotopic_mass,
            t.structure, t.structure_format, t.cas_rn, t.peaks, t.peak_count, t.base_peak_mz, t.conditions, t.retention_index,
            t.retention_index_column, t.sample_notes, t.change_note, false, t.checks, t.checks_worst, t.content_sha256,
            $1, CASE WHEN $4 THEN now() END
       FROM json_to_recordset($5::json) AS t(
              entry_id int, name varchar, synonyms jsonb, formula varchar, nominal_mass int, monoisotopic_mass double precision,
              structure text, structure_format varchar, cas_rn varchar, peaks jsonb, peak_count int, base_peak_mz double precision,
              conditions jsonb, retention_index double precision, retention_index_column varchar, sample_notes text,
              change_note text, checks jsonb, checks_worst varchar, content_sha256 varchar)`,
    [actor.id, inReview ? 'in_review' : 'draft', inReview ? 2 : 1, inReview, JSON.stringify(rows)],
  );
  const accessions = entries.map((e) => e.accession);
  await recordAuditLines(
    m,
    actor.id,
    blocks.flatMap((b, i) => auditLinesOf(jobId, accessions[i]!, b, target)),
  );
  return accessions;
}

/**
 * One block in its own transaction through createEntry, as imports worked before batching: the
 * path a chunk falls back to when its transaction fails, so that good blocks still import and the
 * block at fault is rejected alone.
 */
export async function importOneBlock(
  ds: DataSource,
  actor: SessionUser,
  jobId: string,
  b: ValidBlock,
  target: ImportTarget,
): Promise<string> {
  return ds.transaction(async (m) => {
    const view = await createEntry(ds, actor, b.content, { manager: m });
    if (target === 'in_review') {
      await m.query(
        `UPDATE revisions SET state = 'in_review', submitted_at = now(), lock_version = lock_version + 1 WHERE id = $1`,
        [view.id],
      );
      await recordAudit(m, {
        actorId: actor.id,
        action: 'revision.submitted',
        subjectType: 'revision',
        subjectId: view.label,
        data: { from: 'draft', to: 'in_review', import: jobId },
      });
    }
    return view.accession;
  });
}
