import { alignedSums, clampScore } from './aligned-sums';
import { prepareSpectrum, type SpectrumView } from './spectrum-view';
import type { PeakList } from '../types';

/** Options shared by the pairwise score functions. */
export interface PairwiseScoreOptions {
  /** Reverse search: keep only query peaks whose m/z occurs in the library spectrum, then score. */
  reverse?: boolean;
}

/**
 * Cosine score of two prepared spectra (kernel behind {@link cosineSimilarity}).
 * @example
 * cosineScore(prepareSpectrum(a), prepareSpectrum(b), false);
 */
export function cosineScore(query: SpectrumView, library: SpectrumView, reverse: boolean): number {
  const sums = alignedSums(query, library, reverse, 0, 1);
  if (sums.dot === 0) return 0;
  return clampScore(sums.dot / Math.sqrt(sums.queryNormSq * sums.libraryNormSq));
}

/**
 * Cosine similarity of two spectra: Σ U·L / sqrt(Σ U² · Σ L²) over the union of nominal m/z,
 * intensities as given relative to each base peak (SCIENCE.md §3). Symmetric in forward mode.
 *
 * @param query - the unknown spectrum U, any intensity scale; not changed.
 * @param library - the library spectrum L; not changed.
 * @returns a score in [0, 1]: 1 for identical spectra (up to scale), 0 when no m/z is shared.
 * @throws {ChemError} `INVALID_PEAKS` / `EMPTY_SPECTRUM` (fields `query…`, `library…`) for bad peak lists.
 * @example
 * cosineSimilarity([[15, 10], [43, 100], [58, 25]], [[42, 5], [43, 100], [58, 30]]); // 0.99311
 */
export function cosineSimilarity(query: PeakList, library: PeakList, options: PairwiseScoreOptions = {}): number {
  return cosineScore(prepareSpectrum(query, 'query'), prepareSpectrum(library, 'library'), options.reverse ?? false);
}
