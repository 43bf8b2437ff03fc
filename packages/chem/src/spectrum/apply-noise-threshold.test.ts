import { describe, expect, it } from 'vitest';
import { applyNoiseThreshold } from './apply-noise-threshold';

describe('applyNoiseThreshold', () => {
  const peaks = [[15, 4], [43, 400], [44, 3.99], [58, 100]] as const;
  it('drops peaks below the percentage of the base peak and keeps those exactly at it', () => {
    expect(applyNoiseThreshold(peaks, 1)).toEqual([[15, 4], [43, 400], [58, 100]]);
  });
  it('with 0 keeps every peak; with 100 keeps only the base peak', () => {
    expect(applyNoiseThreshold(peaks, 0)).toHaveLength(4);
    expect(applyNoiseThreshold(peaks, 100)).toEqual([[43, 400]]);
  });
  it.each([-1, 101, NaN])('when the threshold is %s, throws INVALID_ARGUMENT', (threshold) => {
    expect(() => applyNoiseThreshold(peaks, threshold)).toThrow(
      expect.objectContaining({ code: 'INVALID_ARGUMENT', field: 'relIntensity' }),
    );
  });
  it('does not mutate its input', () => {
    const input = [[1, 1], [2, 100]] as const;
    applyNoiseThreshold(input, 50);
    expect(input).toEqual([[1, 1], [2, 100]]);
  });
});
