import { describe, expect, it } from 'vitest';
import { compositeSimilarity } from './composite-similarity';
import { weightedDotProduct } from './weighted-dot-product';
import { WORKED_EXAMPLE } from './worked-example';

describe('compositeSimilarity', () => {
  it('on the worked example follows (N_U·F1 + N_LU·F2)/(N_U + N_LU) (Stein & Scott 1994, form of docs/decisions/composite-score.md)', () => {
    // N_U = 3 query peaks, N_LU = 2 shared (43, 58); F2 has one term: ((30/100)/(25/100))^0.6 inverted,
    // i.e. (25/30)^0.6; F1 = the weighted dot product (SCIENCE.md §3: 0.98728). Computed by hand.
    const f2 = (25 / 30) ** 0.6;
    const expected = (3 * 0.9872753305408106 + 2 * f2) / 5;
    expect(compositeSimilarity(WORKED_EXAMPLE.a, WORKED_EXAMPLE.b)).toBeCloseTo(expected, 10);
    expect(expected).toBeCloseTo(0.95092, 4);
  });
  it('scores identical spectra exactly 1 (F2 divided by N_LU − 1) and disjoint spectra 0', () => {
    const s = [[41, 30], [43, 100], [57, 45], [71, 12], [85, 3]] as const;
    expect(compositeSimilarity(s, s)).toBeCloseTo(1, 14);
    expect(compositeSimilarity([[43, 100]], [[44, 100]])).toBe(0);
  });
  it('with a single shared peak equals the weighted dot product (F2 carries no information)', () => {
    const q = [[43, 100], [58, 30]] as const;
    const l = [[43, 100], [59, 30]] as const;
    expect(compositeSimilarity(q, l)).toBe(weightedDotProduct(q, l));
  });
  it('penalises shared peaks whose ratios disagree even when the dot product is the same', () => {
    // Swapping which of two equal-m/z-weight peaks is large keeps F1 below 1 but F2 drops sharply.
    const q = [[50, 100], [51, 10], [52, 100]] as const;
    const agree = [[50, 100], [51, 10], [52, 100]] as const;
    const disagree = [[50, 10], [51, 100], [52, 10]] as const;
    expect(compositeSimilarity(q, agree)).toBeGreaterThan(compositeSimilarity(q, disagree));
  });
  it('is not symmetric: N_U belongs to the query', () => {
    const { a, b } = WORKED_EXAMPLE;
    const extra = [...a, [91, 5], [92, 5]] as const;
    expect(compositeSimilarity(extra, b)).not.toBeCloseTo(compositeSimilarity(b, extra), 6);
  });
  it('in reverse mode uses only the kept query peaks for N_U and F1', () => {
    const { a, b } = WORKED_EXAMPLE;
    const reverse = compositeSimilarity(a, b, { reverse: true });
    const onlyShared = compositeSimilarity([[43, 100], [58, 25]], b, { reverse: true });
    expect(reverse).toBeCloseTo(onlyShared, 14);
    // N_U = N_LU = 2, F1 the reverse weighted dot product, F2 = (25/30)^0.6 as in the forward case.
    const f1 = weightedDotProduct(a, b, { reverse: true });
    expect(reverse).toBeCloseTo((2 * f1 + 2 * (25 / 30) ** 0.6) / 4, 12);
  });
  it('when a spectrum is bad, throws ChemError with the field', () => {
    expect(() => compositeSimilarity([[43, 1]], [[6000, 1]])).toThrow(expect.objectContaining({ field: 'library[0].mz' }));
  });
});
