// A worker thread that reads the molecular ion of identify queries off the API's main thread, so
// that the reading runs on the second core while the main thread searches; started by reading-pool.ts.
import { parentPort } from 'node:worker_threads';
import { ChemError } from '@ionfolio/chem';
import { readOnThisThread, type ReadingReply, type ReadingRequest } from './reading-pool';

parentPort?.on('message', ({ id, peaks }: ReadingRequest) => {
  let reply: ReadingReply;
  try {
    reply = { id, reading: readOnThisThread(peaks) };
  } catch (err) {
    reply =
      err instanceof ChemError
        ? { id, chemError: { code: err.code, message: err.message, field: err.field, position: err.position } }
        : { id, failure: err instanceof Error ? err.message : String(err) };
  }
  parentPort!.postMessage(reply);
});
