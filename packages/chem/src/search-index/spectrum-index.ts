import {
  accumulateCosine,
  accumulateDot,
  accumulateEntropy,
  accumulateRatio,
  accumulateWeighted,
  type Accumulators,
  type EntropySlotWeights,
  type PostingLists,
} from './accumulate-postings';
import { allocateLike, growTypedArray, type PackedArray } from './grow-typed-array';
import { forwardWeightedCandidates } from './forward-candidates';
import { computeScoreBounds, type QueryTotals } from './score-bounds';
import {
  passesMetaFilters,
  checkHitCount,
  resolveSearchOptions,
  type ResolvedSearch,
  type SpectrumHit,
  type SpectrumIndexOptions,
  type SpectrumMeta,
  type SpectrumSearchOptions,
} from './search-options';
import { gatherCandidates, narrowCandidates, selectTopHits, type CandidateList, type SlotHit } from './select-top-hits';
import { ChemError } from '../errors/chem-error';
import { matchedPeaks } from '../similarity/compare-spectra';
import { entropyWeights } from '../similarity/entropy-similarity';
import { scoreSpectrumViews } from '../similarity/score-spectrum-views';
import { assertSimilarityMethod, type MatchedPeak, type SimilarityMethod } from '../similarity/similarity-method';
import { prepareSpectrum, type SpectrumView } from '../similarity/spectrum-view';
import { peakWeight, sharedSums } from '../similarity/aligned-sums';
import { compositeFromSums } from '../similarity/composite-similarity';
import { STEIN_SCOTT_INTENSITY_POWER, STEIN_SCOTT_MZ_POWER, weightedFromSums } from '../similarity/weighted-dot-product';
import { MAX_MZ } from '../spectrum/validate-peaks';
import { MAX_GROUP } from './search-options';
import type { PeakList } from '../types';

const OFFSET_COUNT = MAX_MZ + 2;
// Bit 0 of a slot's flags; the group sits in bits 1–7.
const LIVE = 1;
// Exact scores (a few µs each) a forward composite search spends on its first, loose bounds before it
// pays for the second posting pass that tightens them (about as long as a few thousand exact scores).
const EXACT_SCORE_BUDGET = 3000;
// Slots per block of the posting walk: the sums of 4,096 slots (48 kB) stay in the core's cache.
const SLOT_BLOCK = 4096;
// ln I of the peaks of the spectrum being added (a nominal spectrum has at most MAX_MZ peaks).
const LN_SCRATCH = new Float64Array(MAX_MZ + 1);

/** Per-spectrum columns, one element per slot. NaN in nominalMass / retentionIndex = not given. */
export interface SlotColumns {
  ids: Uint32Array;
  start: Uint32Array;
  length: Uint16Array;
  /** Bit 0: the spectrum is live (not removed). Bits 1–7: its group (0 = none), see SpectrumMeta.group. */
  flags: Uint8Array;
  nominalMass: Float32Array;
  retentionIndex: Float32Array;
  elementsMask: Uint32Array;
  cosineNormSq: Float32Array;
  /** Σ W² over the spectrum's peaks in m/z order, in Float64: exactly the library norm of the exact scorer. */
  weightedNormSq: Float64Array;
  entropyExponent: Float32Array;
  entropyLnTotal: Float32Array;
  plainLnTotal: Float32Array;
}

function emptySlotColumns(): SlotColumns {
  return {
    ids: new Uint32Array(0),
    start: new Uint32Array(0),
    length: new Uint16Array(0),
    flags: new Uint8Array(0),
    nominalMass: new Float32Array(0),
    retentionIndex: new Float32Array(0),
    elementsMask: new Uint32Array(0),
    cosineNormSq: new Float32Array(0),
    weightedNormSq: new Float64Array(0),
    entropyExponent: new Float32Array(0),
    entropyLnTotal: new Float32Array(0),
    plainLnTotal: new Float32Array(0),
  };
}

function mapSlotColumns(columns: SlotColumns, transform: <T extends PackedArray>(column: T) => T): SlotColumns {
  const out = { ...columns };
  for (const key of Object.keys(out) as (keyof SlotColumns)[]) {
    (out as Record<keyof SlotColumns, PackedArray>)[key] = transform(columns[key]);
  }
  return out;
}

function emptyLists(): PostingLists {
  return { offsets: new Uint32Array(OFFSET_COUNT), slots: new Uint32Array(0), weights: new Float32Array(0) };
}

function postingWeight(relIntensity: number): number {
  return Math.exp(STEIN_SCOTT_INTENSITY_POWER * Math.log(relIntensity));
}

function optionalMeta(value: number | undefined, field: string): number {
  if (value === undefined) return NaN;
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new ChemError('INVALID_ARGUMENT', `${field} must be a finite number`, { field });
  }
  return value;
}

