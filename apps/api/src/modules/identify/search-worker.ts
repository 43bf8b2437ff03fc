// A worker thread of the search pool (search-pool.ts): it holds a read-only copy of the library index
// over the main thread's shared memory and answers searches and molecular-ion readings.
import { parentPort } from 'node:worker_threads';
import { ChemError, SpectrumIndex } from '@ionfolio/chem';
import {
  collectGarbage,
  readOnThisThread,
  type SearchWorkerAnswer,
  type SearchWorkerMessage,
  type SearchWorkerReply,
  type SearchWorkerTask,
} from './search-pool';

let index: SpectrumIndex | undefined;

function answer(task: Exclude<SearchWorkerTask, { kind: 'snapshot' }>): SearchWorkerAnswer {
  try {
    if (task.kind === 'read') return { reading: readOnThisThread(task.peaks) };
    if (!index) return { failure: 'search worker: no snapshot of the library index yet' };
    return { hits: index.search(task.peaks, task.options) };
  } catch (err) {
    return err instanceof ChemError
      ? { chemError: { code: err.code, message: err.message, field: err.field, position: err.position } }
      : { failure: err instanceof Error ? err.message : String(err) };
  }
}

parentPort?.on('message', (task: SearchWorkerTask) => {
  if (task.kind === 'snapshot') {
    if (index) index.adopt(task.snapshot);
    else index = SpectrumIndex.fromSnapshot(task.snapshot);
    // The arrays only the previous snapshot held are freed once this thread lets go of them too.
    if (task.collectGarbage) void collectGarbage().catch(() => undefined);
    return;
  }
  const t0 = performance.now();
  const reply: SearchWorkerReply = { ...answer(task), id: task.id, ms: performance.now() - t0 };
  parentPort!.postMessage(reply satisfies SearchWorkerMessage);
});
// A replacement worker takes tasks from here on.
parentPort?.postMessage({ ready: true } satisfies SearchWorkerMessage);
