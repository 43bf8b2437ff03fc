import type { Accumulators } from './accumulate-postings';
import { BOUND_MARGIN, ABSOLUTE_MARGIN } from './score-bounds';
import { keepReaching, pushHeap, replaceHeapTop, type CandidateList } from './select-top-hits';

/** What {@link forwardWeightedCandidates} needs besides the posting sums. */
export interface ForwardCandidateInput {
  acc: Accumulators;
  slotCount: number;
  /** Σ W² of each slot (the exact scorer's library norm). */
  weightedNormSq: Float64Array;
  /** Σ W² over the query's peaks, and their number. */
  queryNormSq: number;
  queryPeakCount: number;
  composite: boolean;
  k: number;
  /** Per slot: bit 0 set for a live spectrum, clear for a removed one. */
  flags: Uint8Array;
  /** The search's other filters, when it has any (called only for live slots that could be hits). */
  passes: ((slot: number) => boolean) | undefined;
  upper: Float64Array;
  lower: Float64Array;
  out: Uint32Array;
  heap: Float64Array;
}

/**
 * The first-pass bounds and the candidate gathering of a forward weighted or composite search in one
 * sweep, for the slots that matter only: the same bounds {@link computeScoreBounds} gives (f1 =
 * min(1, dot²/(Q·L)); composite (N·f1 + n·f2)/(N + n) with f2 anywhere in [0, 1]) and the same
 * candidates {@link gatherCandidates} keeps. Whether a slot's upper bound reaches the running floor is
 * decided by multiplications alone; the divisions are done for the slots that pass, so most of the
 * library costs a few loads and compares. Upper and lower bounds are written for the listed slots only.
 * @example
 * const candidates = forwardWeightedCandidates(input);
 */
export function forwardWeightedCandidates(input: ForwardCandidateInput): CandidateList {
  const { acc, slotCount, weightedNormSq, queryNormSq, composite, k, flags, passes, upper, lower, out, heap } = input;
  const { count, sum } = acc;
  const n = input.queryPeakCount;
  const inverseN = 1 / n;
  const high = 1 + BOUND_MARGIN;
  const low = 1 - BOUND_MARGIN;
  // 1 / (N + s) for every shared count s ≤ N, so that a candidate costs one division (f1).
  const inverseDenominator = new Float64Array(n + 1);
  for (let shared = 0; shared <= n; shared++) inverseDenominator[shared] = 1 / (n + shared);
  let heapSize = 0;
  // A slot can be a candidate only if upper ≥ floor, i.e. (N·f1 + s)·high ≥ (floor − ABS)·(N + s) for s
  // shared peaks (composite), f1·high ≥ floor − ABS otherwise. `reach` = (floor − ABS) / high.
  let reach = -Infinity;
  let candidates = 0;
  for (let slot = 0; slot < slotCount; slot++) {
    const shared = count[slot] as number;
    if (shared === 0) continue;
    const dot = sum[slot] as number;
    const dotSq = dot * dot;
    const normProduct = queryNormSq * (weightedNormSq[slot] as number);
    const ratioPart = composite && shared >= 2;
    if (heapSize === k) {
      // Needed: f1 ≥ need, with f1 = min(1, dotSq / normProduct).
      const need = ratioPart ? (reach * (n + shared) - shared) * inverseN : reach;
      if (need > 0 && (need > 1 || dotSq < need * normProduct)) continue;
    }
    if (((flags[slot] as number) & 1) === 0 || (passes !== undefined && !passes(slot))) continue;
    const f1 = Math.min(1, dotSq / normProduct);
    let up: number;
    let down: number;
    if (ratioPart) {
      const inverse = inverseDenominator[shared] as number;
      up = (n * f1 + shared) * inverse * high + ABSOLUTE_MARGIN;
      down = n * f1 * inverse * low - ABSOLUTE_MARGIN;
    } else {
      up = f1 * high + ABSOLUTE_MARGIN;
      down = f1 * low - ABSOLUTE_MARGIN;
    }
    if (heapSize === k && up < (heap[0] as number)) continue; // the multiplications' rounding, at the edge
    upper[slot] = up;
    lower[slot] = down;
    out[candidates++] = slot;
    if (heapSize < k) pushHeap(heap, heapSize++, down);
    else if (down > (heap[0] as number)) replaceHeapTop(heap, k, down);
    else continue;
    if (heapSize === k) reach = ((heap[0] as number) - ABSOLUTE_MARGIN) / high;
  }
  return keepReaching(out, candidates, upper, heapSize === k ? (heap[0] as number) : -Infinity);
}
