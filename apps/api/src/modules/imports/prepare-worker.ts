// A worker thread that prepares import blocks (validation and consistency checks) off the API's
// main thread; started by prepare-pool.ts.
import { parentPort } from 'node:worker_threads';
import type { UploadedBlock } from '../uploads/spectrum-file';
import { prepareBlock } from './import-block';

export interface PrepareRequest {
  id: number;
  blocks: UploadedBlock[];
}

parentPort?.on('message', ({ id, blocks }: PrepareRequest) => {
  // The blocks stay with the caller, which has them already; only the outcome travels back.
  const prepared = blocks.map((b) => {
    const { block: _block, ...outcome } = prepareBlock(b);
    return outcome;
  });
  parentPort!.postMessage({ id, prepared });
});
