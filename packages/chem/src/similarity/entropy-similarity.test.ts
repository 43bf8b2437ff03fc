import { describe, expect, it } from 'vitest';
import { seededRandom } from '../isotopes/seeded-random';
import { normalizeSpectrum } from '../spectrum/normalize-spectrum';
import { simulatedSpectrum } from '../search-index/synthetic-library';
import type { PeakList } from '../types';
import { entropySimilarity } from './entropy-similarity';
import { WORKED_EXAMPLE } from './worked-example';

/** Li et al. 2021 written directly over the union of m/z (SCIENCE.md §3), independent of the kernel. */
function entropyByDefinition(a: PeakList, b: PeakList, weighted: boolean): number {
  const mzs = [...new Set([...a, ...b].map(([mz]) => mz))];
  const entropy = (p: number[]): number => -p.filter((x) => x > 0).reduce((s, x) => s + x * Math.log(x), 0);
  const distribution = (spectrum: PeakList): number[] => {
    const raw = mzs.map((mz) => spectrum.find(([m]) => m === mz)?.[1] ?? 0);
    let p = raw.map((x) => x / raw.reduce((s, y) => s + y, 0));
    const s = entropy(p);
    if (weighted && s < 3) {
      const w = 0.25 + 0.25 * s;
      const powered = p.map((x) => x ** w);
      p = powered.map((x) => x / powered.reduce((t, y) => t + y, 0));
    }
    return p;
  };
  const p = distribution(a);
  const q = distribution(b);
  const mixed = p.map((x, i) => (x + (q[i] as number)) / 2);
  return 1 - (2 * entropy(mixed) - entropy(p) - entropy(q)) / Math.log(4);
}

describe('entropySimilarity', () => {
  it('reproduces the worked check of SCIENCE.md §3 (Li et al. 2021) to 4 decimals: weighted 0.82760', () => {
    expect(entropySimilarity(WORKED_EXAMPLE.a, WORKED_EXAMPLE.b)).toBeCloseTo(WORKED_EXAMPLE.entropyWeighted, 4);
  });
  it('reproduces the worked check to 4 decimals: unweighted 0.94323', () => {
    expect(entropySimilarity(WORKED_EXAMPLE.a, WORKED_EXAMPLE.b, { weighted: false })).toBeCloseTo(WORKED_EXAMPLE.entropyUnweighted, 4);
  });
  it('equals the definition over the union of m/z on simulated spectra, both forms', () => {
    const random = seededRandom(11);
    for (let i = 0; i < 30; i++) {
      const a = simulatedSpectrum(random, { maxMz: 120, peakCount: 20 });
      const b = simulatedSpectrum(random, { maxMz: 120, peakCount: 20 });
      for (const weighted of [true, false]) {
        // The kernel scores normalised spectra (single-precision relative intensities): compare on those.
        const expected = entropyByDefinition(normalizeSpectrum(a), normalizeSpectrum(b), weighted);
        expect(entropySimilarity(a, b, { weighted })).toBeCloseTo(expected, 12);
      }
    }
  });
  it('is symmetric, scores identical spectra 1 and disjoint spectra 0', () => {
    const { a, b } = WORKED_EXAMPLE;
    expect(entropySimilarity(b, a)).toBeCloseTo(entropySimilarity(a, b), 14);
    expect(entropySimilarity(a, a)).toBeCloseTo(1, 12);
    expect(entropySimilarity([[43, 100]], [[44, 100]])).toBe(0);
  });
  it('in reverse mode renormalises the kept query peaks, so a query with extra peaks can still score 1', () => {
    expect(entropySimilarity([[15, 50], [43, 100], [58, 25]], [[43, 100], [58, 25]], { reverse: true })).toBeCloseTo(1, 12);
    expect(entropySimilarity([[15, 50], [43, 100], [58, 25]], [[43, 100], [58, 25]])).toBeLessThan(0.9);
  });
  it('never returns NaN, even for a single-peak spectrum (entropy 0)', () => {
    const score = entropySimilarity([[43, 100]], [[43, 5], [44, 100]]);
    expect(Number.isNaN(score)).toBe(false);
    expect(score).toBeGreaterThan(0);
  });
  it('when a spectrum is bad, throws ChemError with the field', () => {
    expect(() => entropySimilarity([[43, 1]], [[43, -1]])).toThrow(expect.objectContaining({ field: 'library[0].intensity' }));
  });
});
