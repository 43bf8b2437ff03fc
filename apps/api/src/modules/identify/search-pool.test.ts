import { afterAll, describe, expect, it } from 'vitest';
import { ChemError, isotopeCluster, simulatedLibrary, simulatedReplicate, type Peak, type SpectrumSearchOptions } from '@ionfolio/chem';
import { pino } from 'pino';
import { createLogger } from '../../shared/logger';
import { seeded } from './identify-test-helpers';
import { searchCandidates } from './identify.service';
import { createLibraryIndex, type LibraryRevision } from './library-index';
import { createSearchPool, readOnThisThread, type PoolSearchOptions } from './search-pool';

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
    expect(fresh.meta(targetId).accession).toBe(target);
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

  it('when a worker dies under a task, redoes the task on the main thread; with no worker left, works there', async () => {
    const fragile = createSearchPool(log, 2);
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
    await fragile.close();
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
