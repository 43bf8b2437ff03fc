import type { DataSource } from 'typeorm';
import type { Logger } from 'pino';
import { notFound } from '../../shared/app-error';
import { recordAudit } from '../audit/audit.service';
import type { SessionUser } from '../users/users.schemas';
import type { UploadedBlock } from '../uploads/spectrum-file';
import type { PreparedBlock } from './import-block';
import { CHUNK_BLOCKS, importChunk, prepareChunk } from './import-chunk';
import type { ImportTarget } from './import-writer';
import { workerPreparer } from './prepare-pool';

export type { ImportResult } from './import-block';

/**
 * Starts a bulk import job. A bad block is rejected with its reason and writes nothing; the good
 * ones are written a chunk per transaction (see import-chunk.ts).
 */
export async function startImport(
  ds: DataSource,
  log: Logger,
  actor: SessionUser,
  fileName: string,
  blocks: UploadedBlock[],
  target: ImportTarget,
) {
  const rows: { id: string }[] = await ds.query(
    `INSERT INTO import_jobs (created_by, file_name, target, status, total) VALUES ($1, $2, $3, 'running', $4) RETURNING id`,
    [actor.id, fileName, target, blocks.length],
  );
  const id = rows[0]!.id;
  void runImport(ds, log, actor, id, blocks, target).catch(async (err: unknown) => {
    log.error({ err, job: id }, 'import failed');
    await ds
      .query(`UPDATE import_jobs SET status = 'failed', error = $2, finished_at = now() WHERE id = $1`, [
        id,
        'the import stopped unexpectedly',
      ])
      .catch(() => undefined);
  });
  return getImport(ds, actor, id);
}

/**
 * Chunks asked of the checks ahead of the one being written: the workers keep checking while the
 * main thread writes, and a chunk that checks slowly does not leave them idle.
 */
const CHUNKS_AHEAD = 2;

/**
 * Checks the blocks and writes them chunk by chunk, each chunk in one transaction; the next chunks
 * are checked (on worker threads when the file has more than one chunk) while one is being
 * written.
 */
async function runImport(
  ds: DataSource,
  log: Logger,
  actor: SessionUser,
  id: string,
  blocks: UploadedBlock[],
  target: ImportTarget,
) {
  const job = { ds, log, actor, id, target };
  const progress = { done: 0, imported: 0 };
  const preparer = blocks.length > CHUNK_BLOCKS ? workerPreparer(log, prepareChunk) : undefined;
  const chunkAt = (start: number) => {
    const chunk = blocks.slice(start, start + CHUNK_BLOCKS);
    return preparer ? preparer.prepare(chunk) : prepareChunk(chunk);
  };
  const ahead: Promise<PreparedBlock[]>[] = [];
  let asked = 0;
  const askAhead = () => {
    for (; ahead.length < CHUNKS_AHEAD && asked < blocks.length; asked += CHUNK_BLOCKS) ahead.push(chunkAt(asked));
  };
  try {
    askAhead();
    for (let prepared = ahead.shift(); prepared; prepared = ahead.shift()) {
      const chunk = await prepared;
      askAhead();
      await importChunk(job, chunk, progress);
    }
  } finally {
    // Chunks still being checked when a write failed are dropped with the workers.
    for (const p of ahead) p.catch(() => undefined);
    await preparer?.close();
  }
  await ds.transaction(async (m) => {
    await m.query(`UPDATE import_jobs SET status = 'done', finished_at = now() WHERE id = $1`, [id]);
    await recordAudit(m, {
      actorId: actor.id,
      action: 'import.finished',
      subjectType: 'import',
      subjectId: id,
      data: { total: blocks.length, imported: progress.imported },
    });
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
  if (!row || (row.createdBy !== viewer.id && viewer.role !== 'admin' && viewer.role !== 'curator'))
    throw notFound(`Import ${id}`);
  const { results, createdBy: _c, ...job } = row;
  return { job, results };
}