/**
 * Everything a search reads, as {@link SpectrumIndex.snapshot} hands it out: with `sharedMemory`, the
 * arrays live in SharedArrayBuffers, so posting this to a worker thread shares them instead of copying.
 */
export interface SpectrumIndexSnapshot {
  method: SimilarityMethod;
  k: number;
  slotCount: number;
  liveCount: number;
  peakCount: number;
  mainSlotEnd: number;
  slot: SlotColumns;
  peakMz: Uint16Array;
  peakRelIntensity: Float32Array;
  main: PostingLists;
  delta: PostingLists;
}

function readOnlyError(): ChemError {
  return new ChemError('INVALID_ARGUMENT', 'this index was made from a snapshot and is read-only; change the index it came from', {
    field: 'index',
  });
}

/** Memory held by a {@link SpectrumIndex}, in bytes. */
export interface SpectrumIndexMemory {
  /** Packed typed arrays that make up the index (posting lists, peaks, per-spectrum values). */
  indexBytes: number;
  /** Reusable per-search scratch (accumulators, bounds), sized by the number of spectra. */
  scratchBytes: number;
  /** Peaks stored (after normalisation). */
  peakCount: number;
}

/**
 * An exact search index over many library spectra, in packed typed arrays.
 *
 * Layout: every spectrum is normalised once ({@link prepareSpectrum}: nominal m/z, duplicates summed,
 * base peak 100, Float32 intensities) and stored as Uint16 m/z + Float32 relative intensity. An inverted
 * index by nominal m/z holds, per peak, the spectrum's slot (Uint32) and q = I^0.6 (Float32); per
 * spectrum a few Float32 sums (norms, entropy weights) and the filter values. About 14–15 bytes per peak.
 *
 * Search: the query's posting lists are walked in m/z order, accumulating per spectrum the dot product
 * and shared-peak count (reverse searches also the query norm and composite ratio term; entropy its
 * terms). From these, each touched spectrum gets an upper and a lower bound of its score — for a
 * forward composite search with the ratio term anywhere in [0, 1], tightened by a second posting pass
 * when that leaves too many spectra — and only spectra whose upper bound reaches the k-th best score are
 * scored exactly, with the sums {@link compareSpectra} computes, in the same order. Results are
 * therefore identical to scoring every spectrum one by one: same ids, same scores, ties broken by
 * ascending id; spectra that share no m/z with the query (score 0) are never returned.
 *
 * Incremental: `add` appends to a small delta tier and `remove` marks a spectrum dead; the index repacks
 * itself at the next search when either grows past 1/8 of the library (or call {@link SpectrumIndex.pack}).
 *
 * @example
 * const index = new SpectrumIndex();
 * index.add(1, [[43, 100], [58, 25]], { nominalMass: 58 });
 * index.search([[43, 90], [58, 30]], { k: 5 }); // [{ id: 1, score: 0.99…, matchedPeakCount: 2 }]
 */
export class SpectrumIndex {
  private defaultMethod: SimilarityMethod;
  private defaultK: number;
  private readonly shared: boolean;
  private readOnly = false;
  private slotCount = 0;
  private liveCount = 0;
  private deadCount = 0;
  private peakCount = 0;
  private slot: SlotColumns = emptySlotColumns();
  private peakMz: Uint16Array = new Uint16Array(0);
  private peakRelIntensity: Float32Array = new Float32Array(0);
  // q = I^0.6 of each peak, kept only until the first pack so that a bulk load computes it once.
  private loadingQ: Float32Array | undefined = new Float32Array(0);
  private readonly slotById = new Map<number, number>();
  private main: PostingLists = emptyLists();
  private delta: PostingLists = emptyLists();
  private mainSlotEnd = 0;
  private deltaDirty = false;
  private scratch:
    | (Accumulators & { upper: Float64Array; lower: Float64Array; checked: Uint8Array; candidates: Uint32Array; ordered: Uint32Array })
    | undefined;

  /**
   * @param options - `method` (default `composite`) and `k` (default 10) used when a search omits them.
   * @throws {ChemError} `INVALID_ARGUMENT` for an unknown method or a k that is not a positive integer.
   */
  constructor(options: SpectrumIndexOptions = {}) {
    this.defaultMethod = assertSimilarityMethod(options.method ?? 'composite');
    this.defaultK = checkHitCount(options.k ?? 10);
    this.shared = options.sharedMemory === true;
    if (options.reserve !== undefined) {
      const { spectra, peaks } = options.reserve;
      if (!Number.isInteger(spectra) || spectra < 0 || !Number.isInteger(peaks) || peaks < 0) {
        throw new ChemError('INVALID_ARGUMENT', 'reserve.spectra and reserve.peaks must be integers ≥ 0', { field: 'reserve' });
      }
      this.ensureSlotCapacity(spectra);
      this.ensurePeakCapacity(peaks);
    }
  }

