import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import { notFound } from '../../shared/app-error';
import type { SessionUser } from '../users/users.schemas';
import { rankCandidates } from './identify.service';
import type { LibrarySearch } from './library-search';
import type { SearchPool } from './search-pool';
import type { UnknownSpectrum } from './batch-file';
import { BATCH_TOP, type BatchJobView, type BatchOptions, type BatchResult } from './batch.schemas';

/** Progress is written at most this often, so that a poll sees it move without a write per spectrum. */
const PROGRESS_EVERY_MS = 250;
/** A queued or running job untouched this long lost its process; any process may take it over. */
const ORPHAN_AFTER_S = 60;

interface JobRow {
  id: string;
  ownerId: string;
  status: BatchJobView['status'];
  options: BatchOptions;
  total: number;
  done: number;
  fileName: string | null;
  error: string | null;
  createdAt: Date;
  finishedAt: Date | null;
}

const JOB_COLUMNS = `id, owner_id AS "ownerId", status, options, total, done, file_name AS "fileName", error,
  created_at AS "createdAt", finished_at AS "finishedAt"`;

function toView(row: JobRow): BatchJobView {
  return {
    id: row.id,
    status: row.status,
    total: row.total,
    done: row.done,
    method: row.options.method,
    edition: row.options.edition ?? 'current',
    fileName: row.fileName,
    error: row.error,
    createdAt: row.createdAt.toISOString(),
    finishedAt: row.finishedAt?.toISOString() ?? null,
  };
}

export interface BatchRunner {
  submit(user: SessionUser, spectra: UnknownSpectrum[], options: BatchOptions, fileName?: string): Promise<BatchJobView>;
  get(user: SessionUser, id: string): Promise<{ job: BatchJobView; results: BatchResult[] }>;
  list(user: SessionUser): Promise<BatchJobView[]>;
  /** Takes over jobs whose process stopped (call at start). */
  resumeOrphans(): Promise<void>;
  /** Resolves when the jobs this process is running have finished. */
  idle(): Promise<void>;
}

/**
 * Batch identify jobs, stored in PostgreSQL (they outlive a page reload and belong to their creator)
 * and run in the background of this API process, one at a time, one spectrum after another (on the
 * search pool's workers when it can search there), yielding to the event loop between spectra so that
 * interactive calls stay quick.
 */
export function createBatchRunner(ds: DataSource, library: LibrarySearch, logger: Logger, pool?: SearchPool): BatchRunner {
  let chain: Promise<void> = Promise.resolve();

  async function run(id: string): Promise<void> {
    // TypeORM answers an UPDATE … RETURNING with [rows, affected count].
    const [claimed]: [(JobRow & { spectra: UnknownSpectrum[] })[], number] = await ds.query(
      `UPDATE identify_jobs SET status = 'running', updated_at = now()
       WHERE id = $1 AND (status = 'queued' OR (status = 'running' AND updated_at < now() - make_interval(secs => $2)))
       RETURNING ${JOB_COLUMNS}, spectra`,
      [id, ORPHAN_AFTER_S],
    );
    const job = claimed[0];
    if (!job) return;
    try {
      const index = await library.indexFor(job.options.edition);
      const results: BatchResult[] = [];
      let writtenMs = performance.now();
      for (const [i, unknown] of job.spectra.entries()) {
        const name = unknown.name ?? `spectrum ${i + 1}`;
        try {
          const candidates = await rankCandidates(index, unknown.peaks, job.options, BATCH_TOP, { pool });
          results.push({ index: i + 1, name, best: candidates[0] ?? null, candidates });
        } catch (err) {
          results.push({ index: i + 1, name, best: null, candidates: [], error: (err as Error).message });
        }
        if (performance.now() - writtenMs > PROGRESS_EVERY_MS) {
          await ds.query(`UPDATE identify_jobs SET done = $2, results = $3, updated_at = now() WHERE id = $1`, [id, results.length, JSON.stringify(results)]);
          writtenMs = performance.now();
        }
        await new Promise((resolve) => setImmediate(resolve));
      }
      await ds.query(
        `UPDATE identify_jobs SET status = 'done', done = $2, results = $3, updated_at = now(), finished_at = now() WHERE id = $1`,
        [id, results.length, JSON.stringify(results)],
      );
    } catch (err) {
      logger.error({ err, job: id }, 'batch identify job failed');
      await ds.query(`UPDATE identify_jobs SET status = 'failed', error = $2, updated_at = now(), finished_at = now() WHERE id = $1`, [
        id,
        (err as Error).message,
      ]);
    }
  }

  const enqueue = (id: string) => {
    chain = chain.then(() => run(id)).catch((err: unknown) => logger.error({ err, job: id }, 'batch identify runner failed'));
  };

  async function jobOf(user: SessionUser, id: string): Promise<JobRow & { results: BatchResult[] }> {
    const rows: (JobRow & { results: BatchResult[] })[] = await ds.query(
      `SELECT ${JOB_COLUMNS}, results FROM identify_jobs WHERE id = $1 AND owner_id = $2`,
      [id, user.id],
    );
    if (!rows[0]) throw notFound(`Batch job ${id}`);
    return rows[0];
  }

  return {
    async submit(user, spectra, options, fileName) {
      // An unknown edition is a 404 now, not a failed job later.
      await library.indexFor(options.edition);
      const rows: JobRow[] = await ds.query(
        `INSERT INTO identify_jobs (owner_id, options, spectra, total, file_name) VALUES ($1, $2, $3, $4, $5) RETURNING ${JOB_COLUMNS}`,
        [user.id, JSON.stringify(options), JSON.stringify(spectra), spectra.length, fileName ?? null],
      );
      const job = rows[0]!;
      enqueue(job.id);
      return toView(job);
    },
    async get(user, id) {
      const row = await jobOf(user, id);
      return { job: toView(row), results: row.results };
    },
    async list(user) {
      const rows: JobRow[] = await ds.query(
        `SELECT ${JOB_COLUMNS} FROM identify_jobs WHERE owner_id = $1 ORDER BY created_at DESC LIMIT 50`,
        [user.id],
      );
      return rows.map(toView);
    },
    async resumeOrphans() {
      const rows: { id: string }[] = await ds.query(
        `SELECT id FROM identify_jobs WHERE status IN ('queued', 'running') AND updated_at < now() - make_interval(secs => $1) ORDER BY created_at`,
        [ORPHAN_AFTER_S],
      );
      for (const { id } of rows) enqueue(id);
    },
    idle: () => chain,
  };
}

const csvCell = (value: string | number): string => {
  const text = String(value);
  return /[",\n\r]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
};

/** One row per unknown and rank (1–5): the best candidate first, as a spreadsheet reads it. */
export function batchCsv(job: BatchJobView, results: BatchResult[]): string {
  const header = ['unknown', 'unknown_name', 'rank', 'accession', 'revision', 'name', 'formula', 'nominal_mass', 'similarity', 'method', 'edition', 'error'];
  const lines = [header.join(',')];
  for (const r of results) {
    if (r.candidates.length === 0) {
      lines.push([r.index, r.name, '', '', '', '', '', '', '', job.method, job.edition, r.error ?? 'no candidate'].map(csvCell).join(','));
    }
    r.candidates.forEach((c, i) => {
      lines.push([r.index, r.name, i + 1, c.accession, c.revision, c.name, c.formula, c.nominalMass, c.similarity.toFixed(1), job.method, job.edition, ''].map(csvCell).join(','));
    });
  }
  return lines.join('\r\n') + '\r\n';
}
