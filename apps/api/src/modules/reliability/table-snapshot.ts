import type { DataSource } from 'typeorm';

/** Every ordinary table of the public schema, by name (the migrations table and sessions included). */
export async function listTables(ds: DataSource): Promise<string[]> {
  const rows: { name: string }[] = await ds.query(
    `SELECT table_name AS name FROM information_schema.tables
      WHERE table_schema = 'public' AND table_type = 'BASE TABLE' ORDER BY table_name`,
  );
  return rows.map((r) => r.name);
}

/** Rows per table: the counts a test compares before and after a request that must write nothing. */
export async function countRows(ds: DataSource): Promise<Record<string, number>> {
  const counts: Record<string, number> = {};
  for (const table of await listTables(ds)) {
    const rows: { n: number }[] = await ds.query(`SELECT count(*)::int AS n FROM "${table}"`);
    counts[table] = rows[0]?.n ?? -1;
  }
  return counts;
}

/**
 * Every row of every table as JSON, each table ordered by the text of its rows, plus the current
 * value of every sequence: two snapshots are equal only when the databases hold the same data.
 */
export async function snapshotTables(ds: DataSource): Promise<Record<string, unknown>> {
  const snapshot: Record<string, unknown> = {};
  for (const table of await listTables(ds)) {
    const rows: { rows: unknown[] }[] = await ds.query(
      `SELECT coalesce(json_agg(to_jsonb(t) ORDER BY t::text), '[]'::json) AS rows FROM "${table}" t`,
    );
    snapshot[table] = rows[0]?.rows ?? [];
  }
  const sequences: { name: string }[] = await ds.query(
    `SELECT sequencename AS name FROM pg_sequences WHERE schemaname = 'public' ORDER BY sequencename`,
  );
  for (const { name } of sequences) {
    const rows: { last_value: string | null; is_called: boolean }[] = await ds.query(`SELECT last_value, is_called FROM "${name}"`);
    snapshot[`sequence ${name}`] = rows[0];
  }
  return snapshot;
}