  /** Number of spectra in the index. */
  get size(): number {
    return this.liveCount;
  }

  /** Whether a spectrum with this id is in the index. */
  has(id: number): boolean {
    return this.slotOf(id) !== undefined;
  }

  /**
   * What a search reads, for a read-only copy on another thread ({@link SpectrumIndex.fromSnapshot}).
   * Pending changes are folded in first. With `sharedMemory` the large arrays are shared, not copied,
   * and later changes of this index never rewrite what a snapshot covers, except that a removed
   * spectrum is marked dead at once in every snapshot that holds it.
   * @throws {ChemError} `INVALID_ARGUMENT` on an index that is itself a snapshot's copy.
   */
  snapshot(): SpectrumIndexSnapshot {
    if (this.readOnly) throw readOnlyError();
    this.refresh();
    return {
      method: this.defaultMethod,
      k: this.defaultK,
      slotCount: this.slotCount,
      liveCount: this.liveCount,
      peakCount: this.peakCount,
      mainSlotEnd: this.mainSlotEnd,
      slot: this.slot,
      peakMz: this.peakMz,
      peakRelIntensity: this.peakRelIntensity,
      main: this.main,
      delta: this.delta,
    };
  }

  /**
   * A read-only index over a snapshot (searches give exactly what the original's would at the time of
   * the snapshot); `add`, `remove` and `pack` throw. Keep it and call {@link SpectrumIndex.adopt} with
   * each newer snapshot, so that its search scratch is reused.
   * @example
   * const reader = SpectrumIndex.fromSnapshot(writer.snapshot());
   */
  static fromSnapshot(snapshot: SpectrumIndexSnapshot): SpectrumIndex {
    const reader = new SpectrumIndex({ method: snapshot.method, k: snapshot.k });
    reader.readOnly = true;
    reader.adopt(snapshot);
    return reader;
  }

  /**
   * Replaces a read-only index's contents with a newer snapshot.
   * @throws {ChemError} `INVALID_ARGUMENT` on an index not made by {@link SpectrumIndex.fromSnapshot}.
   */
  adopt(snapshot: SpectrumIndexSnapshot): void {
    if (!this.readOnly) {
      throw new ChemError('INVALID_ARGUMENT', 'only an index made by SpectrumIndex.fromSnapshot can adopt a snapshot', { field: 'index' });
    }
    this.defaultMethod = snapshot.method;
    this.defaultK = snapshot.k;
    this.slotCount = snapshot.slotCount;
    this.liveCount = snapshot.liveCount;
    this.peakCount = snapshot.peakCount;
    this.mainSlotEnd = snapshot.mainSlotEnd;
    this.slot = snapshot.slot;
    this.peakMz = snapshot.peakMz;
    this.peakRelIntensity = snapshot.peakRelIntensity;
    this.main = snapshot.main;
    this.delta = snapshot.delta;
    this.loadingQ = undefined;
    this.deltaDirty = false;
    this.slotById.clear();
  }

