import type { DataSource } from 'typeorm';
import { AppError } from '../../shared/app-error';
import type { ListEntriesFilter, ListSortKey } from './entries.schemas';

export interface EntryListItem {
  accession: string;
  revision: number;
  state: string;
  name: string;
  synonyms: string[];
  formula: string;
  nominalMass: number;
  basePeakMz: number;
  peakCount: number;
  retentionIndex: number | null;
  /** Display name of the revision's author (as in the first version of this list). */
  author: string;
  /** Login of the revision's author, the value the `contributor` filter takes. */
  authorLogin: string;
  updatedAt: string;
  simulated: boolean;
}

type Order = 'asc' | 'desc';

/** What a page of the list is sorted by, and the SQL type its cursor value is cast back to. */
const SORT_SQL: Record<ListSortKey, { expr: string; cast: string }> = {
  accession: { expr: 'e.accession', cast: 'varchar' },
  name: { expr: 'r.name', cast: 'varchar' },
  nominalMass: { expr: 'r.nominal_mass', cast: 'int' },
  updatedAt: { expr: 'r.updated_at', cast: 'timestamptz' },
  // `$Q` becomes the placeholder of the lower-cased name.
  relevance: { expr: 'word_similarity($Q, revision_search_text(r.name, r.synonyms))', cast: 'real' },
};

interface Cursor {
  s: ListSortKey;
  o: Order;
  /** The sort value of the last row, as PostgreSQL wrote it (exact for timestamps and reals). */
  v: string;
  /** entry id of the last row: the tie-breaker for every sort but accession. */
  id: number;
}

const LEGACY_CURSOR = /^IF-\d{6}$/;

function encodeCursor(c: Cursor): string {
  return Buffer.from(JSON.stringify(c)).toString('base64url');
}

function decodeCursor(text: string, sort: ListSortKey, order: Order): Cursor {
  // The first version paged by accession with the accession itself as the cursor; it still works.
  if (LEGACY_CURSOR.test(text) && sort === 'accession' && order === 'asc') return { s: sort, o: order, v: text, id: 0 };
  let c: Partial<Cursor>;
  try {
    c = JSON.parse(Buffer.from(text, 'base64url').toString('utf8')) as Partial<Cursor>;
  } catch {
    throw badCursor();
  }
  if (c.s !== sort || c.o !== order || typeof c.v !== 'string' || typeof c.id !== 'number') throw badCursor();
  return c as Cursor;
}

const badCursor = () =>
  new AppError('VALIDATION', 400, 'Invalid request at cursor: it does not belong to this sort order; start again from the first page', {
    details: [{ path: 'cursor', message: 'does not belong to this sort order', code: 'custom' }],
  });

/** Escapes LIKE wildcards so a name with `%` or `_` matches itself. */
const likeEscape = (text: string) => text.replace(/[\\%_]/g, (ch) => `\\${ch}`);

export interface ListPlan {
  sort: ListSortKey;
  order: Order;
}

/** The sort a query asks for, with its defaults: by relevance when a name is given, else accession. */
export function listPlan(query: ListEntriesFilter): ListPlan {
  const sort = query.sort ?? (query.q ? 'relevance' : 'accession');
  return { sort, order: query.order ?? (sort === 'relevance' ? 'desc' : 'asc') };
}

/** Refuses an edition label that does not exist, rather than answering an empty list. */
async function assertEdition(ds: DataSource, label: string): Promise<void> {
  const rows: unknown[] = await ds.query(`SELECT 1 FROM editions WHERE label = $1`, [label]);
  if (rows.length === 0) throw new AppError('NOT_FOUND', 404, `Edition ${label} was not found`);
}

/**
 * One page of the list as SQL. `q` is always $1 (the relevance expression refers to it).
 *
 * Rows: with `edition`, that edition's member revisions (whatever they are now); otherwise each
 * entry's current public revision — `published`, or with status `withdrawn` the last withdrawn
 * revision of an entry that has no published one.
 *
 * EXPLAIN (ANALYZE) on 100,000 published revisions (entries-list.bench.ts, first page of 200):
 *   default:  Index Scan entries_accession_key → Index Scan revisions_one_published per row, stops at
 *             LIMIT (0.5 ms);
 *   q:        BitmapOr of two Bitmap Index Scans on revisions_search_text_trgm (LIKE and `%>`), then
 *             the few matches are ranked (5 ms for a misspelled name);
 *   formula:  Bitmap Index Scan on revisions_public_formula_idx (16 ms for 1,848 matches);
 *   ranges/elements: Bitmap Index Scan on revisions_element_counts_idx (`?&` of the elements that
 *             must be present), the ranges checked on those rows (32 ms);
 *   sort by name / mass / updatedAt: Index Scan on revisions_public_{name,mass,updated}_idx in
 *             order, the cursor as a row comparison on (value, entry_id).
 */
