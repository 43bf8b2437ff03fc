import { ChemError } from '../errors/chem-error';
import type { PeakList } from '../types';
import { basePeak } from './base-peak';

/**
 * Drops peaks whose intensity is below a percentage of the base peak.
 *
 * @param peaks - any peak list; not changed.
 * @param relIntensity - threshold in percent of the base peak, 0–100 (0 keeps every peak).
 * @returns a new list with the peaks at or above the threshold, in their original order.
 * @throws {ChemError} `INVALID_ARGUMENT` when `relIntensity` is not a number in [0, 100].
 * @throws {ChemError} `EMPTY_SPECTRUM` when `peaks` is empty.
 * @example
 * applyNoiseThreshold([[15, 0.5], [43, 100]], 1); // [[43, 100]]
 */
export function applyNoiseThreshold(peaks: PeakList, relIntensity: number): PeakList {
  if (typeof relIntensity !== 'number' || !(relIntensity >= 0 && relIntensity <= 100)) {
    throw new ChemError('INVALID_ARGUMENT', 'the noise threshold must be a percentage of the base peak in [0, 100]', {
      field: 'relIntensity',
    });
  }
  const cutoff = (basePeak(peaks)[1] * relIntensity) / 100;
  return peaks.filter((peak) => peak[1] >= cutoff);
}
