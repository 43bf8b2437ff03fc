import { describe, expect, it } from 'vitest';
import { weightedDotProduct } from './weighted-dot-product';
import { WORKED_EXAMPLE } from './worked-example';

describe('weightedDotProduct', () => {
  it('reproduces the worked check of SCIENCE.md §3 (Stein & Scott 1994, a = 3, b = 0.6) to 4 decimals (0.98728)', () => {
    expect(weightedDotProduct(WORKED_EXAMPLE.a, WORKED_EXAMPLE.b)).toBeCloseTo(WORKED_EXAMPLE.weightedDotProduct, 4);
  });
  it('is symmetric', () => {
    expect(weightedDotProduct(WORKED_EXAMPLE.b, WORKED_EXAMPLE.a)).toBeCloseTo(weightedDotProduct(WORKED_EXAMPLE.a, WORKED_EXAMPLE.b), 14);
  });
  it('with a = 0, b = 1 is the square of the cosine (from the definitions)', () => {
    const plain = weightedDotProduct(WORKED_EXAMPLE.a, WORKED_EXAMPLE.b, { mzPower: 0, intensityPower: 1 });
    expect(plain).toBeCloseTo(WORKED_EXAMPLE.cosine ** 2, 4);
  });
  it('scores identical spectra 1 and disjoint spectra 0', () => {
    expect(weightedDotProduct([[43, 100], [58, 25], [91, 7]], [[43, 100], [58, 25], [91, 7]])).toBeCloseTo(1, 14);
    expect(weightedDotProduct([[43, 100]], [[44, 100]])).toBe(0);
  });
  it('when a power is not finite, throws INVALID_ARGUMENT', () => {
    expect(() => weightedDotProduct(WORKED_EXAMPLE.a, WORKED_EXAMPLE.b, { mzPower: NaN })).toThrow(
      expect.objectContaining({ code: 'INVALID_ARGUMENT', field: 'mzPower' }),
    );
  });
  it('when a spectrum is bad, throws ChemError with the field', () => {
    expect(() => weightedDotProduct('x' as never, WORKED_EXAMPLE.b)).toThrow(expect.objectContaining({ code: 'INVALID_PEAKS', field: 'query' }));
  });
});