  /**
   * Adds one spectrum.
   *
   * @param id - caller's id, an integer 0 … 2^32 − 1, unique in the index.
   * @param peaks - the spectrum, any order and scale; normalised as {@link compareSpectra} does; not changed.
   * @param meta - nominal mass (Da), retention index, element mask, used by search filters.
   * @throws {ChemError} `INVALID_ARGUMENT` (field `id` or `meta.*`) for a bad or duplicate id or meta;
   *   `INVALID_PEAKS` / `EMPTY_SPECTRUM` (fields `peaks…`) for a bad peak list.
   */
  add(id: number, peaks: PeakList, meta: SpectrumMeta = {}): void {
    if (this.readOnly) throw readOnlyError();
    if (!Number.isInteger(id) || id < 0 || id > 0xffffffff) {
      throw new ChemError('INVALID_ARGUMENT', 'id must be an integer from 0 to 4294967295', { field: 'id' });
    }
    if (this.slotById.has(id)) {
      throw new ChemError('INVALID_ARGUMENT', `id ${id} is already in the index; remove it first`, { field: 'id' });
    }
    const nominalMass = optionalMeta(meta.nominalMass, 'meta.nominalMass');
    const retentionIndex = optionalMeta(meta.retentionIndex, 'meta.retentionIndex');
    const elementsMask = optionalMeta(meta.elementsMask, 'meta.elementsMask');
    const group = meta.group ?? 0;
    if (!Number.isInteger(group) || group < 0 || group > MAX_GROUP) {
      throw new ChemError('INVALID_ARGUMENT', `meta.group must be an integer from 0 to ${MAX_GROUP}`, { field: 'meta.group' });
    }
    const view = prepareSpectrum(peaks, 'peaks');
    const length = view.end - view.start;
    const slot = this.slotCount;
    this.ensureSlotCapacity(slot + 1);
    this.ensurePeakCapacity(this.peakCount + length);
    this.slot.ids[slot] = id;
    this.slot.start[slot] = this.peakCount;
    this.slot.length[slot] = length;
    this.slot.flags[slot] = LIVE | (group << 1);
    this.slot.nominalMass[slot] = nominalMass;
    this.slot.retentionIndex[slot] = retentionIndex;
    this.slot.elementsMask[slot] = Number.isNaN(elementsMask) ? 0 : elementsMask >>> 0;
    // One pass for every per-spectrum sum (approximate values for bounds; the exact scores come from
    // the kernels). Entropy weights as entropyWeights computes them, from ln I kept in a scratch array.
    const base = this.peakCount;
    const lnScratch = LN_SCRATCH;
    let cosineNormSq = 0;
    let weightedNormSq = 0;
    let total = 0;
    let sumILnI = 0;
    for (let i = 0; i < length; i++) {
      const mz = view.mz[i] as number;
      const relIntensity = view.relIntensity[i] as number;
      const lnI = Math.log(relIntensity);
      const q = Math.exp(STEIN_SCOTT_INTENSITY_POWER * lnI);
      // The very operations of peakWeight(mz, I, 3, 0.6): weightedNormSq is the exact scorer's norm.
      const w = mz * mz * mz * q;
      this.peakMz[base + i] = mz;
      this.peakRelIntensity[base + i] = relIntensity;
      if (this.loadingQ !== undefined) this.loadingQ[base + i] = q;
      lnScratch[i] = lnI;
      cosineNormSq += relIntensity * relIntensity;
      weightedNormSq += w * w;
      total += relIntensity;
      sumILnI += relIntensity * lnI;
    }
    const entropy = Math.log(total) - sumILnI / total;
    let exponent = 1;
    let reweightedTotal = total;
    if (entropy < 3) {
      exponent = 0.25 + 0.25 * entropy;
      reweightedTotal = 0;
      for (let i = 0; i < length; i++) reweightedTotal += Math.exp(exponent * (lnScratch[i] as number));
    }
    this.slot.cosineNormSq[slot] = cosineNormSq;
    this.slot.weightedNormSq[slot] = weightedNormSq;
    this.slot.entropyExponent[slot] = exponent / STEIN_SCOTT_INTENSITY_POWER;
    this.slot.entropyLnTotal[slot] = Math.log(reweightedTotal);
    this.slot.plainLnTotal[slot] = Math.log(total);
    this.peakCount += length;
    this.slotCount++;
    this.liveCount++;
    this.slotById.set(id, slot);
    this.deltaDirty = true;
  }

  /**
   * Removes a spectrum.
   * @returns true if it was there.
   */
  remove(id: number): boolean {
    if (this.readOnly) throw readOnlyError();
    const slot = this.slotById.get(id);
    if (slot === undefined) return false;
    this.slotById.delete(id);
    this.slot.flags[slot] = (this.slot.flags[slot] as number) & ~LIVE;
    this.liveCount--;
    this.deadCount++;
    return true;
  }

  /**
   * Packs every spectrum into exactly sized arrays and one set of posting lists, dropping removed
   * spectra. Searches do this on their own when needed; call it after a bulk load to pay the cost once.
   */
  pack(): void {
    if (this.readOnly) throw readOnlyError();
    const loadingQ = this.deadCount === 0 ? this.loadingQ : undefined;
    this.loadingQ = undefined;
    this.compactSlots();
    this.main = this.buildLists(0, this.slotCount, loadingQ);
    this.mainSlotEnd = this.slotCount;
    this.delta = emptyLists();
    this.deltaDirty = false;
  }

  /** Bytes held by the index and by its search scratch. */
  memory(): SpectrumIndexMemory {
    const bytes = (arrays: PackedArray[]): number => arrays.reduce((total, array) => total + array.byteLength, 0);
    const lists = (l: PostingLists): PackedArray[] => [l.offsets, l.slots, l.weights];
    const s = this.scratch;
    return {
      indexBytes: bytes([
        ...Object.values(this.slot),
        this.peakMz,
        this.peakRelIntensity,
        ...lists(this.main),
        ...lists(this.delta),
        ...(this.loadingQ === undefined ? [] : [this.loadingQ]),
      ]),
      scratchBytes: s === undefined ? 0 : bytes([s.count, s.sum, s.queryNormSq, s.ratioSum, s.lastRatio, s.upper, s.lower, s.checked, s.candidates, s.ordered]),
      peakCount: this.peakCount,
    };
  }

