import { normalizedArrays } from '../spectrum/normalized-arrays';
import type { PeakList } from '../types';

/**
 * A normalised spectrum as parallel arrays: m/z strictly increasing (nominal), relative intensity with
 * the base peak at 100, read from `start` (inclusive) to `end` (exclusive). The search index points views
 * into its packed arrays; {@link prepareSpectrum} makes one from a peak list. Every score function reads
 * views, so a spectrum scores the same wherever it is stored.
 */
export interface SpectrumView {
  readonly mz: ArrayLike<number>;
  readonly relIntensity: ArrayLike<number>;
  readonly start: number;
  readonly end: number;
}

/**
 * Validates and normalises a peak list (nominal m/z, see {@link normalizeSpectrum}) into a {@link SpectrumView}.
 *
 * @param peaks - any peak list; not changed.
 * @param field - name used in error fields (`query`, `library`, ...).
 * @throws {ChemError} as {@link validatePeaks} and {@link normalizeSpectrum} do, with `field` prefixed.
 * @example
 * prepareSpectrum([[43, 1000], [58, 250]]).relIntensity; // [100, 25]
 */
export function prepareSpectrum(peaks: PeakList, field = 'peaks'): SpectrumView {
  const { mz, relIntensity } = normalizedArrays(peaks, 'nominal', field);
  return { mz, relIntensity, start: 0, end: mz.length };
}
