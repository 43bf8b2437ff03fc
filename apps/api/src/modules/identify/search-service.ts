import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import { createBatchRunner, type BatchRunner } from './batch.service';
import { createLibrarySearch, type LibrarySearch } from './library-search';
import { createReadingPool, type ReadingPool } from './reading-pool';

/** The library index, its listener and the batch runner of one API process. */
export interface SearchService {
  library: LibrarySearch;
  batch: BatchRunner;
  /** The molecular-ion readings of identify, on a worker thread. */
  readings: ReadingPool;
  /** Loads the library, starts listening and takes over orphaned batch jobs. */
  start(): Promise<void>;
  stop(): Promise<void>;
}

export function createSearchService(options: { ds: DataSource; databaseUrl: string; logger: Logger }): SearchService {
  const library = createLibrarySearch(options);
  const batch = createBatchRunner(options.ds, library, options.logger);
  const readings = createReadingPool(options.logger);
  return {
    library,
    batch,
    readings,
    async start() {
      await library.start();
      await batch.resumeOrphans();
    },
    async stop() {
      await library.stop();
      await batch.idle();
      await readings.close();
    },
  };
}
