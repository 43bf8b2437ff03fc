import { ChemError } from '../errors/chem-error';
import { normalizeSpectrum } from '../spectrum/normalize-spectrum';
import { validatePeaks } from '../spectrum/validate-peaks';
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
 * prepareSpectrum([[43, 1000], [58, 250]]).relIntensity; // Float64Array [100, 25]
 */
export function prepareSpectrum(peaks: PeakList, field = 'peaks'): SpectrumView {
  validatePeaks(peaks, field);
  const normalized = normalizeSpectrumWithField(peaks, field);
  const mz = new Float64Array(normalized.length);
  const relIntensity = new Float64Array(normalized.length);
  normalized.forEach(([peakMz, peakRelIntensity], i) => {
    mz[i] = peakMz;
    relIntensity[i] = peakRelIntensity;
  });
  return { mz, relIntensity, start: 0, end: normalized.length };
}

function normalizeSpectrumWithField(peaks: PeakList, field: string): PeakList {
  try {
    return normalizeSpectrum(peaks);
  } catch (error) {
    if (error instanceof ChemError && error.field !== undefined && field !== 'peaks') {
      const renamed = error.field.replace(/^peaks/, field);
      throw new ChemError(error.code, error.message.replace(/^peaks/, field), { field: renamed });
    }
    throw error;
  }
}
