import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { seededRandom } from '../isotopes/seeded-random';
import { compareSpectra } from '../similarity/compare-spectra';
import { SIMILARITY_METHODS, type SimilarityMethod } from '../similarity/similarity-method';
import type { Peak, PeakList } from '../types';
import { passesMetaFilters, resolveSearchOptions, type SpectrumMeta, type SpectrumSearchOptions } from './search-options';
import { SpectrumIndex } from './spectrum-index';
import { simulatedLibrary, simulatedReplicate } from './synthetic-library';

interface Entry {
  id: number;
  peaks: PeakList;
  meta: SpectrumMeta;
}

/** The reference: score every live spectrum one by one with compareSpectra, rank, cut at k. */
function searchOneByOne(entries: Entry[], query: PeakList, options: SpectrumSearchOptions & { method: SimilarityMethod }) {
  const resolved = resolveSearchOptions(options, { method: options.method, k: 10 });
  return entries
    .filter((e) =>
      passesMetaFilters(resolved, e.meta.nominalMass ?? NaN, e.meta.retentionIndex ?? NaN, (e.meta.elementsMask ?? 0) >>> 0, e.meta.group ?? 0),
    )
    .filter((e) => options.filter === undefined || options.filter(e.id))
    .map((e) => {
      const forward = compareSpectra(query, e.peaks, { method: options.method });
      const ranked = options.reverse ? compareSpectra(query, e.peaks, { method: options.method, reverse: true }).score : forward.score;
      return { id: e.id, score: forward.score, ranked, matchedPeakCount: forward.matchedPeaks.length };
    })
    .filter((hit) => hit.ranked > 0)
    .sort((x, y) => y.ranked - x.ranked || x.id - y.id)
    .slice(0, resolved.k)
    .map(({ id, score, ranked, matchedPeakCount }) =>
      options.reverse ? { id, score, reverseScore: ranked, matchedPeakCount } : { id, score, matchedPeakCount },
    );
}

const peakArb: fc.Arbitrary<Peak> = fc.tuple(
  fc.oneof(fc.integer({ min: 30, max: 70 }), fc.double({ min: 29.6, max: 70.4, noNaN: true })),
  fc.oneof(fc.constant(100), fc.double({ min: 0, max: 1000, noNaN: true })),
);
const spectrumArb = fc
  .array(peakArb, { minLength: 1, maxLength: 14 })
  .filter((peaks) => peaks.some(([, intensity]) => intensity > 0));
const metaArb: fc.Arbitrary<SpectrumMeta> = fc.record(
  {
    nominalMass: fc.integer({ min: 50, max: 300 }),
    retentionIndex: fc.integer({ min: 800, max: 1600 }),
    elementsMask: fc.integer({ min: 0, max: 15 }),
    group: fc.integer({ min: 0, max: 3 }),
  },
  { requiredKeys: [] },
);

