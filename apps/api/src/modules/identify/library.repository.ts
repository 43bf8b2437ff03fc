import type { DataSource } from 'typeorm';
import type { LibraryRevision } from './library-index';

const COLUMNS = `
  e.accession, r.number AS revision, r.name, r.formula, r.nominal_mass AS "nominalMass", r.peaks,
  r.retention_index AS "retentionIndex", r.retention_index_column AS "retentionIndexColumn"`;

/** Every published revision of an entry that is not withdrawn. */
export function loadPublishedRevisions(ds: DataSource): Promise<LibraryRevision[]> {
  return ds.query(
    `SELECT ${COLUMNS} FROM revisions r JOIN entries e ON e.id = r.entry_id
     WHERE r.state = 'published' AND e.withdrawn_at IS NULL ORDER BY e.id`,
  );
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
