import { alignedSums, clampScore, type AlignedSums } from './aligned-sums';
import type { PairwiseScoreOptions } from './cosine-similarity';
import { prepareSpectrum, type SpectrumView } from './spectrum-view';
import { STEIN_SCOTT_INTENSITY_POWER, STEIN_SCOTT_MZ_POWER } from './weighted-dot-product';
import type { PeakList } from '../types';

/**
 * Composite score of two prepared spectra (kernel behind {@link compositeSimilarity}).
 * @example
 * compositeScore(prepareSpectrum(a), prepareSpectrum(b), false);
 */
export function compositeScore(query: SpectrumView, library: SpectrumView, reverse: boolean): number {
  const sums = alignedSums(query, library, reverse, STEIN_SCOTT_MZ_POWER, STEIN_SCOTT_INTENSITY_POWER);
  return compositeFromSums(sums, reverse ? sums.sharedPeakCount : query.end - query.start);
}

/**
 * The composite score from its sums: f1 = dot² / (|Q|²·|L|²), f2 = ratio sum / (shared − 1),
 * (N·f1 + n·f2) / (N + n) with N the query's peak count (the shared count in reverse mode).
 * @example
 * compositeFromSums(alignedSums(q, l, false, 3, 0.6), q.end - q.start);
 */
export function compositeFromSums(sums: AlignedSums, queryPeakCount: number): number {
  if (sums.dot === 0) return 0;
  const f1 = clampScore((sums.dot * sums.dot) / (sums.queryNormSq * sums.libraryNormSq));
  const shared = sums.sharedPeakCount;
  if (shared < 2) return f1;
  const f2 = sums.ratioTermSum / (shared - 1);
  return clampScore((queryPeakCount * f1 + shared * f2) / (queryPeakCount + shared));
}

/**
 * Stein & Scott 1994 composite score (J. Am. Soc. Mass Spectrom. 5, 859; SCIENCE.md §3):
 * composite = (N_U·F1 + N_LU·F2) / (N_U + N_LU), where
 * - F1 is the weighted dot product ({@link weightedDotProduct}, a = 3, b = 0.6);
 * - N_U is the number of query peaks (in reverse mode, of the query peaks kept), N_LU the number of
 *   m/z shared by both spectra;
 * - F2 = 1/(N_LU − 1) · Σ_{i=2..N_LU} (W_L,i · W_U,i−1 / (W_L,i−1 · W_U,i))^n over the shared peaks in
 *   m/z order, n = ±1 so that each term is ≤ 1.
 *
 * Choices (docs/decisions/composite-score.md): F2 is divided by N_LU − 1, the number of its terms, so
 * that identical spectra score exactly 1 (dividing by N_LU would cap them at (N_LU−1)/N_LU); with fewer
 * than two shared peaks F2 carries no information and the score is F1. The ratio uses the same weights
 * W as F1; since both sides share the m/z, this is the intensity ratio raised to 0.6.
 * Not symmetric: N_U belongs to the query.
 *
 * @param query - the unknown spectrum; not changed.
 * @param library - the library spectrum; not changed.
 * @returns a score in [0, 1].
 * @throws {ChemError} for bad peak lists (fields `query…`, `library…`).
 * @example
 * compositeSimilarity([[15, 10], [43, 100], [58, 25]], [[42, 5], [43, 100], [58, 30]]); // 0.95092
 */
export function compositeSimilarity(query: PeakList, library: PeakList, options: PairwiseScoreOptions = {}): number {
  return compositeScore(prepareSpectrum(query, 'query'), prepareSpectrum(library, 'library'), options.reverse ?? false);
}
