import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import { AppError } from '../../shared/app-error';
import { createLibraryIndex, loadLibraryIndex, type LibraryIndex } from './library-index';
import { listenForLibraryChanges, type LibraryChange, type LibraryListener } from './library-listener';
import { countPublished, loadEditionRevisions, loadPublishedRevision, publishedRevisionPages } from './library.repository';
import { collectGarbage, type SearchPool } from './search-pool';

/** Editions are frozen, so an edition's index never goes stale; a few stay cached. */
const EDITION_CACHE_SIZE = 4;

export interface LibrarySearch {
  /** Loads the published library and starts listening; later calls wait for the same start. */
  start(): Promise<void>;
  stop(): Promise<void>;
  /** The index of the current published library, or of a frozen edition (404 EDITION_NOT_FOUND). */
  indexFor(edition?: string): Promise<LibraryIndex>;
  /** Resolves once every library change received so far has been applied (tests, shutdown). */
  settled(): Promise<void>;
}

/**
 * The published library in a search index inside this API process. PostgreSQL is the source of
 * truth: the index is loaded from it at start, and each `ionfolio_library` notification (sent by
 * publishing and withdrawing inside their transaction, so only after commit) reloads that one entry.
 * After a lost connection the whole library is reloaded. Changes apply one at a time, in order.
 *
 * With a search pool, the current library's index lives in shared memory and its workers are sent a
 * snapshot once the queue of changes has drained (one snapshot for a burst); a search sent to the
 * pool before that sends the snapshot first (SearchPool.sync), so none misses an applied change.
 */
export function createLibrarySearch(options: { ds: DataSource; databaseUrl: string; logger: Logger; pool?: Pick<SearchPool, 'sync'> }): LibrarySearch {
  const { ds, databaseUrl, logger, pool } = options;
  let current: LibraryIndex = createLibraryIndex();
  let listener: LibraryListener | undefined;
  let started: Promise<void> | undefined;
  let queue: Promise<void> = Promise.resolve();
  let queued = 0;
  const editions = new Map<string, Promise<LibraryIndex>>();

  const sendToWorkers = () => {
    try {
      pool?.sync(current);
    } catch (err) {
      // The next search sent to the pool tries again.
      logger.error({ err }, 'could not send the library index to the search workers');
    }
  };

  const enqueue = (work: () => Promise<void>): Promise<void> => {
    queued++;
    queue = queue
      .then(work)
      .catch((err: unknown) => logger.error({ err }, 'library index update failed'))
      .then(() => {
        if (--queued === 0) sendToWorkers();
      });
    return queue;
  };

  async function reloadAll(): Promise<void> {
    const t0 = performance.now();
    // Changes that arrive meanwhile wait in the queue, so the count may only run short of the pages.
    const reserve = await countPublished(ds);
    current = await loadLibraryIndex(publishedRevisionPages(ds), reserve, { sharedMemory: pool !== undefined });
    const loadMs = Math.round(performance.now() - t0);
    // In shared memory the load's garbage prompts no collection (search-pool.ts, collectGarbage): at
    // 300k spectra 1.15 GiB stayed resident instead of 0.6 GiB; the collection takes about 0.3 s.
    if (pool) await collectGarbage();
    logger.info({ revisions: current.size, ms: loadMs, gcMs: Math.round(performance.now() - t0) - loadMs }, 'library index loaded');
  }

  async function applyChange(change: LibraryChange): Promise<void> {
    const revision = await loadPublishedRevision(ds, change.accession);
    if (revision) current.put(revision);
    else current.remove(change.accession);
    logger.debug({ ...change, revision: revision?.revision ?? null }, 'library index updated');
  }

  async function loadEdition(label: string): Promise<LibraryIndex> {
    const rows = await loadEditionRevisions(ds, label);
    if (!rows) {
      throw new AppError('EDITION_NOT_FOUND', 404, `Edition ${label} was not found`, {
        details: [{ path: 'edition', message: `no edition is labelled ${label}` }],
      });
    }
    return createLibraryIndex(rows);
  }

  const search: LibrarySearch = {
    start() {
      started ??= new Promise<void>((resolve, reject) => {
        const { listener: l, connected } = listenForLibraryChanges({
          databaseUrl,
          logger,
          onChange: (change) => void enqueue(() => applyChange(change)),
          // LISTEN is in place before the load, so no change falls between the two.
          onConnected: (firstTime) => {
            const loaded = enqueue(reloadAll);
            if (firstTime) void loaded.then(resolve);
            return loaded;
          },
        });
        listener = l;
        connected.catch(reject);
      });
      return started;
    },
    async stop() {
      await listener?.stop();
      listener = undefined;
      await queue;
    },
    async indexFor(edition) {
      if (edition === undefined) {
        await search.start();
        await queue;
        return current;
      }
      let index = editions.get(edition);
      if (!index) {
        index = loadEdition(edition);
        editions.set(edition, index);
        index.catch(() => editions.delete(edition));
        if (editions.size > EDITION_CACHE_SIZE) editions.delete(editions.keys().next().value!);
      }
      return index;
    },
    settled: () => queue,
  };
  return search;
}