  /**
   * The exact top-k library spectra for a query.
   *
   * @param query - the unknown spectrum; normalised as {@link compareSpectra} does; not changed.
   * @param options - method, reverse, k and filters ({@link SpectrumSearchOptions}).
   * @returns hits ranked by score (by `reverseScore` in reverse mode) descending, then id ascending.
   *   `score` = compareSpectra(query, spectrum, { method }).score; `reverseScore` (reverse mode only) =
   *   compareSpectra(query, spectrum, { method, reverse: true }).score.
   * @throws {ChemError} `INVALID_PEAKS` / `EMPTY_SPECTRUM` (fields `query…`), `INVALID_ARGUMENT` for options.
   */
  search(query: PeakList, options: SpectrumSearchOptions = {}): SpectrumHit[] {
    const search = resolveSearchOptions(options, { method: this.defaultMethod, k: this.defaultK });
    const queryView = prepareSpectrum(query, 'query');
    if (!this.readOnly) this.refresh();
    const scratch = this.ensureScratch();
    try {
      const totals = this.accumulate(queryView, search, scratch);
      const norms = { cosineNormSq: this.slot.cosineNormSq, weightedNormSq: this.slot.weightedNormSq };
      const { upper, lower } = scratch;
      const heap = new Float64Array(search.k);
      const { passes, filtered } = this.passesFor(search);
      let candidates: CandidateList;
      if (!search.reverse && (search.method === 'weighted' || search.method === 'composite')) {
        candidates = forwardWeightedCandidates({
          acc: scratch,
          slotCount: this.slotCount,
          weightedNormSq: this.slot.weightedNormSq,
          queryNormSq: totals.weightedNormSq,
          queryPeakCount: totals.peakCount,
          composite: search.method === 'composite',
          k: search.k,
          flags: this.slot.flags,
          passes: filtered ? passes : undefined,
          upper,
          lower,
          out: scratch.candidates,
          heap,
        });
      } else {
        computeScoreBounds(search.method, search.reverse, scratch, this.slotCount, norms, totals, upper, lower);
        candidates = gatherCandidates(this.slotCount, upper, lower, search.k, passes, scratch.candidates, heap);
      }
      const ids = this.slot.ids;
      const exactScore = this.exactScorer(queryView, search);
      const select = (list: CandidateList, budget?: { limit: number; floor: number }): SlotHit[] | undefined =>
        selectTopHits({ candidates: list, upper, k: search.k, idOf: (slot) => ids[slot] as number, exactScore, ordered: scratch.ordered, budget });
      let hits: SlotHit[] | undefined;
      if (search.method === 'composite' && !search.reverse) {
        // The [0, 1] interval of the ratio term leaves a few hundred spectra to score exactly for most
        // queries, but tens of thousands when many spectra share many peaks with the query: past a
        // budget, a second pass over the same postings accumulates the ratio term and tightens the bounds.
        const budget = { limit: EXACT_SCORE_BUDGET, floor: -Infinity };
        hits = select(candidates, budget);
        if (hits === undefined) {
          // Only spectra whose loose upper bound reaches a score the k-th hit already has can still be in.
          const marks = scratch.checked;
          const list = candidates.slots;
          let kept = 0;
          for (let i = 0; i < candidates.count; i++) {
            const slot = list[i] as number;
            if ((upper[slot] as number) >= budget.floor) {
              list[kept++] = slot;
              marks[slot] = 1;
            }
          }
          this.accumulateRatioTerm(queryView, scratch, marks, list, kept);
          computeScoreBounds('composite', false, scratch, this.slotCount, norms, totals, upper, lower, { slots: list, count: kept });
          candidates = narrowCandidates(list, kept, upper, lower, search.k, heap, budget.floor);
        }
      }
      hits ??= select(candidates) ?? []; // without a budget select always answers
      return hits.map((hit) => {
        const matchedPeakCount = scratch.count[hit.slot] as number;
        const evidence = options.withMatchedPeaks === true ? { matchedPeaks: matchedPeaks(queryView, this.viewOf(hit.slot)) } : {};
        if (!search.reverse) return { id: hit.id, score: hit.score, matchedPeakCount, ...evidence };
        const score = scoreSpectrumViews(queryView, this.viewOf(hit.slot), search.method, false);
        return { id: hit.id, score, reverseScore: hit.score, matchedPeakCount, ...evidence };
      });
    } finally {
      scratch.count.fill(0, 0, this.slotCount);
      scratch.sum.fill(0, 0, this.slotCount);
      scratch.checked.fill(0, 0, this.slotCount);
    }
  }

