import { SpectrumIndex, type PeakList } from '@ionfolio/chem';
import { formulaMask } from './element-mask';

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

export type CandidateMeta = Omit<LibraryRevision, 'peaks'> & { peaks: PeakList };

/**
 * A {@link SpectrumIndex} over library revisions with what the API must say about each hit. The
 * index wants numeric ids: each added revision gets the next number, mapped back to its accession
 * and revision; an entry has at most one revision here at a time.
 */
export interface LibraryIndex {
  readonly index: SpectrumIndex;
  readonly size: number;
  meta(id: number): CandidateMeta;
  /** Adds the revision, replacing whatever revision of the same entry was there. */
  put(revision: LibraryRevision): void;
  /** Removes the entry's revision; true if there was one. */
  remove(accession: string): boolean;
  has(accession: string, revision?: number): boolean;
}

export function createLibraryIndex(revisions: Iterable<LibraryRevision> = []): LibraryIndex {
  const index = new SpectrumIndex();
  const metaById = new Map<number, CandidateMeta>();
  const idByAccession = new Map<string, number>();
  let nextId = 1;

  const library: LibraryIndex = {
    index,
    get size() {
      return index.size;
    },
    meta(id) {
      const meta = metaById.get(id);
      if (!meta) throw new Error(`library index: no revision for id ${id}`);
      return meta;
    },
    put(revision) {
      library.remove(revision.accession);
      const id = nextId++;
      index.add(id, revision.peaks, {
        nominalMass: revision.nominalMass,
        retentionIndex: revision.retentionIndex ?? undefined,
        elementsMask: formulaMask(revision.formula),
      });
      metaById.set(id, revision);
      idByAccession.set(revision.accession, id);
    },
    remove(accession) {
      const id = idByAccession.get(accession);
      if (id === undefined) return false;
      index.remove(id);
      metaById.delete(id);
      idByAccession.delete(accession);
      return true;
    },
    has(accession, revision) {
      const id = idByAccession.get(accession);
      return id !== undefined && (revision === undefined || metaById.get(id)?.revision === revision);
    },
  };
  for (const revision of revisions) library.put(revision);
  index.pack();
  return library;
}
