/**
 * The hot loops of a search: walk the posting list of one query m/z and add that peak's contribution
 * to every library spectrum listed. Posting lists hold slot numbers in increasing order and the library
 * weight q = I^0.6 (Float32) of the peak, I being the relative intensity.
 *
 * Query peaks are visited in increasing m/z, so each spectrum sees its shared peaks in m/z order,
 * which the composite ratio term needs. Sums are approximate (Float32 weights); the index only uses
 * them to bound scores, and scores the survivors exactly.
 */

/** Packed posting lists: `offsets[mz] … offsets[mz + 1]` index `slots` and `weights`. */
export interface PostingLists {
  offsets: Uint32Array;
  slots: Uint32Array;
  weights: Float32Array;
}

/** Per-slot running sums of one search; `count` is 0 for untouched slots. */
export interface Accumulators {
  count: Uint32Array;
  sum: Float64Array;
  queryNormSq: Float64Array;
  ratioSum: Float64Array;
  lastRatio: Float64Array;
}

const FIVE_THIRDS = 5 / 3;

/**
 * Cosine: sum += u·I with I = q^(5/3); queryNormSq += u² (for reverse mode).
 * @example
 * accumulateCosine(lists, acc, 43, 100);
 */
export function accumulateCosine(lists: PostingLists, acc: Accumulators, mz: number, u: number): void {
  const { slots, weights } = lists;
  const { count, sum, queryNormSq } = acc;
  const uu = u * u;
  const end = lists.offsets[mz + 1] as number;
  for (let p = lists.offsets[mz] as number; p < end; p++) {
    const slot = slots[p] as number;
    const q = weights[p] as number;
    const contribution = u * q * Math.cbrt(q * q);
    if (count[slot] === 0) {
      sum[slot] = contribution;
      queryNormSq[slot] = uu;
    } else {
      sum[slot] = (sum[slot] as number) + contribution;
      queryNormSq[slot] = (queryNormSq[slot] as number) + uu;
    }
    count[slot] = (count[slot] as number) + 1;
  }
}

/**
 * Forward weighted dot product (and composite, whose ratio term the bounds take as 0…1) over the
 * postings `from`…`to` of one query m/z, stopping at the first slot ≥ `slotLimit`:
 * sum += (mz³·W_U)·q_L = W_U·W_L. Nothing else, so the loop is a load, a multiply-add and a count;
 * `sum` must be 0 for untouched slots (the index clears it after each search).
 * @returns the position it stopped at (`to` when the list is done).
 * @example
 * accumulateDot(lists, acc, lists.offsets[43], lists.offsets[44], 4096, 43 ** 3 * 43 ** 3 * 15.8);
 */
export function accumulateDot(lists: PostingLists, acc: Accumulators, from: number, to: number, slotLimit: number, factor: number): number {
  const { slots, weights } = lists;
  const { count, sum } = acc;
  for (let p = from; p < to; p++) {
    const slot = slots[p] as number;
    if (slot >= slotLimit) return p;
    sum[slot] = (sum[slot] as number) + factor * (weights[p] as number);
    count[slot] = (count[slot] as number) + 1;
  }
  return to;
}

/**
 * The composite ratio term alone, for a second pass after {@link accumulateDot}, over the postings
 * `from`…`to` of one query m/z up to the first slot ≥ `slotLimit`: with r = q_L / q_U,
 * ratioSum += min(r / r_prev, r_prev / r) from the second shared peak on. `ratioSum` and `lastRatio`
 * must be 0 for every slot on entry (r_prev = 0 then adds 0/r = 0). Only slots marked in `only` are
 * accumulated (the others' bounds already rule them out).
 * @returns the position it stopped at (`to` when the list is done).
 * @example
 * accumulateRatio(lists, acc, from, to, 4096, 15.8, candidates);
 */
