import { setTimeout as sleep } from 'node:timers/promises';
import { Worker } from 'node:worker_threads';
import { afterAll, describe, expect, it } from 'vitest';
import {
  ChemError,
  isotopeCluster,
  simulatedLibrary,
  simulatedReplicate,
  type Peak,
  type PeakList,
  type SpectrumIndex,
  type SpectrumSearchOptions,
} from '@ionfolio/chem';
import { pino } from 'pino';
import { createLogger } from '../../shared/logger';
import { startModuleWorker } from '../../shared/module-worker';
import { seeded } from './identify-test-helpers';
import { searchCandidates } from './identify.service';
import { createLibraryIndex, type LibraryRevision } from './library-index';
import { createSearchPool, readOnThisThread, type PoolSearchOptions, type SearchSource } from './search-pool';

const log = createLogger('silent');
const LIBRARY_SIZE = 3000;
const spectra = simulatedLibrary(LIBRARY_SIZE + 1, 61);
// Simulated entries (invented spectra and names); masses spread so that the mass window has work to do.
const revision = (i: number, peaks: Peak[] = spectra[i]!): LibraryRevision => ({
  accession: `IF-SIM-${i}`,
  revision: 1,
  name: `Simulated compound ${i}`,
  formula: i % 3 === 0 ? 'C10H18O' : 'C6H5Cl',
  nominalMass: 60 + (i % 240),
  peaks: peaks.map(([mz, y]) => [mz, y]),
  retentionIndex: null,
  retentionIndexColumn: null,
});
const library = createLibraryIndex(
  Array.from({ length: LIBRARY_SIZE }, (_, i) => revision(i)),
  { sharedMemory: true },
);

const pool = createSearchPool(log, 2);
pool.sync(library);
afterAll(() => pool.close());

// Molecular-ion clusters of a few formulas (isotopeCluster) with two fragments.
const clusters = ['C6H5Cl', 'C6H4Br2', 'C10H18O', 'C7H7NO2'].map((formula) => [
  [39, 30],
  [51, 45],
  ...isotopeCluster(formula).map((p) => [p.mz, p.relIntensity] as Peak),
] as Peak[]);

const optionSets: PoolSearchOptions[] = [
  { k: 10, withMatchedPeaks: true },
  { method: 'cosine', k: 5, withMatchedPeaks: true },
  { method: 'weighted', reverse: true, k: 7, minMass: 100, withMatchedPeaks: true },
  { method: 'entropy', k: 3, maxMass: 200, elementsMask: { forbidden: 1 << 3 }, withMatchedPeaks: true },
  { method: 'composite', reverse: true, k: 4 },
];

// The search worker as the pool starts it, and one that throws as soon as it runs.
const searchWorker = () => startModuleWorker(new URL('./search-worker', import.meta.url), import.meta.url);
const failingWorker = () => new Worker("throw new Error('fails at start')", { eval: true });

/** Waits until `done()` holds, checking every 20 ms; fails after `timeoutMs`. */
async function until(done: () => boolean, timeoutMs = 5000): Promise<void> {
  const t0 = performance.now();
  while (!done()) {
    if (performance.now() - t0 > timeoutMs) throw new Error(`not done within ${timeoutMs} ms`);
    await sleep(20);
  }
}

/** A logger at warn that keeps its lines, and the parsed lines with a given message start. */
function recordingLogger() {
  const lines: string[] = [];
  const logger = pino({ level: 'warn' }, { write: (line: string) => void lines.push(line) });
  const logged = (start: string) =>
    lines.map((line) => JSON.parse(line) as { msg: string; workers: number; restartInMs?: number }).filter((entry) => entry.msg.startsWith(start));
  return { logger, logged };
}

