import { ChemError } from '../errors/chem-error';
import type { Peak, PeakList } from '../types';
import { applyNoiseThreshold } from './apply-noise-threshold';
import { basePeak } from './base-peak';
import { mergeDuplicateMz } from './merge-duplicate-mz';
import { validatePeaks } from './validate-peaks';

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
 * intensities ({@link mergeDuplicateMz}); drop zero intensities; scale so the base peak is 100; apply the
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
  validatePeaks(peaks);
  const rounded: Peak[] = [];
  for (let i = 0; i < peaks.length; i++) {
    const [mz, intensity] = peaks[i] as Peak;
    const mzOut = mzRounding === 'nominal' ? Math.round(mz) : mz;
    if (mzOut <= 0) {
      throw new ChemError('INVALID_PEAKS', `peaks[${i}].mz rounds to 0`, { field: `peaks[${i}].mz` });
    }
    if (intensity > 0) rounded.push([mzOut, intensity]);
  }
  if (rounded.length === 0) {
    throw new ChemError('EMPTY_SPECTRUM', 'the spectrum has no peak with a positive intensity', { field: 'peaks' });
  }
  const merged = mergeDuplicateMz(rounded);
  const base = basePeak(merged)[1];
  const scaled: Peak[] = [];
  for (const [mz, intensity] of merged) {
    const relIntensity = Math.fround((intensity / base) * 100);
    if (relIntensity > 0) scaled.push([mz, relIntensity]);
  }
  return noiseRelIntensity === 0 ? scaled : applyNoiseThreshold(scaled, noiseRelIntensity);
}