export function accumulateRatio(
  lists: PostingLists,
  acc: Accumulators,
  from: number,
  to: number,
  slotLimit: number,
  queryQ: number,
  only: Uint8Array,
): number {
  const { slots, weights } = lists;
  const { ratioSum, lastRatio } = acc;
  const inverseQueryQ = 1 / queryQ;
  for (let p = from; p < to; p++) {
    const slot = slots[p] as number;
    if (slot >= slotLimit) return p;
    if (only[slot] === 0) continue;
    const ratio = (weights[p] as number) * inverseQueryQ;
    const previous = lastRatio[slot] as number;
    // min(r, r′) / max(r, r′) without a branch (which half of the time would be mispredicted):
    // with s = r + r′ and d = |r − r′|, min = (s − d)/2 and max = (s + d)/2.
    const both = ratio + previous;
    const apart = Math.abs(ratio - previous);
    ratioSum[slot] = (ratioSum[slot] as number) + (both - apart) / (both + apart);
    lastRatio[slot] = ratio;
  }
  return to;
}

/**
 * Reverse weighted dot product and composite ratio term. With W = mz³·q on both sides,
 * sum += (mz⁶·q_U)·q_L = W_U·W_L; ratio r = q_L / q_U (mz³ cancels); queryNormSq += W_U².
 * @example
 * accumulateWeighted(lists, acc, 43, 43 ** 3 * 15.8);
 */
export function accumulateWeighted(lists: PostingLists, acc: Accumulators, mz: number, queryWeightW: number, queryQ: number): void {
  const { slots, weights } = lists;
  const { count, sum, queryNormSq, ratioSum, lastRatio } = acc;
  const factor = queryWeightW * mz * mz * mz;
  const wSq = queryWeightW * queryWeightW;
  const inverseQueryQ = 1 / queryQ;
  const end = lists.offsets[mz + 1] as number;
  for (let p = lists.offsets[mz] as number; p < end; p++) {
    const slot = slots[p] as number;
    const q = weights[p] as number;
    const ratio = q * inverseQueryQ;
    if (count[slot] === 0) {
      sum[slot] = factor * q;
      queryNormSq[slot] = wSq;
      ratioSum[slot] = 0;
    } else {
      sum[slot] = (sum[slot] as number) + factor * q;
      queryNormSq[slot] = (queryNormSq[slot] as number) + wSq;
      const term = ratio / (lastRatio[slot] as number);
      ratioSum[slot] = (ratioSum[slot] as number) + (term > 1 ? 1 / term : term);
    }
    lastRatio[slot] = ratio;
    count[slot] = (count[slot] as number) + 1;
  }
}

/** Per-slot entropy weights: p = exp(exponent·ln q − lnTotal); `exponents` undefined means 5/3 for all. */
export interface EntropySlotWeights {
  exponents: Float32Array | undefined;
  lnTotals: Float32Array;
}

/**
 * Entropy similarity terms: sum += (p+P)ln(p+P) − p ln p − P ln P for the query probability P,
 * or, with `massOnly`, sum += p (the shared library probability mass, bounding reverse mode).
 * @example
 * accumulateEntropy(lists, acc, 43, 0.7, weights, false);
 */
export function accumulateEntropy(
  lists: PostingLists,
  acc: Accumulators,
  mz: number,
  queryP: number,
  slotWeights: EntropySlotWeights,
  massOnly: boolean,
): void {
  const { slots, weights } = lists;
  const { count, sum } = acc;
  const { exponents, lnTotals } = slotWeights;
  const queryPLnP = queryP * Math.log(queryP);
  const end = lists.offsets[mz + 1] as number;
  for (let p = lists.offsets[mz] as number; p < end; p++) {
    const slot = slots[p] as number;
    const exponent = exponents === undefined ? FIVE_THIRDS : (exponents[slot] as number);
    const lnP = exponent * Math.log(weights[p] as number) - (lnTotals[slot] as number);
    const libraryP = Math.exp(lnP);
    let contribution = libraryP;
    if (!massOnly) {
      const both = libraryP + queryP;
      contribution = both * Math.log(both) - libraryP * lnP - queryPLnP;
    }
    if (count[slot] === 0) sum[slot] = contribution;
    else sum[slot] = (sum[slot] as number) + contribution;
    count[slot] = (count[slot] as number) + 1;
  }
}
