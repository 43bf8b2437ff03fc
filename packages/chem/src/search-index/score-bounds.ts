import type { Accumulators } from './accumulate-postings';
import type { SimilarityMethod } from '../similarity/similarity-method';

/**
 * Relative margin around the approximate scores of the posting pass. Its error comes from Float32
 * weights and per-spectrum sums (relative error ≲ 1e-6 after the sums), so 1e-4 leaves a wide margin
 * while keeping the bounds tight enough that only about k spectra need exact scoring.
 */
export const BOUND_MARGIN = 1e-4;
const ABSOLUTE_MARGIN = 1e-12;
const LN4 = Math.log(4);

/** Query-wide numbers the bounds need. */
export interface QueryTotals {
  peakCount: number;
  /** Σ u² over all query peaks (cosine, forward). */
  cosineNormSq: number;
  /** Σ W_U² over all query peaks (weighted and composite, forward). */
  weightedNormSq: number;
}

/** Per-slot library sums stored by the index (Float32). */
export interface SlotNorms {
  cosineNormSq: Float32Array;
  weightedNormSq: Float64Array;
}

/**
 * Turns the posting sums into an upper and a lower bound of every touched slot's exact score
 * (untouched: upper = −1). The forward composite score (N·f1 + n·f2)/(N + n), N query peaks and n
 * shared, gets f2 ∈ [0, 1] as its interval: the posting pass then needs no division per posting, and
 * usually only a few hundred spectra whose upper bound reaches the k-th best score are scored exactly;
 * with `forwardRatioKnown` (a second pass accumulated f2 too) the bounds are tight. The reverse entropy score has no cheap estimate: its bound is
 * sqrt(Σ shared library probability) — since each term (p+q)ln(p+q) − p ln p − q ln q ≤ ln 4·sqrt(p·q)
 * (equality at p = q) and Σ p over the kept query peaks is 1, Cauchy–Schwarz gives it — and its lower
 * bound is 0.
 * @example
 * computeScoreBounds('composite', false, acc, slotCount, norms, totals, upper, lower);
 */
export function computeScoreBounds(
  method: SimilarityMethod,
  reverse: boolean,
  acc: Accumulators,
  slotCount: number,
  norms: SlotNorms,
  totals: QueryTotals,
  upper: Float64Array,
  lower: Float64Array,
  forwardRatioKnown = false,
): void {
  const { count, sum, queryNormSq, ratioSum } = acc;
  for (let slot = 0; slot < slotCount; slot++) {
    const shared = count[slot] as number;
    if (shared === 0) {
      upper[slot] = -1;
      continue;
    }
    let estimate: number;
    const dot = sum[slot] as number;
    if (method === 'cosine') {
      const queryNorm = reverse ? (queryNormSq[slot] as number) : totals.cosineNormSq;
      estimate = dot / Math.sqrt(queryNorm * (norms.cosineNormSq[slot] as number));
    } else if (method === 'weighted' || method === 'composite') {
      const queryNorm = reverse ? (queryNormSq[slot] as number) : totals.weightedNormSq;
      estimate = Math.min(1, (dot * dot) / (queryNorm * (norms.weightedNormSq[slot] as number)));
      if (method === 'composite' && shared >= 2) {
        const queryPeaks = reverse ? shared : totals.peakCount;
        if (!reverse && !forwardRatioKnown) {
          // Forward, first pass: the ratio term f2 is not accumulated; it lies in [0, 1], which bounds the score.
          const denominator = queryPeaks + shared;
          upper[slot] = ((queryPeaks * estimate + shared) / denominator) * (1 + BOUND_MARGIN) + ABSOLUTE_MARGIN;
          lower[slot] = ((queryPeaks * estimate) / denominator) * (1 - BOUND_MARGIN) - ABSOLUTE_MARGIN;
          continue;
        }
        const f2 = (ratioSum[slot] as number) / (shared - 1);
        estimate = (queryPeaks * estimate + shared * f2) / (queryPeaks + shared);
      }
    } else if (!reverse) {
      estimate = dot / LN4;
    } else {
      upper[slot] = Math.sqrt(dot) * (1 + BOUND_MARGIN) + ABSOLUTE_MARGIN;
      lower[slot] = 0;
      continue;
    }
    upper[slot] = estimate * (1 + BOUND_MARGIN) + ABSOLUTE_MARGIN;
    lower[slot] = estimate * (1 - BOUND_MARGIN) - ABSOLUTE_MARGIN;
  }
}
