import { describe, expect, it } from 'vitest';
import { MAX_MZ, validatePeaks } from './validate-peaks';

describe('validatePeaks', () => {
  it('when the list is well formed, returns the same array unchanged', () => {
    const peaks = [[58, 25], [43, 100], [43, 0]];
    const copy = peaks.map((peak) => [...peak] as const);
    expect(validatePeaks(peaks)).toBe(peaks);
    expect(peaks).toEqual(copy);
  });

  it.each([
    ['not an array', { 43: 100 }, 'INVALID_PEAKS', 'peaks'],
    ['a string', '43 100', 'INVALID_PEAKS', 'peaks'],
    ['empty', [], 'EMPTY_SPECTRUM', 'peaks'],
    ['a peak that is not a pair', [[43, 100], [58]], 'INVALID_PEAKS', 'peaks[1]'],
    ['a peak with three numbers', [[43, 100, 1]], 'INVALID_PEAKS', 'peaks[0]'],
    ['NaN m/z', [[43, 100], [NaN, 5]], 'INVALID_PEAKS', 'peaks[1].mz'],
    ['m/z 0', [[0, 5]], 'INVALID_PEAKS', 'peaks[0].mz'],
    ['negative m/z', [[-43, 5]], 'INVALID_PEAKS', 'peaks[0].mz'],
    ['absurd m/z', [[43, 1], [MAX_MZ + 1, 5]], 'INVALID_PEAKS', 'peaks[1].mz'],
    ['infinite m/z', [[Infinity, 5]], 'INVALID_PEAKS', 'peaks[0].mz'],
    ['m/z as a string', [['43', 5]], 'INVALID_PEAKS', 'peaks[0].mz'],
    ['NaN intensity', [[43, NaN]], 'INVALID_PEAKS', 'peaks[0].intensity'],
    ['negative intensity', [[43, 100], [44, -1]], 'INVALID_PEAKS', 'peaks[1].intensity'],
    ['infinite intensity', [[43, Infinity]], 'INVALID_PEAKS', 'peaks[0].intensity'],
  ])('when the input is %s, throws ChemError %s at field %s', (_, input, code, field) => {
    expect(() => validatePeaks(input)).toThrow(expect.objectContaining({ name: 'ChemError', code, field }));
  });

  it('when a field name is given, errors use it', () => {
    expect(() => validatePeaks([[43, -1]], 'query')).toThrow(expect.objectContaining({ field: 'query[0].intensity' }));
  });

  it('accepts the boundary m/z values just above 0 and exactly the maximum', () => {
    expect(() => validatePeaks([[1e-9, 1], [MAX_MZ, 1]])).not.toThrow();
  });
});
