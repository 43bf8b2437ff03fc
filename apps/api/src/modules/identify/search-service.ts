import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import { createBatchRunner, type BatchRunner } from './batch.service';
import { createLibrarySearch, type LibrarySearch } from './library-search';

/** The library index, its listener and the batch runner of one API process. */
export interface SearchService {
  library: LibrarySearch;
  batch: BatchRunner;
  /** Loads the library, starts listening and takes over orphaned batch jobs. */
  start(): Promise<void>;
  stop(): Promise<void>;
}

export function createSearchService(options: { ds: DataSource; databaseUrl: string; logger: Logger }): SearchService {
  const library = createLibrarySearch(options);
  const batch = createBatchRunner(options.ds, library, options.logger);
  return {
    library,
    batch,
    async start() {
      await library.start();
      await batch.resumeOrphans();
    },
    async stop() {
      await library.stop();
      await batch.idle();
    },
  };
}