  /**
   * The peaks a query shares with one indexed spectrum, as {@link compareSpectra} lists them: the index
   * keeps each spectrum's normalised peaks, so a caller need not keep a copy to explain a hit.
   * @throws {ChemError} `INVALID_ARGUMENT` (field `id`) when the id is not in the index; `INVALID_PEAKS` /
   *   `EMPTY_SPECTRUM` (fields `query…`) for a bad query.
   * @example
   * index.matchedPeaks([[43, 90], [58, 30]], 1); // [{ mz: 43, … }, { mz: 58, … }]
   */
  matchedPeaks(query: PeakList, id: number): MatchedPeak[] {
    const slot = this.slotOf(id);
    if (slot === undefined) throw new ChemError('INVALID_ARGUMENT', `id ${id} is not in the index`, { field: 'id' });
    return matchedPeaks(prepareSpectrum(query, 'query'), this.viewOf(slot));
  }

  /** The live slot of an id; a snapshot's copy maps its ids on first use. */
  private slotOf(id: number): number | undefined {
    if (this.readOnly && this.slotById.size === 0) {
      for (let slot = 0; slot < this.slotCount; slot++) this.slotById.set(this.slot.ids[slot] as number, slot);
    }
    const slot = this.slotById.get(id);
    return slot !== undefined && ((this.slot.flags[slot] as number) & LIVE) !== 0 ? slot : undefined;
  }

  /**
   * The exact score of one slot for this search. Forward weighted and composite scores take the
   * query's weights (computed once) and the slot's stored exact norm, and walk only the shared
   * peaks: the same sums in the same order as {@link scoreSpectrumViews}, so the same bits.
   */
  private exactScorer(queryView: SpectrumView, search: ResolvedSearch): (slot: number) => number {
    const { method, reverse } = search;
    if (reverse || (method !== 'weighted' && method !== 'composite')) {
      return (slot) => scoreSpectrumViews(queryView, this.viewOf(slot), method, reverse);
    }
    const queryPeakCount = queryView.end - queryView.start;
    const queryWeights = new Float64Array(queryPeakCount);
    let queryNormSq = 0;
    for (let i = 0; i < queryPeakCount; i++) {
      const w = peakWeight(queryView.mz[queryView.start + i] as number, queryView.relIntensity[queryView.start + i] as number, STEIN_SCOTT_MZ_POWER, STEIN_SCOTT_INTENSITY_POWER);
      queryWeights[i] = w;
      queryNormSq += w * w;
    }
    const norms = this.slot.weightedNormSq;
    const { start: slotStart, length: slotLength } = this.slot;
    // One library view and one sums object, reused for every slot scored in this search.
    const library = { mz: this.peakMz, relIntensity: this.peakRelIntensity, start: 0, end: 0 };
    const sums = { dot: 0, sharedPeakCount: 0, ratioTermSum: 0, queryNormSq, libraryNormSq: 0 };
    return (slot) => {
      library.start = slotStart[slot] as number;
      library.end = library.start + (slotLength[slot] as number);
      sharedSums(queryView, queryWeights, library, STEIN_SCOTT_MZ_POWER, STEIN_SCOTT_INTENSITY_POWER, sums);
      sums.libraryNormSq = norms[slot] as number;
      return method === 'composite' ? compositeFromSums(sums, queryPeakCount) : weightedFromSums(sums);
    };
  }

  /** The filter test of one search (the slot is live and passes), and whether it has filters at all. */
  private passesFor(search: ResolvedSearch): { passes: (slot: number) => boolean; filtered: boolean } {
    const { flags } = this.slot;
    const unfiltered =
      search.filter === undefined &&
      Number.isNaN(search.minMass) &&
      Number.isNaN(search.maxMass) &&
      Number.isNaN(search.riMin) &&
      search.requiredMask === 0 &&
      search.forbiddenMask === 0 &&
      search.group === 0;
    return unfiltered
      ? { passes: (slot) => ((flags[slot] as number) & LIVE) !== 0, filtered: false }
      : { passes: (slot) => this.passes(slot, search), filtered: true };
  }

  private passes(slot: number, search: ResolvedSearch): boolean {
    const flags = this.slot.flags[slot] as number;
    if ((flags & LIVE) === 0) return false;
    const metaOk = passesMetaFilters(
      search,
      this.slot.nominalMass[slot] as number,
      this.slot.retentionIndex[slot] as number,
      this.slot.elementsMask[slot] as number,
      flags >> 1,
    );
    return metaOk && (search.filter === undefined || search.filter(this.slot.ids[slot] as number) === true);
  }

  private viewOf(slot: number): SpectrumView {
    const start = this.slot.start[slot] as number;
    return { mz: this.peakMz, relIntensity: this.peakRelIntensity, start, end: start + (this.slot.length[slot] as number) };
  }

