import { describe, expect, it } from 'vitest';
import { mergeDuplicateMz } from './merge-duplicate-mz';

describe('mergeDuplicateMz', () => {
  it('sorts by m/z and sums intensities of equal m/z', () => {
    expect(mergeDuplicateMz([[58, 5], [43, 100], [58, 20], [15, 1]])).toEqual([[15, 1], [43, 100], [58, 25]]);
  });
  it('does not mutate its input', () => {
    const peaks = [[58, 5], [43, 100], [58, 20]] as const;
    const copy = peaks.map((peak) => [...peak] as const);
    mergeDuplicateMz(peaks);
    expect(peaks).toEqual(copy);
  });
  it('keeps a list without duplicates as it is, sorted', () => {
    expect(mergeDuplicateMz([[2, 1], [1, 2]])).toEqual([[1, 2], [2, 1]]);
  });
});
