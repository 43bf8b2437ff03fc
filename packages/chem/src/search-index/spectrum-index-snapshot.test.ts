import { describe, expect, it } from 'vitest';
import { seededRandom } from '../isotopes/seeded-random';
import { compareSpectra } from '../similarity/compare-spectra';
import { SIMILARITY_METHODS } from '../similarity/similarity-method';
import type { Peak } from '../types';
import { SpectrumIndex } from './spectrum-index';
import { simulatedLibrary, simulatedReplicate } from './synthetic-library';

// structuredClone serialises a snapshot as postMessage does for a worker thread: SharedArrayBuffers
// are shared, anything else is copied.
const { structuredClone } = globalThis as unknown as { structuredClone: <T>(value: T) => T };
const transfer = <T>(value: T): T => structuredClone(value);

describe('SpectrumIndex snapshots', () => {
  const library = simulatedLibrary(1500, 23);

  it('a read-only copy from a shared-memory snapshot searches exactly as the original, for every method and mode', () => {
    const writer = new SpectrumIndex({ sharedMemory: true });
    library.forEach((peaks, id) => writer.add(id, peaks, { nominalMass: 50 + (id % 200) }));
    writer.pack();
    for (let id = 1200; id < 1300; id++) writer.remove(id); // dead slots in the snapshot
    const reader = SpectrumIndex.fromSnapshot(transfer(writer.snapshot()));
    expect(reader.size).toBe(writer.size);
    const random = seededRandom(4);
    for (let q = 0; q < 4; q++) {
      const query = simulatedReplicate(library[Math.floor(random() * 1000)] as Peak[], random);
      for (const method of SIMILARITY_METHODS) {
        for (const reverse of [false, true]) {
          const options = { method, reverse, k: 7, minMass: 80 };
          expect(reader.search(query, options)).toEqual(writer.search(query, options));
        }
      }
    }
  });

  it('shares the large arrays instead of copying them, and sees a removal at once', () => {
    const writer = new SpectrumIndex({ sharedMemory: true });
    library.slice(0, 300).forEach((peaks, id) => writer.add(id, peaks));
    writer.pack();
    const snapshot = transfer(writer.snapshot());
    for (const array of [snapshot.main.slots, snapshot.main.weights, snapshot.peakMz, snapshot.slot.flags, snapshot.slot.weightedNormSq]) {
      expect(array.buffer).toBeInstanceOf(SharedArrayBuffer);
    }
    const reader = SpectrumIndex.fromSnapshot(snapshot);
    const query = library[42] as Peak[];
    expect(reader.search(query, { k: 1 })[0]?.id).toBe(42);
    writer.remove(42);
    expect(reader.has(42)).toBe(false);
    expect(reader.search(query, { k: 3 }).map((hit) => hit.id)).not.toContain(42);
  });

  it('adopts newer snapshots: spectra added after the first one are found, in the delta tier and after a repack', () => {
    const writer = new SpectrumIndex({ sharedMemory: true });
    library.slice(0, 300).forEach((peaks, id) => writer.add(id, peaks));
    writer.pack();
    const reader = SpectrumIndex.fromSnapshot(transfer(writer.snapshot()));
    const query = library[1100] as Peak[];
    expect(reader.search(query, { k: 3 }).map((hit) => hit.id)).not.toContain(1100);
    writer.add(1100, query);
    // The old snapshot covers the first 300 slots only: the new spectrum is not in it yet.
    expect(reader.search(query, { k: 3 }).map((hit) => hit.id)).not.toContain(1100);
    const second = writer.snapshot();
    reader.adopt(transfer(second));
    expect(reader.search(query, { k: 1 })).toEqual(writer.search(query, { k: 1 }));
    expect(reader.search(query, { k: 1 })[0]?.id).toBe(1100);
    // Past 1,024 pending spectra the writer repacks into new arrays on its next snapshot.
    for (let id = 300; id < 1400; id++) if (id !== 1100) writer.add(id, library[id] as Peak[]);
    const repacked = writer.snapshot();
    expect(repacked.main.slots).not.toBe(second.main.slots);
    expect(repacked.main.slots.length).toBe(repacked.peakCount);
    expect(second.main.slots.length).toBeLessThan(repacked.peakCount); // what the older snapshot holds is left alone
    reader.adopt(transfer(repacked));
    expect(reader.size).toBe(1400);
    expect(reader.search(library[1399] as Peak[], { k: 1 })[0]?.id).toBe(1399);
  });

  it('lists matched peaks with the hits when asked, as compareSpectra does', () => {
    const writer = new SpectrumIndex({ sharedMemory: true });
    library.slice(0, 200).forEach((peaks, id) => writer.add(id, peaks));
    const reader = SpectrumIndex.fromSnapshot(transfer(writer.snapshot()));
    const query = simulatedReplicate(library[17] as Peak[], seededRandom(8));
    const hits = reader.search(query, { k: 3, withMatchedPeaks: true });
    expect(hits.length).toBe(3);
    for (const hit of hits) {
      expect(hit.matchedPeaks).toEqual(compareSpectra(query, library[hit.id] as Peak[]).matchedPeaks);
      expect(hit.matchedPeaks).toEqual(reader.matchedPeaks(query, hit.id));
    }
    expect(reader.search(query, { k: 1 })[0]).not.toHaveProperty('matchedPeaks');
  });

  it('refuses changes to a read-only copy, snapshots of it, and adopt on an ordinary index', () => {
    const writer = new SpectrumIndex({ sharedMemory: true });
    writer.add(1, [[43, 100]]);
    const reader = SpectrumIndex.fromSnapshot(writer.snapshot());
    const readOnly = expect.objectContaining({ code: 'INVALID_ARGUMENT', field: 'index' });
    expect(() => reader.add(2, [[44, 100]])).toThrow(readOnly);
    expect(() => reader.remove(1)).toThrow(readOnly);
    expect(() => reader.pack()).toThrow(readOnly);
    expect(() => reader.snapshot()).toThrow(readOnly);
    expect(() => writer.adopt(writer.snapshot())).toThrow(readOnly);
    expect(writer.size).toBe(1);
  });
});
