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

/**
 * Blocks per message to a worker. A chunk is cut into slices that go to whichever worker is free,
 * so neither waits for the other at the end of a chunk; a slice costs a few milliseconds.
 */
export const SLICE_BLOCKS = 25;
/** Slices a worker holds at once: when it finishes one, the next is already in its queue. */
const SLICES_PER_WORKER = 2;

interface Slice {
  blocks: UploadedBlock[];
  resolve: (o: Outcome[]) => void;
  reject: (e: unknown) => void;
}

function startWorker(): Worker {
  return startModuleWorker(new URL('./prepare-worker', import.meta.url), import.meta.url);
}

/**
 * A worker per core (at most four) for the length of one import. The consistency checks are pure
 * CPU work (most of it the molecular-ion reading), so they are the part of an import that more
 * threads speed up; the database writes stay on the main thread. Slices are handed out in the
 * order they were asked for, so the chunk asked for first is ready first.
 */
export function workerPreparer(
  log: Logger,
  fallback: (blocks: UploadedBlock[]) => Promise<PreparedBlock[]>,
): BlockPreparer {
  const count = Math.max(1, Math.min(4, availableParallelism()));
  const waiting: Slice[] = [];
  let nextId = 0;
  let broken = false;
  let closed = false;

  /** Stops handing out slices and fails every slice not answered yet. */
  const abandon = (err: unknown) => {
    broken = true;
    for (const s of waiting.splice(0)) s.reject(err);
    for (const w of pool) {
      for (const s of w.inFlight.values()) s.reject(err);
      w.inFlight.clear();
    }
  };
  const fail = (err: unknown) => {
    if (!broken) log.warn({ err }, 'import check worker failed; checking on the main thread');
    abandon(err);
  };

  const dispatch = () => {
    for (const w of pool) {
      while (!broken && waiting.length > 0 && w.inFlight.size < SLICES_PER_WORKER) {
        const slice = waiting.shift()!;
        const id = nextId++;
        try {
          w.worker.postMessage({ id, blocks: slice.blocks } satisfies PrepareRequest);
          w.inFlight.set(id, slice);
        } catch (err) {
          // A block that cannot be copied to a thread: its chunk is prepared on the main thread.
          slice.reject(err);
        }
      }
    }
  };

  const pool = Array.from({ length: count }, () => {
    const entry = { worker: startWorker(), inFlight: new Map<number, Slice>() };
    entry.worker.on('message', ({ id, prepared }: { id: number; prepared: Outcome[] }) => {
      entry.inFlight.get(id)?.resolve(prepared);
      entry.inFlight.delete(id);
      dispatch();
    });
    entry.worker.on('error', fail);
    entry.worker.on('exit', (code) => {
      if (code !== 0) fail(new Error(`import check worker exited with code ${code}`));
    });
    return entry;
  });

  const onWorkers = (blocks: UploadedBlock[]) =>
    new Promise<Outcome[]>((resolve, reject) => {
      waiting.push({ blocks, resolve, reject });
    });

  return {
    async prepare(blocks) {
      if (broken) return fallback(blocks);
      const slices: Promise<Outcome[]>[] = [];
      for (let start = 0; start < blocks.length; start += SLICE_BLOCKS)
        slices.push(onWorkers(blocks.slice(start, start + SLICE_BLOCKS)));
      dispatch();
      try {
        const outcomes = (await Promise.all(slices)).flat();
        return outcomes.map((o, i) => ({ ...o, block: blocks[i]! }) as PreparedBlock);
      } catch (err) {
        // Work cut off by close() is not wanted any more; a failed worker's is done here instead.
        if (closed) throw err;
        return fallback(blocks);
      }
    },
    async close() {
      closed = true;
      abandon(new Error('the import check workers were closed'));
      await Promise.all(pool.map((w) => w.worker.terminate()));
    },
  };
}
