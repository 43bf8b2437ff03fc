import { describe, expect, it } from 'vitest';
import { compareSpectra } from './compare-spectra';
import { cosineSimilarity } from './cosine-similarity';
import { entropySimilarity } from './entropy-similarity';
import { SIMILARITY_METHODS } from './similarity-method';
import { WORKED_EXAMPLE } from './worked-example';

describe('compareSpectra', () => {
  it('defaults to the composite method, forward, and lists the shared peaks with relative intensities', () => {
    const result = compareSpectra([[15, 20], [43, 200], [58, 50]], WORKED_EXAMPLE.b);
    expect(result.method).toBe('composite');
    expect(result.reverse).toBe(false);
    expect(result.matchedPeaks).toEqual([
      { mz: 43, queryRelIntensity: 100, libraryRelIntensity: 100 },
      { mz: 58, queryRelIntensity: 25, libraryRelIntensity: 30 },
    ]);
  });
  it('gives the same scores as the single-method functions (worked example of SCIENCE.md §3)', () => {
    const { a, b } = WORKED_EXAMPLE;
    expect(compareSpectra(a, b, { method: 'cosine' }).score).toBe(cosineSimilarity(a, b));
    expect(compareSpectra(a, b, { method: 'entropy' }).score).toBeCloseTo(WORKED_EXAMPLE.entropyWeighted, 4);
    expect(compareSpectra(a, b, { method: 'entropy-unweighted', reverse: true }).score).toBe(
      entropySimilarity(a, b, { weighted: false, reverse: true }),
    );
  });
  it('scores every method in [0, 1]: 1 for identical spectra, 0 for disjoint ones', () => {
    for (const method of SIMILARITY_METHODS) {
      for (const reverse of [false, true]) {
        expect(compareSpectra(WORKED_EXAMPLE.a, WORKED_EXAMPLE.a, { method, reverse }).score).toBeCloseTo(1, 12);
        expect(compareSpectra([[43, 1]], [[44, 1]], { method, reverse }).score).toBe(0);
      }
    }
  });
  it('when the method is unknown, throws INVALID_ARGUMENT at field method', () => {
    expect(() => compareSpectra(WORKED_EXAMPLE.a, WORKED_EXAMPLE.b, { method: 'dot' as never })).toThrow(
      expect.objectContaining({ code: 'INVALID_ARGUMENT', field: 'method' }),
    );
  });
  it('does not mutate its inputs', () => {
    const a = WORKED_EXAMPLE.a.map((peak) => [...peak] as const);
    const b = WORKED_EXAMPLE.b.map((peak) => [...peak] as const);
    compareSpectra(a, b, { method: 'entropy', reverse: true });
    expect([a, b]).toEqual([WORKED_EXAMPLE.a, WORKED_EXAMPLE.b]);
  });
});
