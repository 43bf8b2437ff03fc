import { EntitySchema, type ColumnType } from 'typeorm';
import type { RevisionState } from '@ionfolio/contracts';

/** An immutable version of an entry (`IF-000123 r3`); see the curation migration for the guards. */
export interface RevisionRow {
  id: string;
  entryId: number;
  number: number;
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
  retentionIndex: number | null;
  retentionIndexColumn: string | null;
  sampleNotes: string;
  changeNote: string;
  simulated: boolean;
  checks: unknown[];
  checksWorst: 'pass' | 'warn' | 'fail';
  contentSha256: string;
  restoredFrom: number | null;
  authorId: string;
  reviewerId: string | null;
  createdAt: Date;
  updatedAt: Date;
  submittedAt: Date | null;
  decidedAt: Date | null;
  publishedAt: Date | null;
}

const col = (type: ColumnType, name?: string, nullable = false) => ({ type, ...(name ? { name } : {}), nullable });

export const RevisionEntity = new EntitySchema<RevisionRow>({
  name: 'Revision',
  tableName: 'revisions',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    entryId: col('int', 'entry_id'),
    number: col('int'),
    state: col('varchar'),
    lockVersion: col('int', 'lock_version'),
    name: col('varchar'),
    synonyms: col('jsonb'),
    formula: col('varchar'),
    nominalMass: col('int', 'nominal_mass'),
    monoisotopicMass: col('double precision', 'monoisotopic_mass'),
    structure: col('text', undefined, true),
    structureFormat: col('varchar', 'structure_format', true),
    casRn: col('varchar', 'cas_rn', true),
    peaks: col('jsonb'),
    peakCount: col('int', 'peak_count'),
    basePeakMz: col('double precision', 'base_peak_mz'),
    conditions: col('jsonb'),
    retentionIndex: col('double precision', 'retention_index', true),
    retentionIndexColumn: col('varchar', 'retention_index_column', true),
    sampleNotes: col('text', 'sample_notes'),
    changeNote: col('text', 'change_note'),
    simulated: col('boolean'),
    checks: col('jsonb'),
    checksWorst: col('varchar', 'checks_worst'),
    contentSha256: col('varchar', 'content_sha256'),
    restoredFrom: col('int', 'restored_from', true),
    authorId: col('uuid', 'author_id'),
    reviewerId: col('uuid', 'reviewer_id', true),
    createdAt: col('timestamptz', 'created_at'),
    updatedAt: col('timestamptz', 'updated_at'),
    submittedAt: col('timestamptz', 'submitted_at', true),
    decidedAt: col('timestamptz', 'decided_at', true),
    publishedAt: col('timestamptz', 'published_at', true),
  },
});
