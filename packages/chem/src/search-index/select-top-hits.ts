/** One exactly scored hit, by internal slot. */
export interface SlotHit {
  slot: number;
  id: number;
  score: number;
}

/** Slots that can still be in the top k, gathered by {@link gatherCandidates}. */
export interface CandidateList {
  /** Scratch of at least slotCount elements; the first `count` are the candidates, in slot order. */
  slots: Uint32Array;
  count: number;
  /** A score the k-th best hit is known to reach (−Infinity when fewer than k spectra are in play). */
  floor: number;
}

/** What {@link selectTopHits} needs to know about the candidates of one search. */
export interface TopHitInput {
  candidates: CandidateList;
  /** Upper bound of each slot's score, by slot. */
  upper: Float64Array;
  k: number;
  idOf: (slot: number) => number;
  exactScore: (slot: number) => number;
  /** Scratch for the candidates in bound order, reused when it is long enough. */
  ordered?: Uint32Array;
  /**
   * Most exact scores to spend; past it the selection gives up, returns undefined and leaves in
   * `floor` a score the k-th best hit is known to reach (−Infinity when fewer than k were scored).
   */
  budget?: { limit: number; floor: number };
}

const BUCKETS = 1024;

function better(a: SlotHit, b: SlotHit): boolean {
  return a.score > b.score || (a.score === b.score && a.id < b.id);
}

/** Min-heap of bounds: pushes `value` onto a heap of `size` elements. */
export function pushHeap(heap: Float64Array, size: number, value: number): void {
  let i = size;
  heap[i] = value;
  while (i > 0) {
    const parent = (i - 1) >> 1;
    if ((heap[parent] as number) <= value) break;
    heap[i] = heap[parent] as number;
    heap[parent] = value;
    i = parent;
  }
}

/** Min-heap of bounds: replaces the smallest element with `value`. */
export function replaceHeapTop(heap: Float64Array, size: number, value: number): void {
  let i = 0;
  heap[0] = value;
  for (;;) {
    const left = 2 * i + 1;
    if (left >= size) break;
    const right = left + 1;
    const child = right < size && (heap[right] as number) < (heap[left] as number) ? right : left;
    if ((heap[child] as number) >= value) break;
    heap[i] = heap[child] as number;
    heap[child] = value;
    i = child;
  }
}

/**
 * One sweep over the slots' score bounds: the k-th largest lower bound T among slots that pass the
 * filters is a floor for the k-th best exact score, so only passing slots whose upper bound reaches T
 * can be in the top k (ties included). Slots with a negative upper bound share no peak with the query.
 * A slot that fails the filters gets upper = −1. `heap` is scratch of at least k elements.
 * @example
 * const candidates = gatherCandidates(slotCount, upper, lower, 10, passes, scratch, heap);
 */
export function gatherCandidates(
  slotCount: number,
  upper: Float64Array,
  lower: Float64Array,
  k: number,
  passes: (slot: number) => boolean,
  out: Uint32Array,
  heap: Float64Array,
): CandidateList {
  let heapSize = 0;
  let count = 0;
  for (let slot = 0; slot < slotCount; slot++) {
    const up = upper[slot] as number;
    if (up < 0) continue;
    // The floor only rises, so a bound below it now stays below it.
    if (heapSize === k && up < (heap[0] as number)) continue;
    if (!passes(slot)) {
      upper[slot] = -1;
      continue;
    }
    const low = lower[slot] as number;
    if (heapSize < k) pushHeap(heap, heapSize++, low);
    else if (low > (heap[0] as number)) replaceHeapTop(heap, k, low);
    out[count++] = slot;
  }
  return keepReaching(out, count, upper, heapSize === k ? (heap[0] as number) : -Infinity);
}

/**
 * Keeps, in place and in order, the first `count` listed slots whose upper bound reaches `floor`.
 * @example
 * keepReaching(slots, 500, upper, 0.62); // { slots, count: 37, floor: 0.62 }
 */
export function keepReaching(slots: Uint32Array, count: number, upper: Float64Array, floor: number): CandidateList {
  let kept = 0;
  for (let i = 0; i < count; i++) {
    const slot = slots[i] as number;
    if ((upper[slot] as number) >= floor) slots[kept++] = slot;
  }
  return { slots, count: kept, floor };
}

