import { describe, expect, it } from 'vitest';
import { normalizeSpectrum } from './normalize-spectrum';

describe('normalizeSpectrum', () => {
  it('rounds to nominal m/z, sums what falls together, sorts and puts the base peak at 100', () => {
    expect(normalizeSpectrum([[58.1, 250], [43, 1000], [57.9, 50], [15, 0]])).toEqual([
      [43, 100],
      [58, 30],
    ]);
  });

  it("with mzRounding 'none' keeps decimal m/z apart", () => {
    expect(normalizeSpectrum([[58.1, 250], [43, 1000], [57.9, 50]], { mzRounding: 'none' })).toEqual([
      [43, 100],
      [57.9, 5],
      [58.1, 25],
    ]);
  });

  it('drops peaks below the noise threshold, in percent of the base peak after merging', () => {
    expect(normalizeSpectrum([[15, 9], [43, 1000], [44, 11]], { noiseRelIntensity: 1 })).toEqual([
      [43, 100],
      [44, 1.100000023841858],
    ]);
  });

  it('holds relative intensities at single precision, and normalising twice changes nothing', () => {
    const once = normalizeSpectrum([[41, 3], [43, 7], [57, 1]]);
    for (const [, relIntensity] of once) expect(Math.fround(relIntensity)).toBe(relIntensity);
    expect(normalizeSpectrum(once)).toEqual(once);
  });

  it('does not mutate its input', () => {
    const peaks = [[58.1, 250], [43, 1000]] as const;
    normalizeSpectrum(peaks);
    expect(peaks).toEqual([[58.1, 250], [43, 1000]]);
  });

  it('when every intensity is 0, throws EMPTY_SPECTRUM', () => {
    expect(() => normalizeSpectrum([[43, 0]])).toThrow(expect.objectContaining({ code: 'EMPTY_SPECTRUM' }));
  });

  it('when an m/z rounds to 0, throws INVALID_PEAKS at that peak', () => {
    expect(() => normalizeSpectrum([[43, 1], [0.2, 1]])).toThrow(
      expect.objectContaining({ code: 'INVALID_PEAKS', field: 'peaks[1].mz' }),
    );
  });

  it('when the input is malformed, throws with the field', () => {
    expect(() => normalizeSpectrum([[43, NaN]])).toThrow(expect.objectContaining({ field: 'peaks[0].intensity' }));
  });

  it('when an option is bad, throws INVALID_ARGUMENT', () => {
    expect(() => normalizeSpectrum([[43, 1]], { mzRounding: 'floor' as 'none' })).toThrow(
      expect.objectContaining({ code: 'INVALID_ARGUMENT', field: 'mzRounding' }),
    );
    expect(() => normalizeSpectrum([[43, 1]], { noiseRelIntensity: 200 })).toThrow(
      expect.objectContaining({ code: 'INVALID_ARGUMENT' }),
    );
  });
});
