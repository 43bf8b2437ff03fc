import type { DataSource } from 'typeorm';
import type { Logger } from 'pino';
import { ZodError } from 'zod';
import { RevisionContentSchema } from '@ionfolio/contracts';
import { AppError, notFound } from '../../shared/app-error';
import { recordAudit } from '../audit/audit.service';
import type { SessionUser } from '../users/users.schemas';
import { createEntry } from '../entries/entries.service';
import type { UploadedBlock } from '../uploads/spectrum-file';

export interface ImportResult {
  block: number;
  title: string;
  status: 'imported' | 'rejected';
  accession?: string;
  reason?: string;
}

function blockContent(b: UploadedBlock) {
  return RevisionContentSchema.parse({
    name: b.title.trim() || `Block ${b.index}`,
    formula: b.formula ?? '',
    peaks: b.peaks,
    conditions: {
      ionizationEnergyEv: b.ionizationEnergyEv ?? 70,
      ...(b.spectrometerType ? { instrumentType: b.spectrometerType.slice(0, 120) } : {}),
      ...(b.inlet ? { inlet: b.inlet.slice(0, 120) } : {}),
    },
    retentionIndex: b.retentionIndex !== undefined ? { value: b.retentionIndex, column: 'non-polar' } : null,
    casRn: b.casRn ?? null,
    changeNote: 'Bulk import',
  });
}

const reasonOf = (err: unknown) =>
  err instanceof ZodError
    ? err.issues.map((i) => `${i.path.join('.') || 'block'}: ${i.message}`).join('; ')
    : err instanceof AppError
      ? err.message
      : 'could not be stored';

/** Starts a bulk import job; blocks are written one transaction each, so a bad block writes nothing. */
export async function startImport(
  ds: DataSource,
  log: Logger,
  actor: SessionUser,
  fileName: string,
  blocks: UploadedBlock[],
  target: 'draft' | 'in_review',
) {
  const rows: { id: string }[] = await ds.query(
    `INSERT INTO import_jobs (created_by, file_name, target, status, total) VALUES ($1, $2, $3, 'running', $4) RETURNING id`,
    [actor.id, fileName, target, blocks.length],
  );
  const id = rows[0]!.id;
  void runImport(ds, actor, id, blocks, target).catch(async (err: unknown) => {
    log.error({ err, job: id }, 'import failed');
    await ds.query(`UPDATE import_jobs SET status = 'failed', error = $2, finished_at = now() WHERE id = $1`, [id, 'the import stopped unexpectedly']).catch(() => undefined);
  });
  return getImport(ds, actor, id);
}

async function runImport(ds: DataSource, actor: SessionUser, id: string, blocks: UploadedBlock[], target: 'draft' | 'in_review') {
  const results: ImportResult[] = [];
  let imported = 0;
  for (const [i, b] of blocks.entries()) {
    try {
      const content = blockContent(b);
      const accession = await ds.transaction(async (m) => {
        const view = await createEntry(ds, actor, content, { manager: m });
        if (target === 'in_review') {
          await m.query(`UPDATE revisions SET state = 'in_review', submitted_at = now(), lock_version = lock_version + 1 WHERE id = $1`, [view.id]);
          await recordAudit(m, { actorId: actor.id, action: 'revision.submitted', subjectType: 'revision', subjectId: view.label, data: { from: 'draft', to: 'in_review', import: id } });
        }
        return view.accession;
      });
      imported++;
      results.push({ block: b.index, title: b.title, status: 'imported', accession });
    } catch (err) {
      results.push({ block: b.index, title: b.title, status: 'rejected', reason: reasonOf(err) });
    }
    if ((i + 1) % 10 === 0 || i === blocks.length - 1) {
      await ds.query(`UPDATE import_jobs SET done = $2, imported = $3, rejected = $4, results = $5 WHERE id = $1`, [
        id,
        i + 1,
        imported,
        i + 1 - imported,
        JSON.stringify(results),
      ]);
    }
  }
  await ds.transaction(async (m) => {
    await m.query(`UPDATE import_jobs SET status = 'done', finished_at = now() WHERE id = $1`, [id]);
    await recordAudit(m, { actorId: actor.id, action: 'import.finished', subjectType: 'import', subjectId: id, data: { total: blocks.length, imported } });
  });
}

export async function getImport(ds: DataSource, viewer: SessionUser, id: string) {
  const rows: Record<string, unknown>[] = await ds.query(
    `SELECT id, status, total, done, imported, rejected, file_name AS "fileName", target, error, results,
            created_at AS "createdAt", finished_at AS "finishedAt", created_by AS "createdBy"
       FROM import_jobs WHERE id = $1`,
    [id],
  );
  const row = rows[0];
  if (!row || (row.createdBy !== viewer.id && viewer.role !== 'admin' && viewer.role !== 'curator')) throw notFound(`Import ${id}`);
  const { results, createdBy: _c, ...job } = row;
  return { job, results };
}