  private accumulate(queryView: SpectrumView, search: ResolvedSearch, acc: Accumulators): QueryTotals {
    const tiers = [this.main, this.delta];
    const totals: QueryTotals = { peakCount: queryView.end - queryView.start, cosineNormSq: 0, weightedNormSq: 0 };
    const forwardDot = !search.reverse && (search.method === 'weighted' || search.method === 'composite');
    const entropyWeighted = search.method === 'entropy';
    const queryEntropy = entropyWeights(queryView, entropyWeighted);
    const slotWeights: EntropySlotWeights = entropyWeighted
      ? { exponents: this.slot.entropyExponent, lnTotals: this.slot.entropyLnTotal }
      : { exponents: undefined, lnTotals: this.slot.plainLnTotal };
    const factors = forwardDot ? new Float64Array(totals.peakCount) : undefined;
    for (let i = queryView.start; i < queryView.end; i++) {
      const mz = queryView.mz[i] as number;
      const u = queryView.relIntensity[i] as number;
      const q = postingWeight(u);
      const w = mz * mz * mz * q;
      totals.cosineNormSq += u * u;
      totals.weightedNormSq += w * w;
      if (factors !== undefined) {
        factors[i - queryView.start] = w * mz * mz * mz;
        continue;
      }
      const probability = Math.exp(queryEntropy.exponent * Math.log(u)) / queryEntropy.total;
      for (const tier of tiers) {
        if (search.method === 'cosine') accumulateCosine(tier, acc, mz, u);
        else if (search.method === 'weighted' || search.method === 'composite') accumulateWeighted(tier, acc, mz, w, q);
        else accumulateEntropy(tier, acc, mz, probability, slotWeights, search.reverse);
      }
    }
    if (factors !== undefined) {
      for (const tier of tiers) {
        this.walkBlocked(tier, queryView, (lists, from, to, slotLimit, i) => accumulateDot(lists, acc, from, to, slotLimit, factors[i] as number));
      }
    }
    return totals;
  }

  /**
   * Walks the query's posting lists of one tier in blocks of {@link SLOT_BLOCK} slots: within a block,
   * every list in m/z order (so each spectrum still sees its shared peaks in m/z order), which keeps
   * the per-slot sums a block touches in cache. `step` walks one list from `from` while the slot is
   * below `slotLimit` and returns where it stopped.
   */
  private walkBlocked(
    lists: PostingLists,
    queryView: SpectrumView,
    step: (lists: PostingLists, from: number, to: number, slotLimit: number, peak: number) => number,
  ): void {
    const n = queryView.end - queryView.start;
    const from = new Uint32Array(n);
    const to = new Uint32Array(n);
    for (let i = 0; i < n; i++) {
      const mz = queryView.mz[queryView.start + i] as number;
      from[i] = lists.offsets[mz] as number;
      to[i] = lists.offsets[mz + 1] as number;
    }
    for (let slotLimit = SLOT_BLOCK; ; slotLimit += SLOT_BLOCK) {
      let pending = false;
      for (let i = 0; i < n; i++) {
        const start = from[i] as number;
        const end = to[i] as number;
        if (start === end) continue;
        const stopped = step(lists, start, end, slotLimit, i);
        from[i] = stopped;
        if (stopped < end) pending = true;
      }
      if (!pending) return;
    }
  }

  private accumulateRatioTerm(queryView: SpectrumView, acc: Accumulators, only: Uint8Array, slots: Uint32Array, count: number): void {
    // accumulateRatio reads these only for the marked slots: clearing those is enough.
    for (let i = 0; i < count; i++) {
      const slot = slots[i] as number;
      acc.ratioSum[slot] = 0;
      acc.lastRatio[slot] = 0;
    }
    const queryQ = new Float64Array(queryView.end - queryView.start);
    for (let i = queryView.start; i < queryView.end; i++) queryQ[i - queryView.start] = postingWeight(queryView.relIntensity[i] as number);
    for (const tier of [this.main, this.delta]) {
      this.walkBlocked(tier, queryView, (lists, from, to, slotLimit, i) =>
        accumulateRatio(lists, acc, from, to, slotLimit, queryQ[i] as number, only),
      );
    }
  }

  private refresh(): void {
    const pending = this.slotCount - this.mainSlotEnd;
    const limit = Math.max(1024, this.slotCount >> 3);
    if (pending > limit || this.deadCount > limit) this.pack();
    else if (this.deltaDirty) {
      this.delta = this.buildLists(this.mainSlotEnd, this.slotCount);
      this.deltaDirty = false;
    }
  }

