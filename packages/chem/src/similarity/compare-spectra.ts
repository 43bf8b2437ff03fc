import { scoreSpectrumViews } from './score-spectrum-views';
import { assertSimilarityMethod, type MatchedPeak, type SimilarityMethod, type SimilarityResult } from './similarity-method';
import { prepareSpectrum, type SpectrumView } from './spectrum-view';
import type { PeakList } from '../types';

/** Options of {@link compareSpectra}. */
export interface CompareSpectraOptions {
  /** Score to compute; default `composite`. */
  method?: SimilarityMethod;
  /** Reverse search: only query peaks whose m/z occurs in the library spectrum count. Default false. */
  reverse?: boolean;
}

/**
 * The m/z shared by two prepared spectra, with both relative intensities, in m/z order.
 * @example
 * matchedPeaks(prepareSpectrum(a), prepareSpectrum(b));
 */
export function matchedPeaks(query: SpectrumView, library: SpectrumView): MatchedPeak[] {
  const matched: MatchedPeak[] = [];
  let j = library.start;
  for (let i = query.start; i < query.end; i++) {
    const mz = query.mz[i] as number;
    while (j < library.end && (library.mz[j] as number) < mz) j++;
    if (j < library.end && library.mz[j] === mz) {
      matched.push({
        mz,
        queryRelIntensity: query.relIntensity[i] as number,
        libraryRelIntensity: library.relIntensity[j] as number,
      });
    }
  }
  return matched;
}

/**
 * Compares a query spectrum with a library spectrum: normalises both (nominal m/z, duplicates summed,
 * base peak 100; see normalizeSpectrum), scores them and lists the shared peaks so that the apps can
 * explain the score in the mirror view. The search index returns exactly these scores.
 *
 * @param query - the unknown spectrum, any order and intensity scale; not changed.
 * @param library - the library spectrum; not changed.
 * @param options - `method` (default `composite`), `reverse` (default false).
 * @returns score in [0, 1] (shown ×100 as similarity), the matched peaks, the method and mode used.
 * @throws {ChemError} `INVALID_PEAKS` / `EMPTY_SPECTRUM` with fields `query…` or `library…`;
 *   `INVALID_ARGUMENT` (field `method`) for an unknown method.
 * @example
 * compareSpectra([[43, 100], [58, 25]], [[43, 100], [58, 30]], { method: 'cosine' }).score; // 0.99892
 */
export function compareSpectra(
  query: PeakList,
  library: PeakList,
  options: CompareSpectraOptions = {},
): SimilarityResult {
  const method = assertSimilarityMethod(options.method ?? 'composite');
  const reverse = options.reverse ?? false;
  const queryView = prepareSpectrum(query, 'query');
  const libraryView = prepareSpectrum(library, 'library');
  return {
    score: scoreSpectrumViews(queryView, libraryView, method, reverse),
    matchedPeaks: matchedPeaks(queryView, libraryView),
    method,
    reverse,
  };
}
