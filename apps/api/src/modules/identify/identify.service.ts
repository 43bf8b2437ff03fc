import { type MolecularIonReading, type PeakList, type SpectrumSearchOptions } from '@ionfolio/chem';
import { IDENTIFY_CAUTION } from './caution';
import { withChemErrors, withChemErrorsAsync } from './chem-errors';
import { maskOf } from './element-mask';
import type { LibraryIndex } from './library-index';
import type { LibrarySearch } from './library-search';
import { readOnThisThread, type ReadingPool } from './reading-pool';
import type { Candidate, IdentifyMethod, IdentifyRequest, SearchOptions } from './identify.schemas';

/** Scores are 0–1 in packages/chem; the product shows 0–100 with one decimal. */
export const toSimilarity = (score: number): number => Math.round(score * 1000) / 10;

type RetentionWindow = IdentifyRequest['retentionIndex'];

function indexOptions(options: SearchOptions, k: number, library: LibraryIndex, ri: RetentionWindow): SpectrumSearchOptions {
  return {
    method: options.method,
    reverse: options.reverse,
    k,
    minMass: options.minMass,
    maxMass: options.maxMass,
    retentionIndex: ri && { value: ri.value, tolerance: ri.tolerance },
    // A retention index is comparable only on the same column class.
    filter: ri && ((id) => library.meta(id).retentionIndexColumn === ri.column),
    elementsMask: options.elements && { required: maskOf(options.elements.required), forbidden: maskOf(options.elements.forbidden) },
  };
}

/** The exact top-k candidates of one query against one library index, with their evidence. */
export function searchCandidates(
  library: LibraryIndex,
  peaks: PeakList,
  options: SearchOptions,
  k: number,
  ri?: RetentionWindow,
  path = 'peaks',
): Candidate[] {
  const hits = withChemErrors(() => library.index.search(peaks, indexOptions(options, k, library, ri)), path);
  return hits.map((hit) => {
    const meta = library.meta(hit.id);
    const matchedPeaks = library.matchedPeaks(peaks, hit.id);
    return {
      accession: meta.accession,
      revision: meta.revision,
      name: meta.name,
      formula: meta.formula,
      nominalMass: meta.nominalMass,
      similarity: toSimilarity(hit.score),
      ...(hit.reverseScore === undefined ? {} : { reverseSimilarity: toSimilarity(hit.reverseScore) }),
      matchedPeaks,
    };
  });
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
export async function identify(search: LibrarySearch, request: IdentifyRequest, readings?: ReadingPool): Promise<IdentifyAnswer> {
  const t0 = performance.now();
  const library = await search.indexFor(request.edition);
  // The reading starts on the worker thread, then the search runs here: the request waits for the longer.
  const reading = readings?.read(request.peaks);
  reading?.catch(() => undefined); // a failed search answers first; the reading's error is then not needed
  const candidates = searchCandidates(library, request.peaks, request, request.limit, request.retentionIndex);
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
