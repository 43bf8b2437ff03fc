import { type MolecularIonReading, type PeakList, type SpectrumHit } from '@ionfolio/chem';
import { IDENTIFY_CAUTION } from './caution';
import { withChemErrors, withChemErrorsAsync } from './chem-errors';
import { maskOf } from './element-mask';
import { columnGroup, type CandidateMeta, type LibraryIndex } from './library-index';
import type { LibrarySearch } from './library-search';
import { readOnThisThread, type PoolSearchOptions, type SearchPool } from './search-pool';
import type { Candidate, IdentifyMethod, IdentifyRequest, SearchOptions } from './identify.schemas';

/** Scores are 0–1 in packages/chem; the product shows 0–100 with one decimal. */
export const toSimilarity = (score: number): number => Math.round(score * 1000) / 10;

type RetentionWindow = IdentifyRequest['retentionIndex'];

/** A candidate without the peaks it shares with the query, as a batch answer lists it. */
export type RankedCandidate = Omit<Candidate, 'matchedPeaks'>;

function searchOptions(options: SearchOptions, k: number, withMatchedPeaks: boolean, ri: RetentionWindow): PoolSearchOptions {
  return {
    method: options.method,
    reverse: options.reverse,
    k,
    minMass: options.minMass,
    maxMass: options.maxMass,
    elementsMask: options.elements && { required: maskOf(options.elements.required), forbidden: maskOf(options.elements.forbidden) },
    retentionIndex: ri && { value: ri.value, tolerance: ri.tolerance },
    // A retention index is comparable only on the same column class: the index keeps it as a group.
    group: ri && columnGroup(ri.column),
    withMatchedPeaks,
  };
}

/**
 * The exact top-k hits of one query against one library index. The current library is searched in
 * the pool; an edition's index (not in shared memory) here, on the main thread.
 */
async function findHits(
  library: LibraryIndex,
  peaks: PeakList,
  options: SearchOptions,
  k: number,
  withMatchedPeaks: boolean,
  context: { pool?: SearchPool; ri?: RetentionWindow; path?: string },
): Promise<SpectrumHit[]> {
  const { pool, ri, path = 'peaks' } = context;
  const searched = searchOptions(options, k, withMatchedPeaks, ri);
  if (pool && options.edition === undefined) return withChemErrorsAsync(pool.search(library, peaks, searched), path);
  return withChemErrors(() => library.index.search(peaks, searched), path);
}

function ranked(meta: CandidateMeta, hit: SpectrumHit): RankedCandidate {
  return {
    accession: meta.accession,
    revision: meta.revision,
    name: meta.name,
    formula: meta.formula,
    nominalMass: meta.nominalMass,
    similarity: toSimilarity(hit.score),
    ...(hit.reverseScore === undefined ? {} : { reverseSimilarity: toSimilarity(hit.reverseScore) }),
  };
}

/**
 * Hits as candidates. A worker may have searched a snapshot taken before a revision left the library;
 * such a hit has no meta by the time it is answered and is dropped.
 */
function candidatesOf<C>(library: LibraryIndex, hits: SpectrumHit[], make: (meta: CandidateMeta, hit: SpectrumHit) => C): C[] {
  return hits.flatMap((hit) => {
    const meta = library.meta(hit.id);
    return meta ? [make(meta, hit)] : [];
  });
}

/** The exact top-k candidates of one query against one library index, with their evidence. */
export async function searchCandidates(
  library: LibraryIndex,
  peaks: PeakList,
  options: SearchOptions,
  k: number,
  context: { pool?: SearchPool; ri?: RetentionWindow; path?: string } = {},
): Promise<Candidate[]> {
  const hits = await findHits(library, peaks, options, k, true, context);
  return candidatesOf(library, hits, (meta, hit) => ({ ...ranked(meta, hit), matchedPeaks: hit.matchedPeaks ?? [] }));
}

/** {@link searchCandidates} without the matched peaks, which a batch answer leaves out. */
export async function rankCandidates(
  library: LibraryIndex,
  peaks: PeakList,
  options: SearchOptions,
  k: number,
  context: { pool?: SearchPool; path?: string } = {},
): Promise<RankedCandidate[]> {
  return candidatesOf(library, await findHits(library, peaks, options, k, false, context), ranked);
}

/** The molecular-ion check of a query, or null when no cluster can be fitted; a ChemError is a 400. */
export function readQuery(peaks: PeakList, path = 'peaks'): MolecularIonReading | null {
  return withChemErrors(() => readOnThisThread(peaks), path);
}

export interface IdentifyAnswer {
  candidates: Candidate[];
  reading: MolecularIonReading | null;
  method: IdentifyMethod;
  edition: string;
  tookMs: number;
  caution: string;
}

/** `POST /api/v1/identify`: candidates from the current library or an edition, and the query's reading. */
export async function identify(search: LibrarySearch, request: IdentifyRequest, pool?: SearchPool): Promise<IdentifyAnswer> {
  const t0 = performance.now();
  const library = await search.indexFor(request.edition);
  // The reading and the search go to the pool at once (to two workers when both are free), or the
  // reading goes there while this thread searches: the request waits for the longer of the two.
  const reading = pool?.read(request.peaks);
  reading?.catch(() => undefined); // a failed search answers first; the reading's error is then not needed
  const candidates = await searchCandidates(library, request.peaks, request, request.limit, { pool, ri: request.retentionIndex });
  const answered = reading === undefined ? readQuery(request.peaks) : await withChemErrorsAsync(reading, 'peaks');
  return {
    candidates,
    reading: answered,
    method: request.method,
    edition: request.edition ?? 'current',
    tookMs: Math.round((performance.now() - t0) * 10) / 10,
    caution: IDENTIFY_CAUTION,
  };
}
