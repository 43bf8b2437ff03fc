import { EntitySchema } from 'typeorm';

/** One append-only line of the audit log: who did what to which thing, with the facts as JSON. */
export interface AuditEventRow {
  id: string;
  occurredAt: Date;
  actorId: string | null;
  action: string;
  subjectType: string;
  subjectId: string;
  data: Record<string, unknown>;
}

export const AuditEventEntity = new EntitySchema<AuditEventRow>({
  name: 'AuditEvent',
  tableName: 'audit_events',
  columns: {
    id: { type: 'bigint', primary: true, generated: 'increment' },
    occurredAt: { type: 'timestamptz', name: 'occurred_at', createDate: true },
    actorId: { type: 'uuid', name: 'actor_id', nullable: true },
    action: { type: 'varchar' },
    subjectType: { type: 'varchar', name: 'subject_type' },
    subjectId: { type: 'varchar', name: 'subject_id' },
    data: { type: 'jsonb' },
  },
});
