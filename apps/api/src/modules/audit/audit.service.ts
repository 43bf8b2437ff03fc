import type { EntityManager } from 'typeorm';

/** Appends one audit line inside the caller's transaction, so it exists exactly when the change does. */
export async function recordAudit(
  m: EntityManager,
  event: { actorId: string | null; action: string; subjectType: string; subjectId: string; data?: Record<string, unknown> },
): Promise<void> {
  await m.query(
    `INSERT INTO audit_events (actor_id, action, subject_type, subject_id, data) VALUES ($1, $2, $3, $4, $5)`,
    [event.actorId, event.action, event.subjectType, event.subjectId, JSON.stringify(event.data ?? {})],
  );
}
