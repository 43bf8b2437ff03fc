import { EntitySchema } from 'typeorm';

/** One compound's reference spectrum under stated conditions; its accession never changes. */
export interface EntryRow {
  id: number;
  accession: string;
  createdAt: Date;
  createdBy: string;
  withdrawnAt: Date | null;
  withdrawnReason: string | null;
}

export const EntryEntity = new EntitySchema<EntryRow>({
  name: 'Entry',
  tableName: 'entries',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    accession: { type: 'varchar', unique: true },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
    createdBy: { type: 'uuid', name: 'created_by' },
    withdrawnAt: { type: 'timestamptz', name: 'withdrawn_at', nullable: true },
    withdrawnReason: { type: 'text', name: 'withdrawn_reason', nullable: true },
  },
});
