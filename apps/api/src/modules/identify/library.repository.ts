import type { DataSource } from 'typeorm';
import type { LibraryRevision } from './library-index';

const COLUMNS = `
  e.accession, r.number AS revision, r.name, r.formula, r.nominal_mass AS "nominalMass", r.peaks,
  r.retention_index AS "retentionIndex", r.retention_index_column AS "retentionIndexColumn"`;

/** Rows per page when the whole published library is read: a page's parsed peaks stay a few MB. */
export const LIBRARY_PAGE_SIZE = 5000;

/** How many revisions and peaks the published library holds, so the index can reserve room once. */
export async function countPublished(ds: DataSource): Promise<{ spectra: number; peaks: number }> {
  const rows: { spectra: string; peaks: string | null }[] = await ds.query(
    `SELECT count(*) AS spectra, sum(jsonb_array_length(r.peaks)) AS peaks
       FROM revisions r JOIN entries e ON e.id = r.entry_id
      WHERE r.state = 'published' AND e.withdrawn_at IS NULL`,
  );
  return { spectra: Number(rows[0]?.spectra ?? 0), peaks: Number(rows[0]?.peaks ?? 0) };
}

/**
 * Every published revision of an entry that is not withdrawn, in pages by entry id (keyset on the
 * one-published-revision-per-entry index), so that the whole library is never parsed at once.
 */
export async function* publishedRevisionPages(ds: DataSource, pageSize = LIBRARY_PAGE_SIZE): AsyncGenerator<LibraryRevision[]> {
  let after = 0;
  for (;;) {
    const rows: (LibraryRevision & { entryId: number })[] = await ds.query(
      `SELECT r.entry_id AS "entryId", ${COLUMNS} FROM revisions r JOIN entries e ON e.id = r.entry_id
        WHERE r.state = 'published' AND e.withdrawn_at IS NULL AND r.entry_id > $1
        ORDER BY r.entry_id LIMIT $2`,
      [after, pageSize],
    );
    if (rows.length === 0) return;
    after = rows[rows.length - 1]!.entryId;
    yield rows;
    if (rows.length < pageSize) return;
  }
}

/** The entry's published revision, or undefined when it has none (draft only, or withdrawn). */
export async function loadPublishedRevision(ds: DataSource, accession: string): Promise<LibraryRevision | undefined> {
  const rows: LibraryRevision[] = await ds.query(
    `SELECT ${COLUMNS} FROM revisions r JOIN entries e ON e.id = r.entry_id
     WHERE e.accession = $1 AND r.state = 'published' AND e.withdrawn_at IS NULL`,
    [accession],
  );
  return rows[0];
}

/** The member revisions of a frozen edition, or undefined when no edition has this label. */
export async function loadEditionRevisions(ds: DataSource, label: string): Promise<LibraryRevision[] | undefined> {
  const editions: { id: number }[] = await ds.query(`SELECT id FROM editions WHERE label = $1`, [label]);
  if (editions.length === 0) return undefined;
  return ds.query(
    `SELECT ${COLUMNS} FROM edition_revisions er
       JOIN revisions r ON r.id = er.revision_id JOIN entries e ON e.id = er.entry_id
     WHERE er.edition_id = $1 ORDER BY e.id`,
    [editions[0]!.id],
  );
}
