import { ChemError } from '../errors/chem-error';
import { assertSimilarityMethod, type MatchedPeak, type SimilarityMethod } from '../similarity/similarity-method';

/** What the index knows about a spectrum besides its peaks; each part optional. */
export interface SpectrumMeta {
  /** Nominal molecular mass in Da, for `minMass` / `maxMass`. */
  nominalMass?: number;
  /** Retention index (index units), for the `retentionIndex` window. */
  retentionIndex?: number;
  /** Bit mask of the elements in the formula (bit numbering is the caller's), for `elementsMask`. */
  elementsMask?: number;
  /**
   * A small class number of the caller's (1 … {@link MAX_GROUP}; 0 or absent = none), for `group`:
   * e.g. the column class a retention index was measured on.
   */
  group?: number;
}

/** The largest group number a spectrum can carry (seven bits beside the index's live flag). */
export const MAX_GROUP = 127;

/** Options of {@link SpectrumIndex.search}. Filters exclude spectra that lack the value filtered on. */
export interface SpectrumSearchOptions {
  /** Score to rank by; default the index's method (itself `composite` by default). */
  method?: SimilarityMethod;
  /** Rank by the reverse score (reported as `reverseScore`, beside the forward `score`). */
  reverse?: boolean;
  /** Number of hits, a positive integer; default the index's k (10). */
  k?: number;
  /** Keep only spectra for which this returns true. */
  filter?: (id: number) => boolean;
  /** Keep spectra with nominalMass ≥ minMass (Da). */
  minMass?: number;
  /** Keep spectra with nominalMass ≤ maxMass (Da). */
  maxMass?: number;
  /** Keep spectra with |retentionIndex − value| ≤ tolerance. */
  retentionIndex?: { value: number; tolerance: number };
  /** Keep spectra whose mask has every `required` bit and no `forbidden` bit (missing mask = 0). */
  elementsMask?: { required?: number; forbidden?: number };
  /** Keep only spectra of this group (1 … {@link MAX_GROUP}). */
  group?: number;
  /** Also list, per hit, the peaks the query shares with it (as compareSpectra does). */
  withMatchedPeaks?: boolean;
}

/** Options of the {@link SpectrumIndex} constructor. */
export interface SpectrumIndexOptions {
  /** Default method of `search`; default `composite`. */
  method?: SimilarityMethod;
  /** Default number of hits; default 10. */
  k?: number;
  /**
   * Room to reserve up front when the library size is known (spectra, and peaks after normalisation):
   * spares the repeated growth of large arrays while loading. A guess is fine; the index grows beyond it.
   */
  reserve?: { spectra: number; peaks: number };
  /**
   * Keep the index in SharedArrayBuffers, so that {@link SpectrumIndex.snapshot} can hand it to worker
   * threads without copying it. Default false.
   */
  sharedMemory?: boolean;
}

/** One search hit: `score` is the forward score; `reverseScore` is present (and ranks) in reverse mode. */
export interface SpectrumHit {
  id: number;
  score: number;
  reverseScore?: number;
  matchedPeakCount: number;
  /** With `withMatchedPeaks`: the shared peaks, as compareSpectra lists them. */
  matchedPeaks?: MatchedPeak[];
}

/** Search options after defaults and checks, with filters as numbers (NaN = not set). */
export interface ResolvedSearch {
  method: SimilarityMethod;
  reverse: boolean;
  k: number;
  filter: ((id: number) => boolean) | undefined;
  minMass: number;
  maxMass: number;
  riMin: number;
  riMax: number;
  requiredMask: number;
  forbiddenMask: number;
  /** 0 = no group filter. */
  group: number;
}

function finiteOrThrow(value: unknown, field: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new ChemError('INVALID_ARGUMENT', `${field} must be a finite number`, { field });
  }
  return value;
}

/**
 * Checks k: a positive integer.
 * @throws {ChemError} `INVALID_ARGUMENT` (field `k`).
 * @example
 * checkHitCount(10); // 10
 */
export function checkHitCount(k: unknown): number {
  if (typeof k !== 'number' || !Number.isInteger(k) || k < 1) {
    throw new ChemError('INVALID_ARGUMENT', 'k must be a positive integer', { field: 'k' });
  }
  return k;
}

/**
 * Applies defaults to search options and checks them.
 * @throws {ChemError} `INVALID_ARGUMENT` with the offending field.
 * @example
 * resolveSearchOptions({ k: 5 }, { method: 'composite', k: 10 }).k; // 5
 */
export function resolveSearchOptions(
  options: SpectrumSearchOptions,
  defaults: { method: SimilarityMethod; k: number },
): ResolvedSearch {
  const method = assertSimilarityMethod(options.method ?? defaults.method);
  const k = checkHitCount(options.k ?? defaults.k);
  if (options.filter !== undefined && typeof options.filter !== 'function') {
    throw new ChemError('INVALID_ARGUMENT', 'filter must be a function', { field: 'filter' });
  }
  const minMass = options.minMass === undefined ? NaN : finiteOrThrow(options.minMass, 'minMass');
  const maxMass = options.maxMass === undefined ? NaN : finiteOrThrow(options.maxMass, 'maxMass');
  let riMin = NaN;
  let riMax = NaN;
  if (options.retentionIndex !== undefined) {
    const value = finiteOrThrow(options.retentionIndex.value, 'retentionIndex.value');
    const tolerance = finiteOrThrow(options.retentionIndex.tolerance, 'retentionIndex.tolerance');
    if (tolerance < 0) {
      throw new ChemError('INVALID_ARGUMENT', 'retentionIndex.tolerance must be ≥ 0', { field: 'retentionIndex.tolerance' });
    }
    riMin = value - tolerance;
    riMax = value + tolerance;
  }
  const group = options.group ?? 0;
  if (options.group !== undefined && (!Number.isInteger(group) || group < 1 || group > MAX_GROUP)) {
    throw new ChemError('INVALID_ARGUMENT', `group must be an integer from 1 to ${MAX_GROUP}`, { field: 'group' });
  }
  return {
    method,
    reverse: options.reverse ?? false,
    k,
    filter: options.filter,
    minMass,
    maxMass,
    riMin,
    riMax,
    requiredMask: (options.elementsMask?.required ?? 0) >>> 0,
    forbiddenMask: (options.elementsMask?.forbidden ?? 0) >>> 0,
    group,
  };
}

/**
 * Whether a spectrum with this meta passes the numeric filters and the group (not the `filter` callback).
 * NaN meta means the value is missing; a spectrum missing a filtered value is excluded.
 * @example
 * passesMetaFilters(resolved, 120, NaN, 0);
 */
export function passesMetaFilters(
  search: ResolvedSearch,
  nominalMass: number,
  retentionIndex: number,
  elementsMask: number,
  group = 0,
): boolean {
  if (search.group !== 0 && group !== search.group) return false;
  if (!Number.isNaN(search.minMass) && !(nominalMass >= search.minMass)) return false;
  if (!Number.isNaN(search.maxMass) && !(nominalMass <= search.maxMass)) return false;
  if (!Number.isNaN(search.riMin) && !(retentionIndex >= search.riMin && retentionIndex <= search.riMax)) return false;
  if ((elementsMask & search.requiredMask) >>> 0 !== search.requiredMask) return false;
  return (elementsMask & search.forbiddenMask) === 0;
}
