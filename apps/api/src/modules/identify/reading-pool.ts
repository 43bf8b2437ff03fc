import type { Worker } from 'node:worker_threads';
import type { Logger } from 'pino';
import { ChemError, readMolecularIon, type ChemErrorCode, type MolecularIonReading, type PeakList } from '@ionfolio/chem';
import { startModuleWorker } from '../../shared/module-worker';

export interface ReadingRequest {
  id: number;
  peaks: PeakList;
}

export type ReadingReply =
  | { id: number; reading: MolecularIonReading | null }
  | { id: number; chemError: { code: ChemErrorCode; message: string; field?: string; position?: number } }
  | { id: number; failure: string };

/** The molecular-ion check of a query, or null when no cluster can be fitted (a RangeError in chem). */
export function readOnThisThread(peaks: PeakList): MolecularIonReading | null {
  try {
    return readMolecularIon(peaks);
  } catch (err) {
    if (err instanceof RangeError) return null;
    throw err;
  }
}

/** Reads queries on a worker thread; a ChemError comes back as one, to be answered as a 400. */
export interface ReadingPool {
  read(peaks: PeakList): Promise<MolecularIonReading | null>;
  /** Starts the worker now, so that the first identify does not wait for it to boot. */
  warm(): void;
  close(): Promise<void>;
}

/**
 * One worker thread for the molecular-ion readings of identify (about 10–20 ms of CPU each, as much
 * as the search): the main thread searches while the worker reads, so a request waits for the longer
 * of the two, and on two cores both are busy. Started on the first read; if the worker fails, readings
 * carry on on the calling thread.
 */
export function createReadingPool(log: Logger): ReadingPool {
  let worker: Worker | undefined;
  let broken = false;
  let nextId = 0;
  const pending = new Map<number, { resolve: (r: MolecularIonReading | null) => void; reject: (e: unknown) => void }>();

  const fail = (err: unknown) => {
    if (!broken) log.warn({ err }, 'reading worker failed; reading on the main thread');
    broken = true;
    worker = undefined;
    for (const [, p] of pending) p.reject(err);
    pending.clear();
  };

  const start = (): Worker => {
    const w = startModuleWorker(new URL('./reading-worker', import.meta.url), import.meta.url);
    w.on('message', (reply: ReadingReply) => {
      const p = pending.get(reply.id);
      if (!p) return;
      pending.delete(reply.id);
      if ('reading' in reply) p.resolve(reply.reading);
      else if ('chemError' in reply) {
        const { code, message, field, position } = reply.chemError;
        p.reject(new ChemError(code, message, { field, position }));
      } else p.reject(new Error(reply.failure));
    });
    w.on('error', fail);
    w.on('exit', (code) => {
      if (code !== 0 && worker === w) fail(new Error(`reading worker exited with code ${code}`));
    });
    // An idle worker must not keep the process alive.
    w.unref();
    return w;
  };

  return {
    read(peaks) {
      if (broken) return Promise.resolve().then(() => readOnThisThread(peaks));
      worker ??= start();
      const w = worker;
      return new Promise<MolecularIonReading | null>((resolve, reject) => {
        const id = nextId++;
        pending.set(id, { resolve, reject });
        w.postMessage({ id, peaks } satisfies ReadingRequest);
      }).catch((err: unknown) => {
        if (err instanceof ChemError) throw err;
        // The worker died under this request: read here instead.
        return readOnThisThread(peaks);
      });
    },
    warm() {
      if (!broken) worker ??= start();
    },
    async close() {
      const w = worker;
      broken = true;
      worker = undefined;
      await w?.terminate();
    },
  };
}
