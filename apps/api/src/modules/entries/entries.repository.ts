import type { EntityManager } from 'typeorm';
import { EntryEntity, type EntryRow } from './entry.entity';
import { RevisionEntity, type RevisionRow } from './revision.entity';

export const entriesRepository = (m: EntityManager) => m.getRepository<EntryRow>(EntryEntity);
export const revisionsRepository = (m: EntityManager) => m.getRepository<RevisionRow>(RevisionEntity);

export interface UserRef {
  id: string;
  login: string;
  displayName: string;
}

/** The people a list of revisions names, for their views. */
export async function loadUserRefs(m: EntityManager, ids: (string | null)[]): Promise<Map<string, UserRef>> {
  const wanted = [...new Set(ids.filter((x): x is string => !!x))];
  if (wanted.length === 0) return new Map();
  const rows: UserRef[] = await m.query(
    `SELECT id, login, display_name AS "displayName" FROM users WHERE id = ANY($1::uuid[])`,
    [wanted],
  );
  return new Map(rows.map((r) => [r.id, r]));
}

/** Locks an entry row for the rest of the transaction, so changes to one entry happen one at a time. */
export async function lockEntry(m: EntityManager, accession: string): Promise<EntryRow | null> {
  return entriesRepository(m).findOne({ where: { accession }, lock: { mode: 'pessimistic_write' } });
}

export async function curatorEmails(m: EntityManager, exceptUserId: string): Promise<string[]> {
  const rows: { email: string }[] = await m.query(
    `SELECT email FROM users WHERE role IN ('curator', 'admin') AND email IS NOT NULL AND id <> $1 ORDER BY login`,
    [exceptUserId],
  );
  return rows.map((r) => r.email);
}

export async function userEmail(m: EntityManager, userId: string): Promise<string | null> {
  const rows: { email: string | null }[] = await m.query(`SELECT email FROM users WHERE id = $1`, [userId]);
  return rows[0]?.email ?? null;
}