  private buildLists(fromSlot: number, toSlot: number, knownQ?: Float32Array): PostingLists {
    const offsets = allocateLike(new Uint32Array(0), OFFSET_COUNT, this.shared);
    const { flags, start: slotStart, length: slotLength } = this.slot;
    const { peakMz, peakRelIntensity } = this;
    for (let slot = fromSlot; slot < toSlot; slot++) {
      if (((flags[slot] as number) & LIVE) === 0) continue;
      const start = slotStart[slot] as number;
      const end = start + (slotLength[slot] as number);
      for (let p = start; p < end; p++) {
        const next = (peakMz[p] as number) + 1;
        offsets[next] = (offsets[next] as number) + 1;
      }
    }
    for (let mz = 1; mz < OFFSET_COUNT; mz++) offsets[mz] = (offsets[mz] as number) + (offsets[mz - 1] as number);
    const total = offsets[OFFSET_COUNT - 1] as number;
    const slots = allocateLike(new Uint32Array(0), total, this.shared);
    const weights = allocateLike(new Float32Array(0), total, this.shared);
    const cursor = offsets.slice();
    for (let slot = fromSlot; slot < toSlot; slot++) {
      if (((flags[slot] as number) & LIVE) === 0) continue;
      const start = slotStart[slot] as number;
      const end = start + (slotLength[slot] as number);
      for (let p = start; p < end; p++) {
        const mz = peakMz[p] as number;
        const position = cursor[mz] as number;
        cursor[mz] = position + 1;
        slots[position] = slot;
        weights[position] = knownQ !== undefined ? (knownQ[p] as number) : postingWeight(peakRelIntensity[p] as number);
      }
    }
    return { offsets, slots, weights };
  }

  private compactSlots(): void {
    const keep: number[] = [];
    let peaks = 0;
    for (let slot = 0; slot < this.slotCount; slot++) {
      if (((this.slot.flags[slot] as number) & LIVE) !== 0) {
        keep.push(slot);
        peaks += this.slot.length[slot] as number;
      }
    }
    const n = keep.length;
    const pick = <T extends PackedArray>(array: T): T => {
      const out = allocateLike(array, n, this.shared);
      keep.forEach((slot, i) => (out[i] = array[slot] as number));
      return out;
    };
    const peakMz = allocateLike(new Uint16Array(0), peaks, this.shared);
    const peakRelIntensity = allocateLike(new Float32Array(0), peaks, this.shared);
    const slotStart = allocateLike(new Uint32Array(0), n, this.shared);
    let cursor = 0;
    keep.forEach((slot, i) => {
      const start = this.slot.start[slot] as number;
      const end = start + (this.slot.length[slot] as number);
      peakMz.set(this.peakMz.subarray(start, end), cursor);
      peakRelIntensity.set(this.peakRelIntensity.subarray(start, end), cursor);
      slotStart[i] = cursor;
      cursor += end - start;
    });
    this.slot = { ...mapSlotColumns(this.slot, pick), start: slotStart };
    this.peakMz = peakMz;
    this.peakRelIntensity = peakRelIntensity;
    this.slotCount = n;
    this.peakCount = peaks;
    this.deadCount = 0;
    this.slotById.clear();
    keep.forEach((_, i) => this.slotById.set(this.slot.ids[i] as number, i));
    this.scratch = undefined;
  }

  private ensureSlotCapacity(n: number): void {
    this.slot = mapSlotColumns(this.slot, (column) => growTypedArray(column, n, undefined, this.shared));
  }

  private ensurePeakCapacity(n: number): void {
    this.peakMz = growTypedArray(this.peakMz, n, undefined, this.shared);
    this.peakRelIntensity = growTypedArray(this.peakRelIntensity, n, undefined, this.shared);
    if (this.loadingQ !== undefined) this.loadingQ = growTypedArray(this.loadingQ, n);
  }

  private ensureScratch(): NonNullable<SpectrumIndex['scratch']> {
    const n = this.slotCount;
    if (this.scratch !== undefined && this.scratch.count.length >= n) return this.scratch;
    const length = Math.max(n, 16);
    this.scratch = {
      count: new Uint32Array(length),
      sum: new Float64Array(length),
      queryNormSq: new Float64Array(length),
      ratioSum: new Float64Array(length),
      lastRatio: new Float64Array(length),
      upper: new Float64Array(length),
      lower: new Float64Array(length),
      checked: new Uint8Array(length),
      candidates: new Uint32Array(length),
      ordered: new Uint32Array(length),
    };
    return this.scratch;
  }
}

/**
 * Creates an empty {@link SpectrumIndex}.
 * @example
 * const index = createSpectrumIndex({ method: 'cosine' });
 */
export function createSpectrumIndex(options: SpectrumIndexOptions = {}): SpectrumIndex {
  return new SpectrumIndex(options);
}
