import { setImmediate as nextTurn } from 'node:timers/promises';
import type { DataSource, EntityManager } from 'typeorm';
import type { Logger } from 'pino';
import type { SessionUser } from '../users/users.schemas';
import type { UploadedBlock } from '../uploads/spectrum-file';
import { prepareBlock, reasonOf, type ImportResult, type PreparedBlock } from './import-block';
import { importOneBlock, writeImportedEntries, type ImportTarget, type ValidBlock } from './import-writer';

/** Blocks written per transaction: a few hundred rows per statement, one job update per chunk. */
export const CHUNK_BLOCKS = 250;
/**
 * The consistency checks cost about 0.5 ms a block (a few ms for a rich halogen cluster); yielding
 * every 16 blocks keeps the API answering other requests while a file is checked here.
 */
const BLOCKS_PER_TURN = 16;

/** Validates and prepares the blocks of one chunk in order, letting other work run in between. */
export async function prepareChunk(blocks: UploadedBlock[]): Promise<PreparedBlock[]> {
  const prepared: PreparedBlock[] = [];
  for (const [i, block] of blocks.entries()) {
    if (i > 0 && i % BLOCKS_PER_TURN === 0) await nextTurn();
    prepared.push(prepareBlock(block));
  }
  return prepared;
}

export interface ImportJobRef {
  ds: DataSource;
  log: Logger;
  actor: SessionUser;
  id: string;
  target: ImportTarget;
}

/** Counts so far, kept by the caller across chunks. */
export interface ImportProgress {
  done: number;
  imported: number;
}

async function saveProgress(
  m: EntityManager,
  id: string,
  progress: ImportProgress,
  results: ImportResult[],
): Promise<void> {
  await m.query(
    `UPDATE import_jobs SET done = $2, imported = $3, rejected = $4, results = results || $5::jsonb WHERE id = $1`,
    [id, progress.done, progress.imported, progress.done - progress.imported, JSON.stringify(results)],
  );
}

const rejected = (p: Extract<PreparedBlock, { ok: false }>): ImportResult => ({
  block: p.block.index,
  title: p.block.title,
  status: 'rejected',
  reason: p.reason,
});

const imported = (b: ValidBlock, accession: string): ImportResult => ({
  block: b.block.index,
  title: b.block.title,
  status: 'imported',
  accession,
});

/**
 * Writes one chunk: all its valid blocks, its results and the job's counts in a single
 * transaction. Should that transaction fail, nothing of it stays and each valid block is written
 * again in a transaction of its own, so only the block at fault is rejected.
 */
export async function importChunk(
  job: ImportJobRef,
  prepared: PreparedBlock[],
  progress: ImportProgress,
): Promise<void> {
  const valid = prepared.filter((p): p is ValidBlock => p.ok);
  const after = { done: progress.done + prepared.length, imported: progress.imported + valid.length };
  try {
    await job.ds.transaction(async (m) => {
      const accessions = await writeImportedEntries(m, job.actor, job.id, valid, job.target);
      const byBlock = new Map(valid.map((b, i) => [b, accessions[i]!]));
      const results = prepared.map((p) => (p.ok ? imported(p, byBlock.get(p)!) : rejected(p)));
      await saveProgress(m, job.id, after, results);
    });
    Object.assign(progress, after);
    return;
  } catch (err) {
    job.log.warn(
      { err, job: job.id, firstBlock: prepared[0]?.block.index },
      'import chunk failed; writing its blocks one at a time',
    );
  }
  const results: ImportResult[] = [];
  let chunkImported = 0;
  for (const p of prepared) {
    if (!p.ok) {
      results.push(rejected(p));
      continue;
    }
    try {
      results.push(imported(p, await importOneBlock(job.ds, job.actor, job.id, p, job.target)));
      chunkImported++;
    } catch (err) {
      results.push(rejected({ block: p.block, ok: false, reason: reasonOf(err) }));
    }
  }
  Object.assign(progress, {
    done: progress.done + prepared.length,
    imported: progress.imported + chunkImported,
  });
  await saveProgress(job.ds.manager, job.id, progress, results);
}