describe('SpectrumIndex', () => {
  it('returns exactly the one-by-one top-k (ids, scores, ties by id) for every method and reverse, after adds, packs and removes (seeded property test)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(spectrumArb, metaArb), { minLength: 1, maxLength: 40 }),
        fc.array(fc.tuple(spectrumArb, metaArb), { maxLength: 10 }),
        fc.array(fc.boolean(), { minLength: 50, maxLength: 50 }),
        spectrumArb,
        fc.constantFrom(...SIMILARITY_METHODS),
        fc.boolean(),
        fc.integer({ min: 1, max: 8 }),
        fc.boolean(),
        fc.option(
          fc.record({ minMass: fc.integer({ min: 40, max: 200 }), tolerance: fc.integer({ min: 0, max: 400 }), group: fc.option(fc.integer({ min: 1, max: 3 })) }),
        ),
        (first, later, removals, query, method, reverse, k, packBetween, filters) => {
          const index = new SpectrumIndex();
          const entries: Entry[] = [];
          const addAll = (batch: [PeakList, SpectrumMeta][], offset: number) => {
            batch.forEach(([peaks, meta], i) => {
              // A copy of an earlier spectrum now and then, so that exact ties occur.
              const source = i % 5 === 4 && entries.length > 0 ? (entries[0] as Entry).peaks : peaks;
              const entry = { id: offset + 3 * i, peaks: source, meta };
              index.add(entry.id, entry.peaks, entry.meta);
              entries.push(entry);
            });
          };
          addAll(first, 1000);
          if (packBetween) index.pack();
          for (let i = entries.length - 1; i >= 0; i--) {
            if (removals[i] === true) {
              expect(index.remove((entries[i] as Entry).id)).toBe(true);
              entries.splice(i, 1);
            }
          }
          addAll(later, 5000);
          expect(index.size).toBe(entries.length);
          const options: SpectrumSearchOptions & { method: SimilarityMethod } = { method, reverse, k };
          if (filters !== null) {
            options.minMass = filters.minMass;
            options.retentionIndex = { value: 1200, tolerance: filters.tolerance };
            options.filter = (id) => id % 2 === 0;
            if (filters.group !== null) options.group = filters.group;
          }
          expect(index.search(query, options)).toEqual(searchOneByOne(entries, query, options));
        },
      ),
      { seed: 20261202, numRuns: 400 },
    );
  });

  it('on a simulated library large enough to pack itself, agrees with the one-by-one ranking for every method and mode', () => {
    const random = seededRandom(5);
    const library = simulatedLibrary(2500, 17);
    const index = new SpectrumIndex();
    const entries = library.map((peaks, i) => ({ id: i, peaks, meta: {} }));
    for (const e of entries) index.add(e.id, e.peaks);
    for (let i = 0; i < 400; i++) index.remove(i * 5);
    const live = entries.filter((e) => e.id % 5 !== 0 || e.id >= 2000);
    for (let q = 0; q < 3; q++) {
      const query = simulatedReplicate(library[Math.floor(random() * library.length)] as Peak[], random);
      for (const method of SIMILARITY_METHODS) {
        for (const reverse of [false, true]) {
          expect(index.search(query, { method, reverse, k: 10 })).toEqual(searchOneByOne(live, query, { method, reverse, k: 10 }));
        }
      }
    }
  });

  it('finds the source of a replicate first, with the score compareSpectra gives', () => {
    const library = simulatedLibrary(500, 3);
    const index = new SpectrumIndex({ method: 'cosine', k: 3 });
    library.forEach((peaks, id) => index.add(id, peaks));
    const query = simulatedReplicate(library[123] as Peak[], seededRandom(9), { noise: 0.05, dropFraction: 0 });
    const [top] = index.search(query);
    expect(top?.id).toBe(123);
    expect(top?.score).toBe(compareSpectra(query, library[123] as Peak[], { method: 'cosine' }).score);
  });

  it('applies mass, retention-index and element filters; spectra missing the value are excluded', () => {
    const index = new SpectrumIndex({ method: 'cosine' });
    const peaks = [[43, 100], [58, 20]] as const;
    index.add(1, peaks, { nominalMass: 58, retentionIndex: 1000, elementsMask: 0b01 });
    index.add(2, peaks, { nominalMass: 72, retentionIndex: 1100, elementsMask: 0b11 });
    index.add(3, peaks);
    const ids = (options: SpectrumSearchOptions) => index.search(peaks, options).map((hit) => hit.id);
    expect(ids({})).toEqual([1, 2, 3]);
    expect(ids({ minMass: 60 })).toEqual([2]);
    expect(ids({ maxMass: 60 })).toEqual([1]);
    expect(ids({ retentionIndex: { value: 1090, tolerance: 10 } })).toEqual([2]);
    expect(ids({ elementsMask: { required: 0b10 } })).toEqual([2]);
    expect(ids({ elementsMask: { forbidden: 0b10 } })).toEqual([1, 3]);
    expect(ids({ filter: (id) => id !== 1 })).toEqual([2, 3]);
  });

  it('keeps only the spectra of a group when asked (e.g. one column class), for every method; spectra without a group never match', () => {
    const index = new SpectrumIndex();
    const peaks = [[43, 100], [58, 20], [71, 8]] as const;
    index.add(1, peaks, { group: 1 });
    index.add(2, peaks, { group: 2 });
    index.add(3, peaks);
    index.add(4, peaks, { group: 127 });
    for (const method of SIMILARITY_METHODS) {
      expect(index.search(peaks, { method, group: 2 }).map((hit) => hit.id)).toEqual([2]);
      expect(index.search(peaks, { method, group: 127, reverse: true }).map((hit) => hit.id)).toEqual([4]);
      expect(index.search(peaks, { method }).map((hit) => hit.id)).toEqual([1, 2, 3, 4]);
    }
    index.remove(2);
    expect(index.search(peaks, { group: 2 })).toEqual([]);
    const invalid = (field: string) => expect.objectContaining({ code: 'INVALID_ARGUMENT', field });
    expect(() => index.add(5, peaks, { group: 128 })).toThrow(invalid('meta.group'));
    expect(() => index.add(5, peaks, { group: 1.5 })).toThrow(invalid('meta.group'));
    expect(() => index.search(peaks, { group: 0 })).toThrow(invalid('group'));
    expect(index.size).toBe(3);
  });

  it('never returns spectra that share no m/z with the query', () => {
    const index = new SpectrumIndex();
    index.add(1, [[43, 100]]);
    index.add(2, [[44, 100]]);
    expect(index.search([[43, 10]], { k: 5 }).map((hit) => hit.id)).toEqual([1]);
  });

  it('in reverse mode ranks by reverseScore and reports the forward score beside it', () => {
    const index = new SpectrumIndex({ method: 'cosine' });
    index.add(1, [[43, 100], [58, 25]]);
    index.add(2, [[15, 10], [43, 100], [58, 25], [91, 50]]);
    const query = [[15, 10], [43, 100], [58, 25], [120, 40]] as const;
    const [top] = index.search(query, { reverse: true });
    expect(top?.id).toBe(1);
    expect(top?.reverseScore).toBeCloseTo(1, 12);
    expect(top?.score).toBe(compareSpectra(query, [[43, 100], [58, 25]], { method: 'cosine' }).score);
  });

  it('keeps its memory at or under 16 bytes per peak once packed', () => {
    const index = new SpectrumIndex();
    simulatedLibrary(2000, 8).forEach((peaks, id) => index.add(id, peaks));
    index.pack();
    const memory = index.memory();
    expect(memory.indexBytes / memory.peakCount).toBeLessThanOrEqual(16);
  });

  it('stays exact when thousands of spectra share every peak with the query (the composite second pass)', () => {
    // 4,000 spectra on the same 40 m/z with random intensities: the first, loose bounds of a forward
    // composite search (ratio term anywhere in [0, 1]) leave nearly all in play, past the exact-score
    // budget, so the search accumulates the ratio term in a second pass.
    const random = seededRandom(31);
    const mzs = Array.from({ length: 40 }, (_, i) => 40 + 7 * i);
    const spectrum = (): Peak[] => mzs.map((mz) => [mz, 1 + 99 * random()]);
    const entries: Entry[] = Array.from({ length: 4000 }, (_, id) => ({ id, peaks: spectrum(), meta: {} }));
    const index = new SpectrumIndex();
    for (const e of entries) index.add(e.id, e.peaks);
    for (let i = 0; i < 3; i++) {
      const query = spectrum();
      for (const k of [1, 10, 50]) {
        expect(index.search(query, { method: 'composite', k })).toEqual(searchOneByOne(entries, query, { method: 'composite', k }));
      }
      const even = (id: number) => id % 2 === 0;
      expect(index.search(query, { method: 'composite', filter: even })).toEqual(searchOneByOne(entries, query, { method: 'composite', filter: even }));
    }
  });

  it('lists the matched peaks of a hit exactly as compareSpectra does from the original peaks', () => {
    const library = simulatedLibrary(200, 11);
    const index = new SpectrumIndex();
    library.forEach((peaks, id) => index.add(id, peaks));
    const random = seededRandom(12);
    for (let i = 0; i < 20; i++) {
      const source = Math.floor(random() * library.length);
      const query = simulatedReplicate(library[source] as Peak[], random);
      for (const hit of index.search(query, { k: 3 })) {
        const expected = compareSpectra(query, library[hit.id] as Peak[]).matchedPeaks;
        expect(index.matchedPeaks(query, hit.id)).toEqual(expected);
        expect(expected.length).toBe(hit.matchedPeakCount);
      }
    }
    expect(() => index.matchedPeaks([[43, 100]], 999)).toThrow(expect.objectContaining({ code: 'INVALID_ARGUMENT', field: 'id' }));
  });

  it('does not mutate the spectra it is given', () => {
    const index = new SpectrumIndex();
    const peaks = [[58.2, 25], [43, 1000]] as const;
    const query = [[43, 5], [58, 1]] as const;
    index.add(1, peaks);
    index.search(query);
    expect(peaks).toEqual([[58.2, 25], [43, 1000]]);
    expect(query).toEqual([[43, 5], [58, 1]]);
  });

  it('rejects bad ids, duplicate ids, bad meta, bad peaks and bad search options with ChemError fields', () => {
    const index = new SpectrumIndex();
    index.add(7, [[43, 1]]);
    const field = (run: () => unknown) => expect(run).toThrow(expect.objectContaining({ name: 'ChemError' }));
    field(() => index.add(-1, [[43, 1]]));
    expect(() => index.add(1.5, [[43, 1]])).toThrow(expect.objectContaining({ code: 'INVALID_ARGUMENT', field: 'id' }));
    expect(() => index.add(7, [[43, 1]])).toThrow(expect.objectContaining({ code: 'INVALID_ARGUMENT', field: 'id' }));
    expect(() => index.add(8, [[43, 1]], { nominalMass: NaN })).toThrow(expect.objectContaining({ field: 'meta.nominalMass' }));
    expect(() => index.add(8, [[43, -1]])).toThrow(expect.objectContaining({ code: 'INVALID_PEAKS', field: 'peaks[0].intensity' }));
    expect(() => index.search([])).toThrow(expect.objectContaining({ code: 'EMPTY_SPECTRUM', field: 'query' }));
    expect(() => index.search([[43, 1]], { k: 0 })).toThrow(expect.objectContaining({ code: 'INVALID_ARGUMENT', field: 'k' }));
    expect(() => index.search([[43, 1]], { method: 'x' as never })).toThrow(expect.objectContaining({ field: 'method' }));
    expect(() => index.search([[43, 1]], { retentionIndex: { value: 1, tolerance: -1 } })).toThrow(
      expect.objectContaining({ field: 'retentionIndex.tolerance' }),
    );
    expect(() => new SpectrumIndex({ k: 2.5 })).toThrow(expect.objectContaining({ field: 'k' }));
    expect(index.size).toBe(1);
  });

  it('remove returns false for an id it does not hold, and a removed id can be added again', () => {
    const index = new SpectrumIndex();
    index.add(1, [[43, 1]]);
    expect(index.remove(2)).toBe(false);
    expect(index.remove(1)).toBe(true);
    expect(index.has(1)).toBe(false);
    expect(index.search([[43, 1]])).toEqual([]);
    index.add(1, [[44, 1]]);
    expect(index.search([[44, 1]]).map((hit) => hit.id)).toEqual([1]);
  });
});
