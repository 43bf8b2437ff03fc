/** One exactly scored hit, by internal slot. */
export interface SlotHit {
  slot: number;
  id: number;
  score: number;
}

/** What {@link selectTopHits} needs to know about the touched slots of one search. */
export interface TopHitInput {
  slotCount: number;
  /** Upper bound of each slot's score; negative for slots that share no peak with the query. */
  upper: Float64Array;
  /** Lower bound of each slot's score (≤ the exact score). */
  lower: Float64Array;
  /** Scratch of at least slotCount bytes, all 0 on entry; left dirty. */
  checked: Uint8Array;
  k: number;
  idOf: (slot: number) => number;
  passes: (slot: number) => boolean;
  exactScore: (slot: number) => number;
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

function pushHeap(heap: Float64Array, size: number, value: number): void {
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

function replaceHeapTop(heap: Float64Array, size: number, value: number): void {
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
 * The exact top-k of one search from score bounds: the k-th largest lower bound T among spectra that
 * pass the filters is a floor for the k-th best exact score, so only spectra whose upper bound reaches T
 * can be in the top k (ties included). Those are scored exactly, best bounds first, stopping once the
 * k-th best exact score beats every bound left. Ranked by score descending, then id ascending; spectra
 * scoring 0 are never hits.
 * @example
 * selectTopHits(input); // [{ slot, id, score }, ...]
 */
export function selectTopHits(input: TopHitInput): SlotHit[] | undefined {
  const { slotCount, upper, lower, checked, k, passes } = input;
  const heap = new Float64Array(k);
  let heapSize = 0;
  for (let slot = 0; slot < slotCount; slot++) {
    if ((upper[slot] as number) < 0) continue;
    const low = lower[slot] as number;
    if (heapSize === k && low <= (heap[0] as number)) continue;
    checked[slot] = 1;
    if (!passes(slot)) {
      upper[slot] = -1;
      continue;
    }
    if (heapSize < k) pushHeap(heap, heapSize++, low);
    else replaceHeapTop(heap, k, low);
  }
  const floor = heapSize === k ? (heap[0] as number) : -Infinity;

  const candidates: number[] = [];
  const bucketSizes = new Uint32Array(BUCKETS + 1);
  for (let slot = 0; slot < slotCount; slot++) {
    const up = upper[slot] as number;
    if (up < 0 || up < floor) continue;
    if (checked[slot] === 0 && !passes(slot)) continue;
    candidates.push(slot);
    const bucket = bucketOf(up);
    bucketSizes[bucket] = (bucketSizes[bucket] as number) + 1;
  }
  // Counting sort by bucket, best bucket first.
  const bucketStart = new Uint32Array(BUCKETS + 2);
  for (let b = BUCKETS; b >= 0; b--) bucketStart[b] = (bucketStart[b + 1] as number) + (bucketSizes[b + 1] ?? 0);
  const ordered = new Uint32Array(candidates.length);
  const cursor = bucketStart.slice();
  for (const slot of candidates) {
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
