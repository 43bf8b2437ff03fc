import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import { createBatchRunner, type BatchRunner } from './batch.service';
import { createLibrarySearch, type LibrarySearch } from './library-search';
import { createSearchPool, type SearchPool } from './search-pool';

/** The library index, its listener, the search pool and the batch runner of one API process. */
export interface SearchService {
  library: LibrarySearch;
  batch: BatchRunner;
  /** The searches and molecular-ion readings of identify, on worker threads. */
  pool: SearchPool;
  /** Loads the library, starts listening and takes over orphaned batch jobs. */
  start(): Promise<void>;
  stop(): Promise<void>;
}

/** `searchWorkers`: threads of the search pool, `env.IONFOLIO_SEARCH_WORKERS`; 0 = the main thread. */
export function createSearchService(options: { ds: DataSource; databaseUrl: string; logger: Logger; searchWorkers: number }): SearchService {
  const workers = options.searchWorkers;
  const pool = createSearchPool(options.logger, workers);
  // Without workers the index needs no shared memory and no snapshots.
  const library = createLibrarySearch({ ...options, pool: workers > 0 ? pool : undefined });
  const batch = createBatchRunner(options.ds, library, options.logger, pool);
  return {
    library,
    batch,
    pool,
    async start() {
      await library.start();
      await batch.resumeOrphans();
    },
    async stop() {
      await library.stop();
      await batch.idle();
      await pool.close();
    },
  };
}