describe('search pool', () => {
  it('searches on its workers exactly what the main thread finds, matched peaks included', async () => {
    const random = seeded(7);
    const queries = Array.from({ length: 12 }, () => simulatedReplicate(spectra[Math.floor(random() * LIBRARY_SIZE)]!, random));
    for (const options of optionSets) {
      const onWorkers = await Promise.all(queries.map((q) => pool.search(library, q, options)));
      queries.forEach((q, i) => expect(onWorkers[i]).toEqual(library.index.search(q, options)));
      expect(onWorkers[0]!.length).toBe(options.k);
      expect(onWorkers[0]![0]!.matchedPeaks !== undefined).toBe(options.withMatchedPeaks === true);
    }
    expect(pool.runningWorkers()).toHaveLength(2);
  });

  it("sends one identify's search and reading to different workers at once, and spreads concurrent searches", async () => {
    const query = spectra[12]!;
    const search = pool.search(library, query, { k: 5 });
    const reading = pool.read(clusters[0]!);
    expect(pool.outstanding()).toEqual([1, 1]);
    await Promise.all([search, reading]);
    expect(pool.outstanding()).toEqual([0, 0]);
    const searches = [pool.search(library, query, { k: 5 }), pool.search(library, spectra[13]!, { k: 5 })];
    expect(pool.outstanding()).toEqual([1, 1]);
    await Promise.all(searches);
  });

  it('reads the molecular ion on its workers exactly as the main thread does', async () => {
    const onWorkers = await Promise.all(clusters.map((peaks) => pool.read(peaks)));
    expect(onWorkers.map((r) => r?.chlorine)).toEqual([1, 0, 0, 0]);
    expect(onWorkers.map((r) => r?.bromine)).toEqual([0, 2, 0, 0]);
    clusters.forEach((peaks, i) => expect(onWorkers[i]).toEqual(readOnThisThread(peaks)));
  });

  it('hands back bad peaks as a ChemError with its field, from a search and from a reading', async () => {
    const searchError = await pool.search(library, [[43, Number.NaN]], { k: 3 }).catch((err: unknown) => err);
    expect(searchError).toBeInstanceOf(ChemError);
    expect(searchError).toMatchObject({ code: 'INVALID_PEAKS' });
    expect(String((searchError as ChemError).field)).toMatch(/^query/);
    const readError = await pool.read([[43, Number.NaN]]).catch((err: unknown) => err);
    expect(readError).toBeInstanceOf(ChemError);
    expect(readError).toMatchObject({ code: 'INVALID_PEAKS' });
    expect(String((readError as ChemError).field)).toMatch(/^peaks/);
  });

  it('finds a revision put after the last snapshot, and no longer finds it once removed, as soon as the change is made', async () => {
    const peaks = spectra[LIBRARY_SIZE]!; // a spectrum the library does not hold yet
    const top = async () => (await searchCandidates(library, peaks, { method: 'composite', reverse: false }, 3, { pool }))[0];
    expect((await top())?.accession).not.toBe('IF-SIM-NEW');
    library.put({ ...revision(LIBRARY_SIZE, peaks), accession: 'IF-SIM-NEW' });
    pool.sync(library);
    expect(await top()).toMatchObject({ accession: 'IF-SIM-NEW', similarity: 100 });
    library.remove('IF-SIM-NEW');
    // No sync here: the search itself sends the newer snapshot first.
    expect((await top())?.accession).not.toBe('IF-SIM-NEW');
    library.put({ ...revision(LIBRARY_SIZE, peaks), accession: 'IF-SIM-NEW', revision: 2 });
    expect(await top()).toMatchObject({ accession: 'IF-SIM-NEW', revision: 2 });
  });

  it('drops a hit whose revision left the library between the worker search and its answer', async () => {
    // A library just packed: its arrays are exactly full, so the next put regrows them and a removal
    // then marks the spectrum dead in the new arrays only; the snapshot being searched still holds it.
    const fresh = createLibraryIndex(
      Array.from({ length: 500 }, (_, i) => revision(i)),
      { sharedMemory: true },
    );
    const target = 'IF-SIM-40';
    const targetId = fresh.index.search(spectra[40]!, { k: 1 })[0]!.id;
    expect(fresh.meta(targetId)?.accession).toBe(target);
    const options = { method: 'composite' as const, reverse: false };
    const hits = pool.search(fresh, spectra[40]!, { k: 3 });
    const candidates = searchCandidates(fresh, spectra[40]!, options, 3, { pool });
    fresh.put(revision(LIBRARY_SIZE, spectra[LIBRARY_SIZE]!));
    fresh.remove(target);
    expect((await hits).map((hit) => hit.id)).toContain(targetId);
    const answer = await candidates;
    expect(answer.map((c) => c.accession)).not.toContain(target);
    expect(answer).toHaveLength(2);
    // The next search is sent the newer snapshot first.
    expect((await searchCandidates(fresh, spectra[40]!, options, 3, { pool })).map((c) => c.accession)).not.toContain(target);
    pool.sync(library);
  });

  it('has every thread collect its garbage once snapshots have dropped enough shared arrays, not for each small change', async () => {
    const lines: string[] = [];
    const watched = createSearchPool(pino({ level: 'debug' }, { write: (line: string) => void lines.push(line) }), 1, {
      collectAfterDroppedBytes: 512 * 1024,
    });
    const collections = () => lines.filter((line) => line.includes('collects its garbage')).length;
    // About 1 MiB of peaks and per-spectrum columns: the first put after packing regrows (and so drops) them.
    const packed = createLibraryIndex(
      Array.from({ length: LIBRARY_SIZE }, (_, i) => revision(i)),
      { sharedMemory: true },
    );
    watched.sync(packed);
    expect(await watched.search(packed, spectra[1]!, { k: 1 })).toHaveLength(1);
    expect(collections()).toBe(0);
    packed.put({ ...revision(1), accession: 'IF-SIM-ONE-MORE' });
    expect(await watched.search(packed, spectra[1]!, { k: 2 })).toHaveLength(2);
    expect(collections()).toBe(1);
    // A second put only replaces the small delta tier.
    packed.put({ ...revision(2), accession: 'IF-SIM-TWO-MORE' });
    expect(await watched.search(packed, spectra[2]!, { k: 2 })).toHaveLength(2);
    expect(collections()).toBe(1);
    await watched.close();
  });

  it('with 0 workers searches and reads on the main thread', async () => {
    const inline = createSearchPool(log, 0);
    inline.warm();
    const options: SpectrumSearchOptions = { k: 4, withMatchedPeaks: true };
    expect(await inline.search(library, spectra[5]!, options)).toEqual(library.index.search(spectra[5]!, options));
    expect(await inline.read(clusters[1]!)).toEqual(readOnThisThread(clusters[1]!));
    expect(inline.runningWorkers()).toHaveLength(0);
    await inline.close();
  });

  it('when a worker dies under a task, redoes the task on the main thread; while no worker is left, works there', async () => {
    // The first two workers are real; their replacements fail at start and wait long to be retried.
    let starts = 0;
    const fragile = createSearchPool(log, 2, {
      startWorker: () => (starts++ < 2 ? searchWorker() : failingWorker()),
      restartBackoff: { firstMs: 60_000, maxMs: 60_000 },
    });
    fragile.sync(library);
    fragile.warm();
    const options = { k: 5, withMatchedPeaks: true };
    expect(await fragile.search(library, spectra[7]!, options)).toEqual(library.index.search(spectra[7]!, options));
    const [first, second] = fragile.runningWorkers();
    const underWay = fragile.search(library, spectra[8]!, options);
    const busy = fragile.outstanding().indexOf(1);
    await fragile.runningWorkers()[busy]!.terminate();
    expect(await underWay).toEqual(library.index.search(spectra[8]!, options));
    expect(fragile.runningWorkers()).toHaveLength(1);
    expect(fragile.runningWorkers()[0]).toBe(busy === 0 ? second : first);
    expect(await fragile.read(clusters[0]!)).toEqual(readOnThisThread(clusters[0]!));
    await fragile.runningWorkers()[0]!.terminate();
    expect(fragile.runningWorkers()).toHaveLength(0);
    expect(await fragile.search(library, spectra[9]!, options)).toEqual(library.index.search(spectra[9]!, options));
    expect(await fragile.read(clusters[2]!)).toEqual(readOnThisThread(clusters[2]!));
    await expect(fragile.search(library, [[43, Number.NaN]], options)).rejects.toBeInstanceOf(ChemError);
    // Each place was refilled once, by a worker that failed at start and joined nothing.
    await until(() => starts === 4);
    await sleep(100);
    expect(fragile.runningWorkers()).toHaveLength(0);
    expect(starts).toBe(4);
    await fragile.close();
  });

  it('when a worker is terminated, a new one takes its place within seconds and searches as the main thread does, a change made while it was down included', async () => {
    const { logger, logged } = recordingLogger();
    // The second death comes soon after the first restart, so its replacement waits 500 ms.
    const healing = createSearchPool(logger, 2, { restartBackoff: { firstMs: 500, maxMs: 500 } });
    const own = createLibraryIndex(
      Array.from({ length: 500 }, (_, i) => revision(i)),
      { sharedMemory: true },
    );
    // The pool searches `own` through a source that counts the searches redone on this thread, which
    // would hide a worker that lacks the snapshot (it answers a failure, and the search is redone).
    let searchedHere = 0;
    const source: SearchSource = {
      get version() {
        return own.version;
      },
      snapshot: () => own.snapshot(),
      index: {
        search: (peaks: PeakList, options: SpectrumSearchOptions) => {
          searchedHere++;
          return own.index.search(peaks, options);
        },
      } as SpectrumIndex,
    };
    healing.sync(source);
    healing.warm();
    const options = { k: 5, withMatchedPeaks: true };
    expect(await Promise.all([healing.search(source, spectra[1]!, options), healing.search(source, spectra[2]!, options)])).toEqual(
      [1, 2].map((i) => own.index.search(spectra[i]!, options)),
    );
    const originals = healing.runningWorkers();
    await originals[0]!.terminate();
    expect(healing.runningWorkers()).toEqual([originals[1]]);
    await until(() => healing.runningWorkers().length === 2);
    const replacement = healing.runningWorkers().find((worker) => !originals.includes(worker));
    expect(replacement).toBeDefined();
    expect(await healing.search(source, spectra[3]!, options)).toEqual(own.index.search(spectra[3]!, options));

    await replacement!.terminate();
    expect(healing.runningWorkers()).toEqual([originals[1]]);
    // While only one worker runs: a revision put, another removed, and the snapshot sent as the change
    // queue does once it drains.
    own.put({ ...revision(LIBRARY_SIZE), accession: 'IF-SIM-WHILE-DOWN' });
    own.remove('IF-SIM-5');
    healing.sync(source);
    await until(() => healing.runningWorkers().length === 2);
    expect(healing.runningWorkers()).not.toContain(replacement);

    // Least work pending first, in the order the workers joined: the second and fourth search go to
    // the newest worker, which so answers both queries.
    const queries = [spectra[LIBRARY_SIZE]!, spectra[LIBRARY_SIZE]!, spectra[5]!, spectra[5]!];
    const answers = Promise.all(queries.map((q) => healing.search(source, q, options)));
    expect(healing.outstanding()).toEqual([2, 2]);
    const hits = await answers;
    queries.forEach((q, i) => expect(hits[i]).toEqual(own.index.search(q, options)));
    expect(own.meta(hits[1]![0]!.id)?.accession).toBe('IF-SIM-WHILE-DOWN');
    expect(hits[3]!.map((hit) => own.meta(hit.id)?.accession)).not.toContain('IF-SIM-5');
    expect(hits[3]!.every((hit) => own.meta(hit.id) !== undefined)).toBe(true);
    expect(searchedHere).toBe(0);

    expect(logged('search worker died').map((entry) => [entry.workers, entry.restartInMs])).toEqual([
      [1, 0],
      [1, 500],
    ]);
    expect(logged('search worker restarted').map((entry) => entry.workers)).toEqual([2, 2]);
    await healing.close();
  });

  it('restarts a worker that keeps dying at start after growing delays instead of at once, and resets them once one has lived a while', async () => {
    const { logger, logged } = recordingLogger();
    const starts: number[] = [];
    let healthy = false;
    const stubborn = createSearchPool(logger, 1, {
      restartBackoff: { firstMs: 100, maxMs: 400 },
      stableAfterMs: 1500,
      startWorker: () => {
        starts.push(performance.now());
        return healthy ? searchWorker() : failingWorker();
      },
    });
    stubborn.sync(library);
    stubborn.warm();
    const deaths = () => logged('search worker died').map((entry) => entry.restartInMs);
    await until(() => deaths().length >= 6, 10_000);
    expect(deaths().slice(0, 6)).toEqual([0, 100, 200, 400, 400, 400]);
    // Each start waited at least the delay logged at the death before it; restarting at once each
    // time would have made dozens of starts by now.
    const gaps = starts.slice(1).map((at, i) => at - starts[i]!);
    gaps.forEach((gap, i) => expect(gap).toBeGreaterThanOrEqual(deaths()[i]!));
    expect(starts[5]! - starts[0]!).toBeGreaterThanOrEqual(100 + 200 + 400 + 400);
    expect(starts.length).toBeLessThanOrEqual(deaths().length + 1);
    // Meanwhile the main thread answers.
    expect(stubborn.runningWorkers()).toHaveLength(0);
    expect(await stubborn.search(library, spectra[4]!, { k: 3 })).toEqual(library.index.search(spectra[4]!, { k: 3 }));

    healthy = true;
    await until(() => stubborn.runningWorkers().length === 1);
    expect(await stubborn.search(library, spectra[6]!, { k: 3 })).toEqual(library.index.search(spectra[6]!, { k: 3 }));
    // Once it has lived past stableAfterMs, its death is a first one again: restarted at once.
    await sleep(1600);
    const died = deaths().length;
    await stubborn.runningWorkers()[0]!.terminate();
    expect(deaths().slice(died)).toEqual([0]);
    await until(() => stubborn.runningWorkers().length === 1);
    expect(logged('search worker restarted').map((entry) => entry.workers)).toEqual([1, 1]);
    await stubborn.close();
  });

  it('once closed, restarts no worker: neither one waiting for its delay nor one still starting', async () => {
    const { logger, logged } = recordingLogger();
    let waitingStarts = 0;
    const waiting = createSearchPool(logger, 1, {
      restartBackoff: { firstMs: 300, maxMs: 300 },
      startWorker: () => {
        waitingStarts++;
        return failingWorker();
      },
    });
    waiting.warm();
    // The first restart is at once; after the second death the next one waits 300 ms.
    await until(() => logged('search worker died').length === 2);
    expect(waitingStarts).toBe(2);
    await waiting.close();
    await sleep(500);
    expect(waitingStarts).toBe(2);

    // A real worker, then a replacement that never gets ready (it never listens for tasks).
    const workers: Worker[] = [];
    const exited: Worker[] = [];
    const starting = createSearchPool(log, 1, {
      startWorker: () => {
        const worker = workers.length === 0 ? searchWorker() : new Worker('setInterval(() => {}, 1000);', { eval: true });
        worker.on('exit', () => exited.push(worker));
        workers.push(worker);
        return worker;
      },
    });
    starting.sync(library);
    expect(await starting.read(clusters[0]!)).toEqual(readOnThisThread(clusters[0]!));
    await workers[0]!.terminate();
    await until(() => workers.length === 2);
    expect(starting.runningWorkers()).toHaveLength(0);
    await starting.close();
    await until(() => exited.length === 2);
    expect(exited[1]).toBe(workers[1]);
    await sleep(300);
    expect(workers).toHaveLength(2);
    expect(await starting.search(library, spectra[3]!, { k: 2 })).toEqual(library.index.search(spectra[3]!, { k: 2 }));
  });

  it('once closed, answers on the calling thread', async () => {
    const closing = createSearchPool(log, 1);
    closing.sync(library);
    const underWay = closing.search(library, spectra[3]!, { k: 2 });
    await closing.close();
    expect(await underWay).toEqual(library.index.search(spectra[3]!, { k: 2 }));
    expect(await closing.read(clusters[3]!)).toEqual(readOnThisThread(clusters[3]!));
    expect(closing.runningWorkers()).toHaveLength(0);
  });
});
