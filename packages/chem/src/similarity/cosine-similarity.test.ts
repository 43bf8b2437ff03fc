import { describe, expect, it } from 'vitest';
import { cosineSimilarity } from './cosine-similarity';
import { WORKED_EXAMPLE } from './worked-example';

describe('cosineSimilarity', () => {
  it('reproduces the worked check of SCIENCE.md §3 to 4 decimals (0.99311)', () => {
    expect(cosineSimilarity(WORKED_EXAMPLE.a, WORKED_EXAMPLE.b)).toBeCloseTo(WORKED_EXAMPLE.cosine, 4);
  });
  it('is symmetric', () => {
    expect(cosineSimilarity(WORKED_EXAMPLE.b, WORKED_EXAMPLE.a)).toBe(cosineSimilarity(WORKED_EXAMPLE.a, WORKED_EXAMPLE.b));
  });
  it('scores identical spectra (at any scale) 1 and disjoint spectra 0', () => {
    expect(cosineSimilarity([[43, 100], [58, 25]], [[43, 1000], [58, 250]])).toBe(1);
    expect(cosineSimilarity([[43, 100]], [[44, 100]])).toBe(0);
  });
  it('in reverse mode ignores query peaks absent from the library spectrum', () => {
    // Only m/z 43 and 58 count: U = (100, 25), L = (100, 30) → 10750 / sqrt(10625 · 10925) (computed by hand).
    const reverse = cosineSimilarity(WORKED_EXAMPLE.a, WORKED_EXAMPLE.b, { reverse: true });
    expect(reverse).toBeCloseTo(10750 / Math.sqrt(10625 * 10925), 12);
    expect(reverse).toBeGreaterThan(cosineSimilarity(WORKED_EXAMPLE.a, WORKED_EXAMPLE.b));
  });
  it('when a spectrum is bad, throws ChemError naming query or library', () => {
    expect(() => cosineSimilarity([[43, NaN]], WORKED_EXAMPLE.b)).toThrow(expect.objectContaining({ field: 'query[0].intensity' }));
    expect(() => cosineSimilarity(WORKED_EXAMPLE.a, [])).toThrow(expect.objectContaining({ code: 'EMPTY_SPECTRUM', field: 'library' }));
    expect(() => cosineSimilarity(WORKED_EXAMPLE.a, [[-5, 1]])).toThrow(expect.objectContaining({ field: 'library[0].mz' }));
  });
  it('does not mutate its inputs', () => {
    const a = WORKED_EXAMPLE.a.map((peak) => [...peak] as const);
    cosineSimilarity(a, [[58, 3], [43, 9]]);
    expect(a).toEqual(WORKED_EXAMPLE.a);
  });
});
