import { availableParallelism } from 'node:os';
import type { Worker } from 'node:worker_threads';
import type { Logger } from 'pino';
import { startModuleWorker } from '../../shared/module-worker';
import type { UploadedBlock } from '../uploads/spectrum-file';
import type { PreparedBlock } from './import-block';
import type { PrepareRequest } from './prepare-worker';

type Outcome = { ok: true; content: unknown; columns: unknown } | { ok: false; reason: string };

/** Prepares blocks on several threads; falls back to the calling thread if a worker fails. */
export interface BlockPreparer {
  prepare(blocks: UploadedBlock[]): Promise<PreparedBlock[]>;
  close(): Promise<void>;
}

function startWorker(): Worker {
  return startModuleWorker(new URL('./prepare-worker', import.meta.url), import.meta.url);
}

/**
 * A worker per core (at most four) for the length of one import. The consistency checks are pure
 * CPU work (about 12 ms a block, most of it the molecular-ion reading), so they are the part of an
 * import that more threads speed up; the database writes stay on the main thread.
 */
export function workerPreparer(
  log: Logger,
  fallback: (blocks: UploadedBlock[]) => Promise<PreparedBlock[]>,
): BlockPreparer {
  const count = Math.max(1, Math.min(4, availableParallelism()));
  const pending = new Map<number, { resolve: (o: Outcome[]) => void; reject: (e: unknown) => void }>();
  let nextId = 0;
  let broken = false;
  const workers = Array.from({ length: count }, () => {
    const w = startWorker();
    w.on('message', ({ id, prepared }: { id: number; prepared: Outcome[] }) => {
      pending.get(id)?.resolve(prepared);
      pending.delete(id);
    });
    const fail = (err: unknown) => {
      if (!broken) log.warn({ err }, 'import check worker failed; checking on the main thread');
      broken = true;
      for (const p of pending.values()) p.reject(err);
      pending.clear();
    };
    w.on('error', fail);
    w.on('exit', (code) => {
      if (code !== 0) fail(new Error(`import check worker exited with code ${code}`));
    });
    return w;
  });

  const onWorker = (w: Worker, blocks: UploadedBlock[]) =>
    new Promise<Outcome[]>((resolve, reject) => {
      const id = nextId++;
      pending.set(id, { resolve, reject });
      w.postMessage({ id, blocks } satisfies PrepareRequest);
    });

  return {
    async prepare(blocks) {
      if (broken) return fallback(blocks);
      const share = Math.ceil(blocks.length / workers.length);
      const slices = workers
        .map((w, i) => [w, blocks.slice(i * share, (i + 1) * share)] as const)
        .filter(([, s]) => s.length > 0);
      try {
        const outcomes = (await Promise.all(slices.map(([w, s]) => onWorker(w, s)))).flat();
        return outcomes.map((o, i) => ({ ...o, block: blocks[i]! }) as PreparedBlock);
      } catch {
        return fallback(blocks);
      }
    },
    async close() {
      broken = true;
      await Promise.all(workers.map((w) => w.terminate()));
    },
  };
}
