import type { RevisionState } from '@ionfolio/contracts';
import type { SessionUser } from '../users/users.schemas';
import { roleAtLeast } from '../../shared/require-role';
import type { RevisionRow } from './revision.entity';
import type { UserRef } from './entries.repository';

export interface RevisionView {
  id: string;
  accession: string;
  number: number;
  label: string;
  state: RevisionState;
  lockVersion: number;
  name: string;
  synonyms: string[];
  formula: string;
  nominalMass: number;
  monoisotopicMass: number;
  structure: string | null;
  structureFormat: 'smiles' | 'molfile' | null;
  casRn: string | null;
  peaks: [number, number][];
  peakCount: number;
  basePeakMz: number;
  conditions: Record<string, unknown>;
  retentionIndex: { value: number; column: string } | null;
  sampleNotes: string;
  changeNote: string;
  simulated: boolean;
  checks: unknown[];
  checksWorst: 'pass' | 'warn' | 'fail';
  contentSha256: string;
  restoredFrom: number | null;
  author: UserRef | null;
  reviewer: UserRef | null;
  createdAt: string;
  updatedAt: string;
  submittedAt: string | null;
  decidedAt: string | null;
  publishedAt: string | null;
}

export type RevisionSummary = Pick<
  RevisionView,
  'id' | 'number' | 'label' | 'state' | 'name' | 'formula' | 'changeNote' | 'author' | 'reviewer' | 'createdAt' | 'submittedAt' | 'publishedAt' | 'checksWorst' | 'contentSha256'
>;

const iso = (d: Date | null) => (d ? d.toISOString() : null);

export function toRevisionView(r: RevisionRow, accession: string, users: Map<string, UserRef>): RevisionView {
  return {
    id: r.id,
    accession,
    number: r.number,
    label: `${accession} r${r.number}`,
    state: r.state,
    lockVersion: r.lockVersion,
    name: r.name,
    synonyms: r.synonyms,
    formula: r.formula,
    nominalMass: r.nominalMass,
    monoisotopicMass: r.monoisotopicMass,
    structure: r.structure,
    structureFormat: r.structureFormat,
    casRn: r.casRn,
    peaks: r.peaks,
    peakCount: r.peakCount,
    basePeakMz: r.basePeakMz,
    conditions: r.conditions,
    retentionIndex: r.retentionIndex === null ? null : { value: r.retentionIndex, column: r.retentionIndexColumn ?? 'non-polar' },
    sampleNotes: r.sampleNotes,
    changeNote: r.changeNote,
    simulated: r.simulated,
    checks: r.checks,
    checksWorst: r.checksWorst,
    contentSha256: r.contentSha256,
    restoredFrom: r.restoredFrom,
    author: users.get(r.authorId) ?? null,
    reviewer: r.reviewerId ? (users.get(r.reviewerId) ?? null) : null,
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
    submittedAt: iso(r.submittedAt),
    decidedAt: iso(r.decidedAt),
    publishedAt: iso(r.publishedAt),
  };
}

export function toRevisionSummary(v: RevisionView): RevisionSummary {
  const { id, number, label, state, name, formula, changeNote, author, reviewer, createdAt, submittedAt, publishedAt, checksWorst, contentSha256 } = v;
  return { id, number, label, state, name, formula, changeNote, author, reviewer, createdAt, submittedAt, publishedAt, checksWorst, contentSha256 };
}

const PUBLIC_STATES: readonly RevisionState[] = ['published', 'superseded', 'withdrawn'];

/** Everyone sees what was published; open revisions only their author and curators. */
export function canSee(viewer: SessionUser, r: Pick<RevisionRow, 'state' | 'authorId'>): boolean {
  return PUBLIC_STATES.includes(r.state) || r.authorId === viewer.id || roleAtLeast(viewer.role, 'curator');
}
