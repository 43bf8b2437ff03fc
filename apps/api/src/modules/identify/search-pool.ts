import { Session } from 'node:inspector';
import type { Worker } from 'node:worker_threads';
import type { Logger } from 'pino';
import {
  ChemError,
  readMolecularIon,
  type ChemErrorCode,
  type MolecularIonReading,
  type PeakList,
  type SpectrumHit,
  type SpectrumIndex,
  type SpectrumIndexSnapshot,
  type SpectrumSearchOptions,
} from '@ionfolio/chem';
import { startModuleWorker } from '../../shared/module-worker';

/** Search options a worker can take: all but the `filter` callback, which cannot cross threads. */
export type PoolSearchOptions = Omit<SpectrumSearchOptions, 'filter'>;

/**
 * What the pool searches: the index, a count of its changes (so the pool knows whether its workers
 * hold the latest snapshot) and its snapshot. A LibraryIndex is one.
 */
export interface SearchSource {
  readonly index: SpectrumIndex;
  readonly version: number;
  snapshot(): SpectrumIndexSnapshot;
}

export type SearchWorkerTask =
  | { kind: 'snapshot'; snapshot: SpectrumIndexSnapshot; collectGarbage: boolean }
  | { kind: 'search'; id: number; peaks: PeakList; options: PoolSearchOptions }
  | { kind: 'read'; id: number; peaks: PeakList };

export type SearchWorkerAnswer =
  | { hits: SpectrumHit[] }
  | { reading: MolecularIonReading | null }
  | { chemError: { code: ChemErrorCode; message: string; field?: string; position?: number } }
  | { failure: string };

/** `ms`: the worker's time on the task, from which the pool estimates the work it has queued. */
export type SearchWorkerReply = { id: number; ms: number } & SearchWorkerAnswer;

/** What a worker posts: `ready` once, when it listens for tasks, then a reply per task. */
export type SearchWorkerMessage = { ready: true } | SearchWorkerReply;

/**
 * A full garbage collection of this thread that also hands the freed heap back (what the inspector's
 * "collect garbage" does). V8 counts ordinary ArrayBuffers as external memory and collects when they
 * add up; SharedArrayBuffers it does not count, so the shared arrays that an index has replaced (and
 * the rest of a load's garbage) would stay resident until the heap itself grows far enough.
 */
export async function collectGarbage(): Promise<void> {
  const session = new Session();
  session.connect();
  try {
    await new Promise<void>((resolve, reject) => session.post('HeapProfiler.collectGarbage', (err) => (err ? reject(err) : resolve())));
  } finally {
    session.disconnect();
  }
}

/** The buffers that a snapshot's arrays live in. */
function buffersOf(snapshot: SpectrumIndexSnapshot): Set<ArrayBufferLike> {
  const arrays = [snapshot.slot, snapshot.main, snapshot.delta].flatMap((group) => Object.values(group) as unknown[]);
  arrays.push(snapshot.peakMz, snapshot.peakRelIntensity);
  return new Set(arrays.filter((value) => ArrayBuffer.isView(value)).map((array) => array.buffer));
}

/**
 * Bytes of shared arrays that the snapshots sent to the workers no longer hold (replaced deltas,
 * arrays regrown or repacked, a previous index), past which every thread collects its garbage. At 300k
 * spectra a publish replaces the delta tier (up to about 15 MiB before the index repacks); the first
 * one after a load replaces the arrays it regrows (about 100 MiB).
 */
const COLLECT_AFTER_DROPPED_BYTES = 64 * 2 ** 20;
const COLLECT_DELAY_MS = 2000;

/** The molecular-ion check of a query, or null when no cluster can be fitted (a RangeError in chem). */
export function readOnThisThread(peaks: PeakList): MolecularIonReading | null {
  try {
    return readMolecularIon(peaks);
  } catch (err) {
    if (err instanceof RangeError) return null;
    throw err;
  }
}

