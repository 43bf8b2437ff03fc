import { compositeScore } from './composite-similarity';
import { cosineScore } from './cosine-similarity';
import { entropyScore } from './entropy-similarity';
import type { SimilarityMethod } from './similarity-method';
import type { SpectrumView } from './spectrum-view';
import { weightedDotProductScore } from './weighted-dot-product';

/**
 * Scores two prepared spectra by any {@link SimilarityMethod}: the one function that both
 * {@link compareSpectra} and the search index call, so both give bit-identical scores.
 *
 * @returns a score in [0, 1].
 * @example
 * scoreSpectrumViews(prepareSpectrum(a), prepareSpectrum(b), 'composite', false);
 */
export function scoreSpectrumViews(
  query: SpectrumView,
  library: SpectrumView,
  method: SimilarityMethod,
  reverse: boolean,
): number {
  switch (method) {
    case 'composite':
      return compositeScore(query, library, reverse);
    case 'cosine':
      return cosineScore(query, library, reverse);
    case 'weighted':
      return weightedDotProductScore(query, library, reverse);
    case 'entropy':
      return entropyScore(query, library, true, reverse);
    case 'entropy-unweighted':
      return entropyScore(query, library, false, reverse);
  }
}
