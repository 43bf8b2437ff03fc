import type { DataSource } from 'typeorm';
import type { z } from 'zod';
import type { ListEntriesQuery } from './entries.schemas';

export interface EntryListItem {
  accession: string;
  revision: number;
  state: string;
  name: string;
  formula: string;
  nominalMass: number;
  basePeakMz: number;
  peakCount: number;
  retentionIndex: number | null;
  author: string;
  updatedAt: string;
  simulated: boolean;
}

/** Entries by their current public revision, in accession order, with a cursor for the next page. */
export async function listEntries(ds: DataSource, query: z.infer<typeof ListEntriesQuery>) {
  const params: unknown[] = [];
  const where: string[] = [];
  const add = (sql: string, value: unknown) => {
    params.push(value);
    where.push(sql.replace('?', `$${params.length}`));
  };
  where.push(query.status === 'any' ? `r.state IN ('published', 'withdrawn')` : `r.state = '${query.status}'`);
  if (query.q) add(`r.name ILIKE ?`, `%${query.q}%`);
  if (query.formula) add(`r.formula = ?`, query.formula);
  if (query.minMass !== undefined) add(`r.nominal_mass >= ?`, query.minMass);
  if (query.maxMass !== undefined) add(`r.nominal_mass <= ?`, query.maxMass);
  if (query.cursor) add(`e.accession > ?`, query.cursor);
  params.push(query.limit + 1);
  const rows: (Omit<EntryListItem, 'updatedAt'> & { updatedAt: Date })[] = await ds.query(
    `SELECT e.accession, r.number AS revision, r.state, r.name, r.formula, r.nominal_mass AS "nominalMass",
            r.base_peak_mz AS "basePeakMz", r.peak_count AS "peakCount", r.retention_index AS "retentionIndex",
            u.display_name AS author, r.updated_at AS "updatedAt", r.simulated
       FROM entries e JOIN revisions r ON r.entry_id = e.id JOIN users u ON u.id = r.author_id
      WHERE ${where.join(' AND ')}
      ORDER BY e.accession LIMIT $${params.length}`,
    params,
  );
  const page = rows.slice(0, query.limit);
  return {
    entries: page.map((r) => ({ ...r, updatedAt: r.updatedAt.toISOString() })),
    nextCursor: rows.length > query.limit ? page.at(-1)!.accession : null,
  };
}
