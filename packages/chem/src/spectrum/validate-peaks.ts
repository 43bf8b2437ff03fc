import { ChemError } from '../errors/chem-error';
import type { PeakList } from '../types';

/** Highest m/z accepted anywhere in Ionfolio; EI library spectra end far below it (common practice). */
export const MAX_MZ = 5000;

/**
 * Checks that a value is a usable peak list and returns it typed, without copying or changing it.
 *
 * A peak list is a non-empty array of `[mz, intensity]` pairs with finite numbers,
 * 0 < m/z ≤ {@link MAX_MZ} and intensity ≥ 0 (any positive scale). Order and duplicates are allowed.
 *
 * @param peaks - the value to check, for example a parsed request body.
 * @param field - the name used in error fields, `peaks` by default (`query`, `library` ...).
 * @returns the same array, typed as a {@link PeakList}.
 * @throws {ChemError} `INVALID_PEAKS` when it is not an array, a peak is not a pair of finite numbers,
 *   m/z is ≤ 0 or above {@link MAX_MZ}, or an intensity is negative; `field` names the culprit
 *   (`peaks`, `peaks[3]`, `peaks[3].mz`, `peaks[3].intensity`).
 * @throws {ChemError} `EMPTY_SPECTRUM` when the array is empty.
 * @example
 * validatePeaks([[43, 100], [58, 25]]); // returns the list
 * validatePeaks([[43, NaN]]); // throws ChemError INVALID_PEAKS, field 'peaks[0].intensity'
 */
export function validatePeaks(peaks: unknown, field = 'peaks'): PeakList {
  if (!Array.isArray(peaks)) {
    throw new ChemError('INVALID_PEAKS', `${field} must be an array of [mz, intensity] pairs`, { field });
  }
  if (peaks.length === 0) {
    throw new ChemError('EMPTY_SPECTRUM', `${field} holds no peaks`, { field });
  }
  for (let i = 0; i < peaks.length; i++) {
    const peak: unknown = peaks[i];
    if (!Array.isArray(peak) || peak.length !== 2) {
      throw new ChemError('INVALID_PEAKS', `${field}[${i}] must be an [mz, intensity] pair`, {
        field: `${field}[${i}]`,
      });
    }
    // Index access, not destructuring: this runs for every peak of every library spectrum.
    const mz: unknown = peak[0];
    const intensity: unknown = peak[1];
    if (typeof mz !== 'number' || !Number.isFinite(mz) || mz <= 0 || mz > MAX_MZ) {
      throw new ChemError('INVALID_PEAKS', `${field}[${i}].mz must be a finite number in (0, ${MAX_MZ}]`, {
        field: `${field}[${i}].mz`,
      });
    }
    if (typeof intensity !== 'number' || !Number.isFinite(intensity) || intensity < 0) {
      throw new ChemError('INVALID_PEAKS', `${field}[${i}].intensity must be a finite number ≥ 0`, {
        field: `${field}[${i}].intensity`,
      });
    }
  }
  return peaks as PeakList;
}