/** Searches and readings on worker threads; a ChemError comes back as one, to be answered as a 400. */
export interface SearchPool {
  /**
   * Sends the source's latest snapshot to every worker unless they have it. Tasks sent afterwards
   * search it (a worker handles its messages in order).
   */
  sync(source: SearchSource): void;
  /** `source.index.search(peaks, options)`, on a worker, or on this thread when no worker is running. */
  search(source: SearchSource, peaks: PeakList, options: PoolSearchOptions): Promise<SpectrumHit[]>;
  read(peaks: PeakList): Promise<MolecularIonReading | null>;
  /** Starts the workers now, so that the first identify does not wait for them to boot. */
  warm(): void;
  close(): Promise<void>;
  /** Tasks sent to each running worker and not yet answered (tests). */
  outstanding(): number[];
  /** The workers that take tasks; a replacement joins once it is ready (tests, which terminate one). */
  runningWorkers(): Worker[];
}

export interface SearchPoolOptions {
  /** Bytes of dropped shared arrays after which every thread collects its garbage (tests lower it). */
  collectAfterDroppedBytes?: number;
  /**
   * Delay before the second restart of a worker that keeps dying soon after it starts, doubled at each
   * further death up to `maxMs`. The first restart is at once.
   */
  restartBackoff?: { firstMs: number; maxMs: number };
  /** A worker that lived this long resets its backoff when it dies. */
  stableAfterMs?: number;
  /** Starts a worker; tests pass one that fails at start. */
  startWorker?: () => Worker;
}

const RESTART_BACKOFF = { firstMs: 1000, maxMs: 60_000 };
const STABLE_AFTER_MS = 30_000;

const startSearchWorker = () => startModuleWorker(new URL('./search-worker', import.meta.url), import.meta.url);

type TaskKind = 'search' | 'read';

interface Pending {
  kind: TaskKind;
  costMs: number;
  resolve: (reply: SearchWorkerReply) => void;
  reject: (err: unknown) => void;
}

/** A place in the pool, which keeps its backoff across the workers that fill it in turn. */
interface Slot {
  /** Deaths in a row of workers that died before living `stableAfterMs`. */
  quickDeaths: number;
}

interface Lane {
  worker: Worker;
  slot: Slot;
  startedAt: number;
  pending: Map<number, Pending>;
  /** Estimated CPU time of the pending tasks. */
  loadMs: number;
  /** The snapshot this worker was sent last. */
  holds?: { source: SearchSource; version: number };
}

/**
 * Worker threads that each hold a read-only copy of the library index over the same shared memory
 * (SpectrumIndex.fromSnapshot) and serve searches and molecular-ion readings. A task goes to the
 * worker with the least estimated work pending (a search costs about six readings), so that one
 * identify's search and reading run at once on two cores and concurrent identifies use both.
 * Started on the first task or by warm(). A worker that dies leaves the pool, its unanswered tasks
 * are redone on the calling thread, and a new worker takes its place: at once the first time, then
 * after a delay that doubles while the workers of that place keep dying soon after they start. The
 * new one takes tasks once it is ready and holds the latest snapshot; until then the other workers,
 * or with none left the calling thread, do them.
 */
