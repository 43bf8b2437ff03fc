import { clampScore } from './aligned-sums';
import type { PairwiseScoreOptions } from './cosine-similarity';
import { prepareSpectrum, type SpectrumView } from './spectrum-view';
import type { PeakList } from '../types';

const LN4 = Math.log(4);

/**
 * How one spectrum turns into a probability distribution for the entropy score: p_i = I_i^exponent / total.
 * `exponent` is 1 unless the weighted form reweights a low-entropy spectrum (Li et al. 2021).
 */
export interface EntropyWeights {
  exponent: number;
  total: number;
}

/**
 * Li et al. 2021 weights of a prepared spectrum: p = I/ΣI, S = −Σ p ln p (natural log); in the weighted
 * form, if S < 3 the intensities are raised to w = 0.25 + 0.25·S (SCIENCE.md §3, from the authors' code).
 * With `within`, only peaks whose m/z also occurs in that spectrum count (reverse search).
 * @example
 * entropyWeights(prepareSpectrum([[43, 100], [58, 25]]), true).exponent; // 0.25 + 0.25·S
 */
export function entropyWeights(view: SpectrumView, weighted: boolean, within?: SpectrumView): EntropyWeights {
  let total = 0;
  let sumILnI = 0;
  forEachKeptPeak(view, within, (relIntensity) => {
    total += relIntensity;
    sumILnI += relIntensity * Math.log(relIntensity);
  });
  if (total === 0) return { exponent: 1, total: 0 };
  const entropy = Math.log(total) - sumILnI / total;
  if (!weighted || entropy >= 3) return { exponent: 1, total };
  const exponent = 0.25 + 0.25 * entropy;
  let reweightedTotal = 0;
  forEachKeptPeak(view, within, (relIntensity) => {
    reweightedTotal += Math.exp(exponent * Math.log(relIntensity));
  });
  return { exponent, total: reweightedTotal };
}

function forEachKeptPeak(view: SpectrumView, within: SpectrumView | undefined, visit: (relIntensity: number) => void): void {
  let j = within?.start ?? 0;
  for (let i = view.start; i < view.end; i++) {
    if (within !== undefined) {
      const mz = view.mz[i] as number;
      while (j < within.end && (within.mz[j] as number) < mz) j++;
      if (j >= within.end || within.mz[j] !== mz) continue;
    }
    visit(view.relIntensity[i] as number);
  }
}

function probability(relIntensity: number, weights: EntropyWeights): number {
  return (weights.exponent === 1 ? relIntensity : Math.exp(weights.exponent * Math.log(relIntensity))) / weights.total;
}

/**
 * Entropy similarity of two prepared spectra (kernel behind {@link entropySimilarity}).
 *
 * Uses the exact rewrite 1 − (2·S(M) − S(P) − S(Q))/ln 4 = Σ_shared [(p+q)ln(p+q) − p ln p − q ln q] / ln 4,
 * with M = (P+Q)/2: peaks present on one side only contribute exactly ln 2 · p to 2·S(M) − S(P) − S(Q).
 * @example
 * entropyScore(prepareSpectrum(a), prepareSpectrum(b), true, false);
 */
export function entropyScore(query: SpectrumView, library: SpectrumView, weighted: boolean, reverse: boolean): number {
  const queryWeights = entropyWeights(query, weighted, reverse ? library : undefined);
  const libraryWeights = entropyWeights(library, weighted);
  if (queryWeights.total === 0 || libraryWeights.total === 0) return 0;
  let sum = 0;
  let j = library.start;
  for (let i = query.start; i < query.end; i++) {
    const mz = query.mz[i] as number;
    while (j < library.end && (library.mz[j] as number) < mz) j++;
    if (j >= library.end) break;
    if (library.mz[j] !== mz) continue;
    const p = probability(query.relIntensity[i] as number, queryWeights);
    const q = probability(library.relIntensity[j] as number, libraryWeights);
    sum += (p + q) * Math.log(p + q) - p * Math.log(p) - q * Math.log(q);
  }
  return clampScore(sum / LN4);
}

/** Options of {@link entropySimilarity}. */
export interface EntropySimilarityOptions extends PairwiseScoreOptions {
  /** Reweight low-entropy spectra as Li et al. 2021 do (default true); false gives the unweighted form. */
  weighted?: boolean;
}

/**
 * Spectral entropy similarity, Li et al. 2021 (Nature Methods 18, 1524; SCIENCE.md §3):
 * 1 − (2·S((P+Q)/2) − S(P) − S(Q)) / ln 4, with P, Q the spectra as distributions summing to 1 and,
 * in the weighted form, low-entropy spectra (S < 3) reweighted by w = 0.25 + 0.25·S. Symmetric in
 * forward mode. Published for tandem spectra; Ionfolio offers it for EI without making it the default.
 *
 * @param query - the unknown spectrum; not changed.
 * @param library - the library spectrum; not changed.
 * @returns a score in [0, 1].
 * @throws {ChemError} for bad peak lists (fields `query…`, `library…`).
 * @example
 * entropySimilarity([[15, 10], [43, 100], [58, 25]], [[42, 5], [43, 100], [58, 30]]); // 0.82760
 * entropySimilarity([[15, 10], [43, 100], [58, 25]], [[42, 5], [43, 100], [58, 30]], { weighted: false }); // 0.94323
 */
export function entropySimilarity(
  query: PeakList,
  library: PeakList,
  options: EntropySimilarityOptions = {},
): number {
  return entropyScore(
    prepareSpectrum(query, 'query'),
    prepareSpectrum(library, 'library'),
    options.weighted ?? true,
    options.reverse ?? false,
  );
}
