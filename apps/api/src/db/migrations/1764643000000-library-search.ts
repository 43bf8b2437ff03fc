import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Rows the library list may show: current (published) or retired (withdrawn) revisions. */
const PUBLIC_ROWS = `state IN ('published', 'withdrawn')`;

/**
 * Indexes for the library list (name with typo tolerance, formula, mass, sort orders with keyset
 * paging), a helper that reads one element's count from a Hill formula, and the structure keys
 * (openchemlib idcode and 512-bit substructure index) kept per revision for structure search.
 */
export class LibrarySearch1764643000000 implements MigrationInterface {
  name = 'LibrarySearch1764643000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE EXTENSION IF NOT EXISTS pg_trgm`);
    // Name and synonyms as one lower-case text, the thing `q` is matched against (ILIKE and the
    // word-similarity operator `<%`, both served by the trigram GIN index).
    await q.query(`
      CREATE FUNCTION revision_search_text(name varchar, synonyms jsonb) RETURNS text
      LANGUAGE sql IMMUTABLE PARALLEL SAFE AS $$
        SELECT lower(name || ' ' || coalesce((SELECT string_agg(s, ' ') FROM jsonb_array_elements_text(synonyms) AS s), ''))
      $$`);
    await q.query(
      `CREATE INDEX revisions_search_text_trgm ON revisions USING gin (revision_search_text(name, synonyms) gin_trgm_ops) WHERE ${PUBLIC_ROWS}`,
    );
    // Atoms of one element in a formula written in Hill order ('C6H5Cl', 'Cl' → 1, 'Br' → 0).
    // An element symbol is an upper-case letter plus an optional lower-case one; the lookahead keeps
    // 'C' from matching the start of 'Cl'.
    await q.query(`
      CREATE FUNCTION formula_count(formula varchar, symbol text) RETURNS int
      LANGUAGE sql IMMUTABLE PARALLEL SAFE AS $$
        SELECT CASE WHEN m IS NULL THEN 0 WHEN m = '' THEN 1 ELSE m::int END
          FROM (SELECT substring(formula FROM symbol || '([0-9]*)(?![a-z])') AS m) AS t
      $$`);
    await q.query(`CREATE INDEX revisions_public_formula_idx ON revisions (formula) WHERE ${PUBLIC_ROWS}`);
    await q.query(`CREATE INDEX revisions_public_name_idx ON revisions (name, entry_id) WHERE ${PUBLIC_ROWS}`);
    await q.query(`CREATE INDEX revisions_public_mass_idx ON revisions (nominal_mass, entry_id) WHERE ${PUBLIC_ROWS}`);
    await q.query(`CREATE INDEX revisions_public_updated_idx ON revisions (updated_at, entry_id) WHERE ${PUBLIC_ROWS}`);
    await q.query(`CREATE INDEX revisions_author_idx ON revisions (author_id)`);
    await q.query(`CREATE INDEX revisions_published_month_idx ON revisions (published_at) WHERE published_at IS NOT NULL`);
    await q.query(`CREATE INDEX edition_revisions_revision_idx ON edition_revisions (revision_id)`);
    // One row per revision that has a structure; content_sha256 tells whether it still describes
    // that revision's content (revisions are immutable once submitted, but drafts change).
    await q.query(`
      CREATE TABLE structure_keys (
        revision_id uuid PRIMARY KEY REFERENCES revisions(id) ON DELETE CASCADE,
        content_sha256 varchar NOT NULL,
        idcode text,
        ss_index bit(512),
        error text,
        computed_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX structure_keys_idcode_idx ON structure_keys (idcode)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE structure_keys`);
    for (const index of [
      'edition_revisions_revision_idx',
      'revisions_published_month_idx',
      'revisions_author_idx',
      'revisions_public_updated_idx',
      'revisions_public_mass_idx',
      'revisions_public_name_idx',
      'revisions_public_formula_idx',
      'revisions_search_text_trgm',
    ]) {
      await q.query(`DROP INDEX ${index}`);
    }
    await q.query(`DROP FUNCTION formula_count`);
    await q.query(`DROP FUNCTION revision_search_text`);
  }
}
