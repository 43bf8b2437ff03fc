import { SpectrumIndex, type SpectrumIndexSnapshot } from '@ionfolio/chem';
import { COLUMN_CLASSES } from '@ionfolio/contracts';
import { formulaMask } from './element-mask';

/**
 * The index group of a retention index's column class (1, 2, 3 in the order of COLUMN_CLASSES; 0 for
 * none or an unknown class, which no retention-index window matches): a retention index is comparable
 * only on the same column class, and as a group the index can check that on any thread.
 */
export function columnGroup(column: string | null | undefined): number {
  return (COLUMN_CLASSES as readonly (string | null | undefined)[]).indexOf(column) + 1;
}

/** One published (or edition member) revision as the search needs it. */
export interface LibraryRevision {
  accession: string;
  revision: number;
  name: string;
  formula: string;
  nominalMass: number;
  peaks: [number, number][];
  retentionIndex: number | null;
  retentionIndexColumn: string | null;
}

/** What the API says about a hit besides its score; the peaks stay in the index only. */
export type CandidateMeta = Omit<LibraryRevision, 'peaks'>;

/**
 * A {@link SpectrumIndex} over library revisions with what the API must say about each hit. The
 * index wants numeric ids: each added revision gets the next number, mapped back to its accession
 * and revision; an entry has at most one revision here at a time.
 */
export interface LibraryIndex {
  readonly index: SpectrumIndex;
  readonly size: number;
  /** Counts the puts and removes so far, so that a search pool can tell whether its workers are current. */
  readonly version: number;
  /** The meta of the hit `id`, or undefined once its revision has left the index. */
  meta(id: number): CandidateMeta | undefined;
  /** Adds the revision, replacing whatever revision of the same entry was there. */
  put(revision: LibraryRevision): void;
  /** Removes the entry's revision; true if there was one. */
  remove(accession: string): boolean;
  has(accession: string, revision?: number): boolean;
  /** What worker threads search (SpectrumIndex.snapshot); shared, not copied, with `sharedMemory`. */
  snapshot(): SpectrumIndexSnapshot;
}

/** `sharedMemory`: the index lives in SharedArrayBuffers, so that worker threads search it without a copy. */
function emptyLibraryIndex(options: { reserve?: { spectra: number; peaks: number }; sharedMemory?: boolean } = {}): LibraryIndex {
  const index = new SpectrumIndex({ reserve: options.reserve, sharedMemory: options.sharedMemory });
  const metaById = new Map<number, CandidateMeta>();
  const idByAccession = new Map<string, number>();
  // Ids are never reused within one library index, so a hit found on an older snapshot names either
  // its own revision or one that has left (meta answers undefined), never another entry.
  let nextId = 1;
  let version = 0;

  const library: LibraryIndex = {
    index,
    get size() {
      return index.size;
    },
    get version() {
      return version;
    },
    meta(id) {
      return metaById.get(id);
    },
    put(revision) {
      library.remove(revision.accession);
      version++;
      const id = nextId++;
      const { peaks, ...meta } = revision;
      index.add(id, peaks, {
        nominalMass: meta.nominalMass,
        retentionIndex: meta.retentionIndex ?? undefined,
        elementsMask: formulaMask(meta.formula),
        group: columnGroup(meta.retentionIndexColumn),
      });
      metaById.set(id, meta);
      idByAccession.set(revision.accession, id);
    },
    remove(accession) {
      const id = idByAccession.get(accession);
      if (id === undefined) return false;
      version++;
      index.remove(id);
      metaById.delete(id);
      idByAccession.delete(accession);
      return true;
    },
    has(accession, revision) {
      const id = idByAccession.get(accession);
      return id !== undefined && (revision === undefined || metaById.get(id)?.revision === revision);
    },
    snapshot() {
      return index.snapshot();
    },
  };
  return library;
}

/** An index over these revisions, packed. */
export function createLibraryIndex(revisions: Iterable<LibraryRevision> = [], options: { sharedMemory?: boolean } = {}): LibraryIndex {
  const library = emptyLibraryIndex(options);
  for (const revision of revisions) library.put(revision);
  library.index.pack();
  return library;
}

/**
 * An index filled page by page (each page's rows can be collected as soon as they are added), with
 * room reserved up front so that the typed arrays are not regrown on the way; packed at the end.
 */
export async function loadLibraryIndex(
  pages: AsyncIterable<LibraryRevision[]>,
  reserve?: { spectra: number; peaks: number },
  options: { sharedMemory?: boolean } = {},
): Promise<LibraryIndex> {
  const library = emptyLibraryIndex({ reserve, sharedMemory: options.sharedMemory });
  for await (const page of pages) for (const revision of page) library.put(revision);
  library.index.pack();
  return library;
}
