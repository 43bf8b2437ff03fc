import { alignedSums, clampScore, type AlignedSums } from './aligned-sums';
import type { PairwiseScoreOptions } from './cosine-similarity';
import { prepareSpectrum, type SpectrumView } from './spectrum-view';
import { ChemError } from '../errors/chem-error';
import type { PeakList } from '../types';

/** Stein & Scott 1994 weights for EI spectra: W = (m/z)^3 · I^0.6 (SCIENCE.md §3, secondary source). */
export const STEIN_SCOTT_MZ_POWER = 3;
/** See {@link STEIN_SCOTT_MZ_POWER}. */
export const STEIN_SCOTT_INTENSITY_POWER = 0.6;

/** Options of {@link weightedDotProduct}. */
export interface WeightedDotProductOptions extends PairwiseScoreOptions {
  /** Exponent a of m/z in the weight, default 3. */
  mzPower?: number;
  /** Exponent b of the relative intensity in the weight, default 0.6. */
  intensityPower?: number;
}

/**
 * Weighted dot product of two prepared spectra (kernel behind {@link weightedDotProduct}).
 * @example
 * weightedDotProductScore(prepareSpectrum(a), prepareSpectrum(b), false);
 */
export function weightedDotProductScore(
  query: SpectrumView,
  library: SpectrumView,
  reverse: boolean,
  mzPower = STEIN_SCOTT_MZ_POWER,
  intensityPower = STEIN_SCOTT_INTENSITY_POWER,
): number {
  return weightedFromSums(alignedSums(query, library, reverse, mzPower, intensityPower));
}

/**
 * The weighted dot product from its sums: dot² / (|Q|²·|L|²).
 * @example
 * weightedFromSums(alignedSums(q, l, false, 3, 0.6));
 */
export function weightedFromSums(sums: Pick<AlignedSums, 'dot' | 'queryNormSq' | 'libraryNormSq'>): number {
  if (sums.dot === 0) return 0;
  return clampScore((sums.dot * sums.dot) / (sums.queryNormSq * sums.libraryNormSq));
}

/**
 * Stein & Scott 1994 weighted dot product (J. Am. Soc. Mass Spectrom. 5, 859): with
 * W = (m/z)^a · I^b, DP = (Σ W_U·W_L)² / (Σ W_U² · Σ W_L²) over the union of nominal m/z (SCIENCE.md §3).
 * Symmetric in forward mode; the square makes it the squared cosine of the weighted spectra.
 *
 * @param query - the unknown spectrum; not changed.
 * @param library - the library spectrum; not changed.
 * @param options - `mzPower` a (default 3), `intensityPower` b (default 0.6), `reverse`.
 * @returns a score in [0, 1].
 * @throws {ChemError} for bad peak lists (fields `query…`, `library…`), `INVALID_ARGUMENT` for
 *   non-finite powers.
 * @example
 * weightedDotProduct([[15, 10], [43, 100], [58, 25]], [[42, 5], [43, 100], [58, 30]]); // 0.98728
 */
export function weightedDotProduct(
  query: PeakList,
  library: PeakList,
  options: WeightedDotProductOptions = {},
): number {
  const { mzPower = STEIN_SCOTT_MZ_POWER, intensityPower = STEIN_SCOTT_INTENSITY_POWER } = options;
  if (!Number.isFinite(mzPower) || !Number.isFinite(intensityPower)) {
    throw new ChemError('INVALID_ARGUMENT', 'mzPower and intensityPower must be finite numbers', {
      field: Number.isFinite(mzPower) ? 'intensityPower' : 'mzPower',
    });
  }
  return weightedDotProductScore(
    prepareSpectrum(query, 'query'),
    prepareSpectrum(library, 'library'),
    options.reverse ?? false,
    mzPower,
    intensityPower,
  );
}
