import { ChemError } from '../errors/chem-error';

/**
 * The similarity scores Ionfolio offers (SCIENCE.md §3): `composite` (Stein & Scott 1994, the default),
 * `cosine`, `weighted` (Stein–Scott weighted dot product), `entropy` (Li et al. 2021 with their
 * low-entropy reweighting) and `entropy-unweighted`.
 */
export type SimilarityMethod = 'composite' | 'cosine' | 'weighted' | 'entropy' | 'entropy-unweighted';

/** Every {@link SimilarityMethod}, in the order the apps list them. */
export const SIMILARITY_METHODS: readonly SimilarityMethod[] = [
  'composite',
  'cosine',
  'weighted',
  'entropy',
  'entropy-unweighted',
];

/** One m/z present in both spectra, with each side's intensity relative to its own base peak (0–100]. */
export interface MatchedPeak {
  mz: number;
  queryRelIntensity: number;
  libraryRelIntensity: number;
}

/** The outcome of {@link compareSpectra}: a score in [0, 1] (the apps show it ×100) and its evidence. */
export interface SimilarityResult {
  score: number;
  matchedPeaks: MatchedPeak[];
  method: SimilarityMethod;
  reverse: boolean;
}

/**
 * Narrows an unknown value to a {@link SimilarityMethod}.
 *
 * @throws {ChemError} `INVALID_ARGUMENT` (field `method`) for anything else.
 * @example
 * assertSimilarityMethod('cosine'); // 'cosine'
 */
export function assertSimilarityMethod(method: unknown): SimilarityMethod {
  if (!SIMILARITY_METHODS.includes(method as SimilarityMethod)) {
    throw new ChemError('INVALID_ARGUMENT', `method must be one of ${SIMILARITY_METHODS.join(', ')}`, {
      field: 'method',
    });
  }
  return method as SimilarityMethod;
}
