import { ChemError } from '../errors/chem-error';
import type { Peak, PeakList } from '../types';
import { applyNoiseThreshold } from './apply-noise-threshold';
import { normalizedArrays } from './normalized-arrays';

/** Options of {@link normalizeSpectrum}. */
export interface NormalizeSpectrumOptions {
  /** `nominal` (default) rounds m/z to the nearest integer, as EI libraries compare spectra; `none` keeps it. */
  mzRounding?: 'nominal' | 'none';
  /** Drop peaks below this percentage of the base peak (after merging), 0–100; default 0. */
  noiseRelIntensity?: number;
}

/**
 * Puts a spectrum in the one form that similarity scores and the search index work on.
 *
 * Steps: validate; round m/z (nominal by default, `Math.round`); sort by m/z; merge equal m/z by summing
 * intensities (as {@link mergeDuplicateMz} does); drop zero intensities; scale so the base peak is 100; apply the
 * noise threshold. Relative intensities are rounded to single precision (`Math.fround`, relative error
 * below 6e-8, far finer than any measurement) so that packed Float32 stores such as the search index hold
 * exactly the values that {@link compareSpectra} scores. Normalising a normalised spectrum returns the same
 * values.
 *
 * @param peaks - a peak list in any order and on any intensity scale; not changed.
 * @returns a new list, strictly increasing in m/z, intensities in (0, 100] with the base peak at 100.
 * @throws {ChemError} `INVALID_PEAKS` for a malformed list (see {@link validatePeaks}) or an m/z that
 *   rounds to 0; `EMPTY_SPECTRUM` when no peak has a positive intensity; `INVALID_ARGUMENT` for a bad option.
 * @example
 * normalizeSpectrum([[58.1, 250], [43, 1000], [57.9, 50]]); // [[43, 100], [58, 30]]
 */
export function normalizeSpectrum(peaks: PeakList, options: NormalizeSpectrumOptions = {}): PeakList {
  const { mzRounding = 'nominal', noiseRelIntensity = 0 } = options;
  if (mzRounding !== 'nominal' && mzRounding !== 'none') {
    throw new ChemError('INVALID_ARGUMENT', "mzRounding must be 'nominal' or 'none'", { field: 'mzRounding' });
  }
  const { mz, relIntensity } = normalizedArrays(peaks, mzRounding);
  const scaled: Peak[] = new Array<Peak>(mz.length);
  for (let i = 0; i < mz.length; i++) scaled[i] = [mz[i] as number, relIntensity[i] as number];
  return noiseRelIntensity === 0 ? scaled : applyNoiseThreshold(scaled, noiseRelIntensity);
}
