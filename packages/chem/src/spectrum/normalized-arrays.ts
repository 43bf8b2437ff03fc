import { ChemError } from '../errors/chem-error';
import type { PeakList } from '../types';
import { validatePeaks } from './validate-peaks';

/** A normalised spectrum as parallel arrays (see {@link normalizedArrays}). */
export interface NormalizedArrays {
  mz: number[];
  relIntensity: number[];
}

/**
 * The core of {@link normalizeSpectrum}, writing straight into typed arrays: validate, round m/z
 * (`nominal`: `Math.round`), drop zero intensities, sort by m/z (stable: equal m/z keep input order),
 * sum equal m/z in that order, scale the base peak to 100 and round to single precision.
 * Both normalizeSpectrum and the similarity kernels use it, so they agree to the last bit.
 * Plain arrays, not typed ones: small typed arrays cost an off-heap allocation each, which made loading
 * a large library several times slower through garbage collection.
 *
 * @param peaks - any peak list; not changed.
 * @param mzRounding - `nominal` or `none`.
 * @param field - name for error fields.
 * @throws {ChemError} as {@link validatePeaks}; `INVALID_PEAKS` for an m/z that rounds to 0;
 *   `EMPTY_SPECTRUM` when no intensity is positive.
 * @example
 * normalizedArrays([[58.1, 250], [43, 1000]], 'nominal').relIntensity; // [100, 25]
 */
export function normalizedArrays(peaks: PeakList, mzRounding: 'nominal' | 'none', field = 'peaks'): NormalizedArrays {
  validatePeaks(peaks, field);
  const n = peaks.length;
  const mz: number[] = [];
  const intensity: number[] = [];
  let kept = 0;
  let sorted = true;
  for (let i = 0; i < n; i++) {
    const peak = peaks[i] as readonly [number, number];
    const peakMz = mzRounding === 'nominal' ? Math.round(peak[0]) : peak[0];
    if (peakMz <= 0) {
      throw new ChemError('INVALID_PEAKS', `${field}[${i}].mz rounds to 0`, { field: `${field}[${i}].mz` });
    }
    if (peak[1] > 0) {
      if (kept > 0 && peakMz < (mz[kept - 1] as number)) sorted = false;
      mz.push(peakMz);
      intensity.push(peak[1]);
      kept++;
    }
  }
  if (kept === 0) {
    throw new ChemError('EMPTY_SPECTRUM', `${field} has no peak with a positive intensity`, { field });
  }
  let order: ArrayLike<number> | undefined;
  if (!sorted) {
    order = Array.from({ length: kept }, (_, i) => i).sort((a, b) => (mz[a] as number) - (mz[b] as number) || a - b);
  }
  const outMz: number[] = [];
  const outIntensity: number[] = [];
  let length = 0;
  let base = 0;
  for (let r = 0; r < kept; r++) {
    const i = order === undefined ? r : (order[r] as number);
    const peakMz = mz[i] as number;
    if (length > 0 && outMz[length - 1] === peakMz) {
      outIntensity[length - 1] = (outIntensity[length - 1] as number) + (intensity[i] as number);
    } else {
      outMz.push(peakMz);
      outIntensity.push(intensity[i] as number);
      length++;
    }
    if ((outIntensity[length - 1] as number) > base) base = outIntensity[length - 1] as number;
  }
  let out = 0;
  for (let i = 0; i < length; i++) {
    const relIntensity = Math.fround(((outIntensity[i] as number) / base) * 100);
    if (relIntensity > 0) {
      outMz[out] = outMz[i] as number;
      outIntensity[out] = relIntensity;
      out++;
    }
  }
  outMz.length = out;
  outIntensity.length = out;
  return { mz: outMz, relIntensity: outIntensity };
}