export function createSearchPool(log: Logger, size: number, options: SearchPoolOptions = {}): SearchPool {
  const collectAfterDroppedBytes = options.collectAfterDroppedBytes ?? COLLECT_AFTER_DROPPED_BYTES;
  const backoff = options.restartBackoff ?? RESTART_BACKOFF;
  const stableAfterMs = options.stableAfterMs ?? STABLE_AFTER_MS;
  const startWorker = options.startWorker ?? startSearchWorker;
  // The workers that take tasks, and replacements that are not ready yet.
  const lanes: Lane[] = [];
  const joining = new Set<Lane>();
  const restarts = new Set<NodeJS.Timeout>();
  let started = false;
  let closed = false;
  let nextId = 0;
  // The last snapshot sent to any worker, and what the workers should hold.
  let sent: { source: SearchSource; version: number; snapshot: SpectrumIndexSnapshot } | undefined;
  let wanted: SearchSource | undefined;
  // Running averages of the CPU time of each kind, as the workers report it; first guesses from the
  // 300k benchmark library (docs/benchmarks.md).
  const averageMs: Record<TaskKind, number> = { search: 30, read: 5 };
  // The buffers of the last snapshot sent, held weakly, and the bytes sent before but dropped since.
  let sentBuffers: { buffer: WeakRef<ArrayBufferLike>; bytes: number }[] = [];
  let droppedBytes = 0;

  // This thread's collection (about 0.3 s at 300k spectra) waits a moment, so that the change that
  // caused it is answered first.
  let collecting: NodeJS.Timeout | undefined;
  const collectSoon = () => {
    collecting ??= setTimeout(() => {
      collecting = undefined;
      collectGarbage().catch((err: unknown) => log.warn({ err }, 'garbage collection after a new snapshot failed'));
    }, COLLECT_DELAY_MS).unref();
  };

  const countDropped = (snapshot: SpectrumIndexSnapshot): boolean => {
    const buffers = buffersOf(snapshot);
    for (const { buffer, bytes } of sentBuffers) {
      // One this thread has collected may still be held by a worker.
      const kept = buffer.deref();
      if (kept === undefined || !buffers.has(kept)) droppedBytes += bytes;
    }
    sentBuffers = [...buffers].map((buffer) => ({ buffer: new WeakRef(buffer), bytes: buffer.byteLength }));
    if (droppedBytes < collectAfterDroppedBytes) return false;
    log.debug({ droppedMiB: Math.round(droppedBytes / 2 ** 20) }, 'shared index arrays dropped; every search thread collects its garbage');
    droppedBytes = 0;
    return true;
  };

  // Called for a worker's 'error' and for its 'exit' (an error is followed by an exit); after close()
  // the lanes are gone, so neither counts.
  const leave = (lane: Lane, err: unknown) => {
    const at = lanes.indexOf(lane);
    if (at >= 0) lanes.splice(at, 1);
    else if (!joining.delete(lane)) return;
    for (const p of lane.pending.values()) p.reject(err);
    lane.pending.clear();
    lane.loadMs = 0;
    const { slot } = lane;
    if (performance.now() - lane.startedAt >= stableAfterMs) slot.quickDeaths = 0;
    const restartInMs = slot.quickDeaths === 0 ? 0 : Math.min(backoff.maxMs, backoff.firstMs * 2 ** (slot.quickDeaths - 1));
    slot.quickDeaths++;
    log.warn({ err, workers: lanes.length, restartInMs }, 'search worker died; its tasks run on the other workers or the main thread until it is replaced');
    const restart = setTimeout(() => {
      restarts.delete(restart);
      if (!closed) joining.add(startLane(slot));
    }, restartInMs);
    // A pending restart must not keep the process alive, no more than an idle worker does.
    restart.unref();
    restarts.add(restart);
  };

  // A replacement takes tasks once it listens, after the latest snapshot, so that no task waits for
  // it to boot while another thread could do it.
  const join = (lane: Lane) => {
    if (!joining.delete(lane)) return;
    lanes.push(lane);
    if (wanted) pool.sync(wanted);
    log.warn({ workers: lanes.length }, 'search worker restarted');
  };

  const startLane = (slot: Slot = { quickDeaths: 0 }): Lane => {
    const worker = startWorker();
    const lane: Lane = { worker, slot, startedAt: performance.now(), pending: new Map(), loadMs: 0 };
    worker.on('message', (reply: SearchWorkerMessage) => {
      if ('ready' in reply) return join(lane);
      const p = lane.pending.get(reply.id);
      if (!p) return;
      lane.pending.delete(reply.id);
      lane.loadMs = Math.max(0, lane.loadMs - p.costMs);
      averageMs[p.kind] += 0.2 * (reply.ms - averageMs[p.kind]);
      p.resolve(reply);
    });
    worker.on('error', (err) => leave(lane, err));
    worker.on('exit', (code) => leave(lane, new Error(`search worker exited with code ${code}`)));
    // An idle worker must not keep the process alive.
    worker.unref();
    return lane;
  };

  const ensureStarted = () => {
    if (started || closed) return;
    started = true;
    for (let i = 0; i < size; i++) lanes.push(startLane());
    if (wanted) pool.sync(wanted);
  };

  const pick = (): Lane | undefined => {
    ensureStarted();
    let best: Lane | undefined;
    for (const lane of lanes) {
      if (!best || lane.loadMs < best.loadMs || (lane.loadMs === best.loadMs && lane.pending.size < best.pending.size)) best = lane;
    }
    return best;
  };

  const dispatch = (lane: Lane, task: { kind: 'search'; peaks: PeakList; options: PoolSearchOptions } | { kind: 'read'; peaks: PeakList }) =>
    new Promise<SearchWorkerReply>((resolve, reject) => {
      const id = nextId++;
      const costMs = averageMs[task.kind];
      lane.pending.set(id, { kind: task.kind, costMs, resolve, reject });
      lane.loadMs += costMs;
      lane.worker.postMessage({ ...task, id } satisfies SearchWorkerTask);
    }).then((reply) => {
      if ('chemError' in reply) {
        const { code, message, field, position } = reply.chemError;
        throw new ChemError(code, message, { field, position });
      }
      if ('failure' in reply) throw new Error(reply.failure);
      return reply;
    });

  // A ChemError is the query's fault and is answered; anything else means the worker could not do
  // the task, which is then done here.
  const orHere = <T>(here: () => T) => (err: unknown): T => {
    if (err instanceof ChemError) throw err;
    return here();
  };

  const pool: SearchPool = {
    sync(source) {
      wanted = source;
      // A worker that starts or joins later is sent it then.
      const behind = lanes.filter((lane) => lane.holds?.source !== source || lane.holds.version !== source.version);
      if (behind.length === 0) return;
      // A replacement that only catches up on the snapshot the others hold has no older arrays to drop.
      let collect = false;
      if (sent?.source !== source || sent.version !== source.version) {
        sent = { source, version: source.version, snapshot: source.snapshot() };
        collect = countDropped(sent.snapshot);
      }
      for (const lane of behind) {
        lane.worker.postMessage({ kind: 'snapshot', snapshot: sent.snapshot, collectGarbage: collect } satisfies SearchWorkerTask);
        lane.holds = { source, version: source.version };
      }
      if (collect) collectSoon();
    },
    search(source, peaks, options) {
      const here = () => source.index.search(peaks, options);
      const lane = pick();
      if (!lane) return Promise.resolve().then(here);
      pool.sync(source);
      return dispatch(lane, { kind: 'search', peaks, options }).then((reply) => (reply as { hits: SpectrumHit[] }).hits, orHere(here));
    },
    read(peaks) {
      const here = () => readOnThisThread(peaks);
      const lane = pick();
      if (!lane) return Promise.resolve().then(here);
      return dispatch(lane, { kind: 'read', peaks }).then((reply) => (reply as { reading: MolecularIonReading | null }).reading, orHere(here));
    },
    warm() {
      ensureStarted();
    },
    async close() {
      closed = true;
      clearTimeout(collecting);
      for (const restart of restarts) clearTimeout(restart);
      restarts.clear();
      const stopping = [...lanes.splice(0), ...joining];
      joining.clear();
      sent = undefined;
      wanted = undefined;
      // Unanswered tasks are redone here rather than left waiting for a worker that is gone.
      for (const lane of stopping) for (const p of lane.pending.values()) p.reject(new Error('search pool closed'));
      await Promise.all(stopping.map((lane) => lane.worker.terminate()));
    },
    outstanding: () => lanes.map((lane) => lane.pending.size),
    runningWorkers: () => lanes.map((lane) => lane.worker),
  };
  return pool;
}
