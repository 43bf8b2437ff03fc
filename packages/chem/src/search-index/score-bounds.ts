import type { Accumulators } from './accumulate-postings';
import type { SimilarityMethod } from '../similarity/similarity-method';

/**
 * Relative margin around the approximate scores of the posting pass. Its error comes from Float32
 * weights and per-spectrum sums (relative error ≲ 1e-6 after the sums), so 1e-4 leaves a wide margin
 * while keeping the bounds tight enough that only about k spectra need exact scoring.
 */
export const BOUND_MARGIN = 1e-4;
export const ABSOLUTE_MARGIN = 1e-12;
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
 * (untouched: upper = −1), or of the slots in `only`. For the composite score (N·f1 + n·f2)/(N + n),
 * N query peaks and n shared, the ratio sum must have been accumulated (in forward mode by the second
 * pass; the first pass of a forward weighted or composite search bounds f2 by [0, 1] in
 * {@link forwardWeightedCandidates} instead). The reverse entropy score has no cheap estimate: its bound is
 * sqrt(Σ shared library probability) — since each term (p+q)ln(p+q) − p ln p − q ln q ≤ ln 4·sqrt(p·q)
 * (equality at p = q) and Σ p over the kept query peaks is 1, Cauchy–Schwarz gives it — and its lower
 * bound is 0.
 * @example
 * computeScoreBounds('cosine', false, acc, slotCount, norms, totals, upper, lower);
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
  only?: { slots: Uint32Array; count: number },
): void {
  const n = only === undefined ? slotCount : only.count;
  const list = only?.slots;
  const { count, sum, queryNormSq, ratioSum } = acc;
  const high = 1 + BOUND_MARGIN;
  const low = 1 - BOUND_MARGIN;
  for (let i = 0; i < n; i++) {
    const slot = list === undefined ? i : (list[i] as number);
    const shared = count[slot] as number;
    if (shared === 0) {
      upper[slot] = -1;
      continue;
    }
    const dot = sum[slot] as number;
    let estimate: number;
    if (method === 'cosine') {
      const queryNorm = reverse ? (queryNormSq[slot] as number) : totals.cosineNormSq;
      estimate = dot / Math.sqrt(queryNorm * (norms.cosineNormSq[slot] as number));
    } else if (method === 'weighted' || method === 'composite') {
      const queryNorm = reverse ? (queryNormSq[slot] as number) : totals.weightedNormSq;
      estimate = Math.min(1, (dot * dot) / (queryNorm * (norms.weightedNormSq[slot] as number)));
      if (method === 'composite' && shared >= 2) {
        const queryPeaks = reverse ? shared : totals.peakCount;
        const f2 = (ratioSum[slot] as number) / (shared - 1);
        estimate = (queryPeaks * estimate + shared * f2) / (queryPeaks + shared);
      }
    } else if (!reverse) {
      estimate = dot / LN4;
    } else {
      upper[slot] = Math.sqrt(dot) * high + ABSOLUTE_MARGIN;
      lower[slot] = 0;
      continue;
    }
    upper[slot] = estimate * high + ABSOLUTE_MARGIN;
    lower[slot] = estimate * low - ABSOLUTE_MARGIN;
  }
}