function pageSql(query: ListEntriesFilter, plan: ListPlan, cursor: Cursor | null, limit: number) {
  const lowered = query.q ? query.q.toLowerCase() : '';
  const params: unknown[] = [];
  const p = (value: unknown) => {
    params.push(value);
    return `$${params.length}`;
  };
  const qParam = lowered ? p(lowered) : 'NULL';
  const where: string[] = [];
  let editionJoin = '';
  if (query.edition) {
    editionJoin = `JOIN edition_revisions er ON er.revision_id = r.id JOIN editions ed ON ed.id = er.edition_id AND ed.label = ${p(query.edition)}`;
  } else if (query.status === 'published') {
    where.push(`r.state = 'published'`);
  } else {
    const lastWithdrawn = `(r.state = 'withdrawn' AND NOT EXISTS (SELECT 1 FROM revisions r2 WHERE r2.entry_id = r.entry_id
        AND (r2.state = 'published' OR (r2.state = 'withdrawn' AND r2.number > r.number))))`;
    where.push(query.status === 'withdrawn' ? lastWithdrawn : `(r.state = 'published' OR ${lastWithdrawn})`);
  }
  if (lowered) {
    const text = 'revision_search_text(r.name, r.synonyms)';
    where.push(`(${text} LIKE ${p(`%${likeEscape(lowered)}%`)} OR ${qParam} <% ${text})`);
  }
  // Element counts come from the stored column `element_counts` (PostgreSQL fills it from the
  // formula). Every element that must be present goes into one containment test, which the GIN
  // index answers; ranges are then checked on those rows only.
  const f = query.formula;
  const present = new Set<string>(query.elements ?? []);
  if (f?.kind === 'exact') where.push(`r.formula = ${p(f.formula)}`);
  if (f?.kind === 'ranges') {
    for (const range of f.ranges) {
      if (range.min >= 1) present.add(range.symbol);
      const count = `coalesce((r.element_counts ->> ${p(range.symbol)})::int, 0)`;
      where.push(range.max === null ? `${count} >= ${p(range.min)}` : `${count} BETWEEN ${p(range.min)} AND ${p(range.max)}`);
    }
  }
  if (present.size) where.push(`r.element_counts ?& ${p([...present])}::text[]`);
  if (query.minMass !== undefined) where.push(`r.nominal_mass >= ${p(query.minMass)}`);
  if (query.maxMass !== undefined) where.push(`r.nominal_mass <= ${p(query.maxMass)}`);
  if (query.hasRetentionIndex !== undefined) where.push(`r.retention_index IS ${query.hasRetentionIndex ? 'NOT ' : ''}NULL`);
  if (query.contributor) where.push(`u.login = ${p(query.contributor)}`);

  const { cast } = SORT_SQL[plan.sort];
  const expr = SORT_SQL[plan.sort].expr.replace('$Q', qParam);
  const dir = plan.order === 'asc' ? 'ASC' : 'DESC';
  const cmp = plan.order === 'asc' ? '>' : '<';
  let orderBy: string;
  if (plan.sort === 'accession') {
    orderBy = `e.accession ${dir}`;
    if (cursor) where.push(`e.accession ${cmp} ${p(cursor.v)}`);
  } else {
    orderBy = `${expr} ${dir}, r.entry_id ${dir}`;
    if (cursor) where.push(`(${expr}, r.entry_id) ${cmp} (${p(cursor.v)}::${cast}, ${p(cursor.id)}::int)`);
  }
  const sql = `
    SELECT e.accession, r.number AS revision, r.state, r.name, r.synonyms, r.formula, r.nominal_mass AS "nominalMass",
           r.base_peak_mz AS "basePeakMz", r.peak_count AS "peakCount", r.retention_index AS "retentionIndex",
           u.display_name AS author, u.login AS "authorLogin", r.updated_at AS "updatedAt", r.simulated,
           r.entry_id AS "entryId", (${expr})::text AS "sortValue"
      FROM revisions r JOIN entries e ON e.id = r.entry_id JOIN users u ON u.id = r.author_id ${editionJoin}
     WHERE ${where.length ? where.join(' AND ') : 'TRUE'}
     ORDER BY ${orderBy}
     LIMIT ${p(limit)}`;
  return { sql, params };
}

type Row = Omit<EntryListItem, 'updatedAt'> & { updatedAt: Date; entryId: number; sortValue: string };

async function fetchPage(ds: DataSource, query: ListEntriesFilter, plan: ListPlan, cursor: Cursor | null, limit: number) {
  const { sql, params } = pageSql(query, plan, cursor, limit + 1);
  const rows: Row[] = await ds.query(sql, params);
  const page = rows.slice(0, limit);
  const last = page.at(-1);
  const next: Cursor | null =
    rows.length > limit && last ? { s: plan.sort, o: plan.order, v: last.sortValue, id: last.entryId } : null;
  const entries: EntryListItem[] = page.map(({ entryId: _e, sortValue: _s, updatedAt, ...item }) => ({
    ...item,
    updatedAt: updatedAt.toISOString(),
  }));
  return { entries, next };
}

/** One page of the library list, with an opaque cursor for the page after it (null on the last page). */
export async function listEntries(ds: DataSource, query: ListEntriesFilter) {
  const plan = listPlan(query);
  if (query.edition) await assertEdition(ds, query.edition);
  const cursor = query.cursor ? decodeCursor(query.cursor, plan.sort, plan.order) : null;
  const { entries, next } = await fetchPage(ds, query, plan, cursor, query.limit);
  return { entries, nextCursor: next ? encodeCursor(next) : null, sort: plan.sort, order: plan.order };
}

/**
 * Every row of the list for these filters, a keyset page at a time (so memory stays flat however
 * large the library), for the CSV export. `limit` and `cursor` of the query are ignored.
 */
export async function* allEntries(ds: DataSource, query: ListEntriesFilter, batchSize = 1000): AsyncGenerator<EntryListItem[]> {
  const plan = listPlan(query);
  if (query.edition) await assertEdition(ds, query.edition);
  let cursor: Cursor | null = null;
  do {
    const { entries, next } = await fetchPage(ds, query, plan, cursor, batchSize);
    if (entries.length) yield entries;
    cursor = next;
  } while (cursor);
}