/**
 * Narrows a candidate list after its bounds were tightened: the floor becomes the larger of
 * `knownFloor` (a score the k-th best is known to reach) and the k-th largest lower bound among the
 * listed slots, which all pass the filters; slots whose upper bound falls below it are dropped.
 * @example
 * const narrowed = narrowCandidates(list, count, upper, lower, 10, heap, floor);
 */
export function narrowCandidates(
  slots: Uint32Array,
  count: number,
  upper: Float64Array,
  lower: Float64Array,
  k: number,
  heap: Float64Array,
  knownFloor: number,
): CandidateList {
  let heapSize = 0;
  for (let i = 0; i < count; i++) {
    const low = lower[slots[i] as number] as number;
    if (heapSize < k) pushHeap(heap, heapSize++, low);
    else if (low > (heap[0] as number)) replaceHeapTop(heap, k, low);
  }
  return keepReaching(slots, count, upper, Math.max(knownFloor, heapSize === k ? (heap[0] as number) : -Infinity));
}

/**
 * The exact top-k among the candidates: scored exactly, best upper bounds first, stopping once the
 * k-th best exact score beats every bound left. Ranked by score descending, then id ascending; spectra
 * scoring 0 are never hits.
 * @example
 * selectTopHits({ candidates, upper, k: 10, idOf, exactScore }); // [{ slot, id, score }, ...]
 */
export function selectTopHits(input: TopHitInput): SlotHit[] | undefined {
  const { candidates, upper, k } = input;
  const { slots, count, floor } = candidates;
  const bucketSizes = new Uint32Array(BUCKETS + 1);
  for (let i = 0; i < count; i++) {
    const bucket = bucketOf(upper[slots[i] as number] as number);
    bucketSizes[bucket] = (bucketSizes[bucket] as number) + 1;
  }
  // Counting sort by bucket, best bucket first.
  const bucketStart = new Uint32Array(BUCKETS + 2);
  for (let b = BUCKETS; b >= 0; b--) bucketStart[b] = (bucketStart[b + 1] as number) + (bucketSizes[b + 1] ?? 0);
  const ordered = input.ordered !== undefined && input.ordered.length >= count ? input.ordered : new Uint32Array(count);
  const cursor = bucketStart.slice();
  for (let i = 0; i < count; i++) {
    const slot = slots[i] as number;
    const bucket = bucketOf(upper[slot] as number);
    const at = cursor[bucket] as number;
    ordered[at] = slot;
    cursor[bucket] = at + 1;
  }

  const hits: SlotHit[] = [];
  let position = 0;
  let spent = 0;
  const budget = input.budget?.limit ?? Infinity;
  for (let b = BUCKETS; b >= 0; b--) {
    const end = position + (bucketSizes[b] as number);
    if (hits.length === k && (hits[k - 1] as SlotHit).score > (b + 1) / BUCKETS && b < BUCKETS) break;
    for (; position < end; position++) {
      const slot = ordered[position] as number;
      const worst = hits.length === k ? (hits[k - 1] as SlotHit) : undefined;
      if (worst !== undefined && (upper[slot] as number) < worst.score) continue;
      if (++spent > budget) {
        const kth = hits.length === k ? (hits[k - 1] as SlotHit).score : -Infinity;
        input.budget!.floor = Math.max(floor, kth);
        return undefined;
      }
      const score = input.exactScore(slot);
      if (!(score > 0)) continue;
      const hit = { slot, id: input.idOf(slot), score };
      if (worst !== undefined && !better(hit, worst)) continue;
      let i = hits.length === k ? k - 1 : hits.length;
      while (i > 0 && better(hit, hits[i - 1] as SlotHit)) {
        hits[i] = hits[i - 1] as SlotHit;
        i--;
      }
      hits[i] = hit;
    }
  }
  return hits;
}

function bucketOf(upperBound: number): number {
  return upperBound >= 1 ? BUCKETS : Math.floor(upperBound * BUCKETS);
}
