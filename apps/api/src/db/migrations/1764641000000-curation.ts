import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Entries, their immutable revisions, review comments and editions. The database itself keeps
 * what the product promises: a revision's content cannot change once it left the author's hands,
 * a published or superseded revision cannot be deleted, an entry has at most one published and at
 * most one open revision.
 */
export class Curation1764641000000 implements MigrationInterface {
  name = 'Curation1764641000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE SEQUENCE entry_accession_seq START 1`);
    await q.query(`
      CREATE TABLE entries (
        id serial PRIMARY KEY,
        accession varchar NOT NULL UNIQUE
          DEFAULT ('IF-' || lpad(nextval('entry_accession_seq')::text, 6, '0')),
        created_at timestamptz NOT NULL DEFAULT now(),
        created_by uuid NOT NULL REFERENCES users(id),
        withdrawn_at timestamptz,
        withdrawn_reason text
      )`);
    await q.query(`
      CREATE TABLE revisions (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        entry_id int NOT NULL REFERENCES entries(id),
        number int NOT NULL CHECK (number >= 1),
        state varchar NOT NULL CHECK (state IN ('draft', 'in_review', 'needs_changes', 'published', 'superseded', 'withdrawn')),
        lock_version int NOT NULL DEFAULT 1,
        name varchar NOT NULL,
        synonyms jsonb NOT NULL DEFAULT '[]',
        formula varchar NOT NULL,
        nominal_mass int NOT NULL,
        monoisotopic_mass double precision NOT NULL,
        structure text,
        structure_format varchar CHECK (structure_format IN ('smiles', 'molfile')),
        cas_rn varchar,
        peaks jsonb NOT NULL,
        peak_count int NOT NULL,
        base_peak_mz double precision NOT NULL,
        conditions jsonb NOT NULL DEFAULT '{}',
        retention_index double precision,
        retention_index_column varchar CHECK (retention_index_column IN ('non-polar', 'semi-polar', 'polar')),
        sample_notes text NOT NULL DEFAULT '',
        change_note text NOT NULL DEFAULT '',
        simulated boolean NOT NULL DEFAULT false,
        checks jsonb NOT NULL DEFAULT '[]',
        checks_worst varchar NOT NULL DEFAULT 'pass' CHECK (checks_worst IN ('pass', 'warn', 'fail')),
        content_sha256 varchar NOT NULL,
        restored_from int,
        author_id uuid NOT NULL REFERENCES users(id),
        reviewer_id uuid REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        submitted_at timestamptz,
        decided_at timestamptz,
        published_at timestamptz,
        UNIQUE (entry_id, number)
      )`);
    await q.query(`CREATE UNIQUE INDEX revisions_one_published ON revisions (entry_id) WHERE state = 'published'`);
    await q.query(
      `CREATE UNIQUE INDEX revisions_one_open ON revisions (entry_id) WHERE state IN ('draft', 'in_review', 'needs_changes')`,
    );
    await q.query(`CREATE INDEX revisions_state_idx ON revisions (state, submitted_at)`);
    await q.query(`CREATE INDEX revisions_nominal_mass_idx ON revisions (nominal_mass)`);
    // Content may change only while the author holds the revision (draft, needs_changes).
    await q.query(`
      CREATE FUNCTION revisions_guard() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF TG_OP = 'DELETE' THEN
          IF OLD.state IN ('published', 'superseded', 'withdrawn', 'in_review') THEN
            RAISE EXCEPTION 'revision % r% is %: it cannot be deleted', OLD.entry_id, OLD.number, OLD.state;
          END IF;
          RETURN OLD;
        END IF;
        IF OLD.state NOT IN ('draft', 'needs_changes') AND (
             NEW.name IS DISTINCT FROM OLD.name OR NEW.synonyms IS DISTINCT FROM OLD.synonyms
          OR NEW.formula IS DISTINCT FROM OLD.formula OR NEW.structure IS DISTINCT FROM OLD.structure
          OR NEW.cas_rn IS DISTINCT FROM OLD.cas_rn OR NEW.peaks IS DISTINCT FROM OLD.peaks
          OR NEW.conditions IS DISTINCT FROM OLD.conditions OR NEW.retention_index IS DISTINCT FROM OLD.retention_index
          OR NEW.retention_index_column IS DISTINCT FROM OLD.retention_index_column
          OR NEW.sample_notes IS DISTINCT FROM OLD.sample_notes OR NEW.change_note IS DISTINCT FROM OLD.change_note
          OR NEW.content_sha256 IS DISTINCT FROM OLD.content_sha256 OR NEW.number IS DISTINCT FROM OLD.number
          OR NEW.entry_id IS DISTINCT FROM OLD.entry_id OR NEW.author_id IS DISTINCT FROM OLD.author_id) THEN
          RAISE EXCEPTION 'revision % r% is %: its content is frozen', OLD.entry_id, OLD.number, OLD.state;
        END IF;
        IF OLD.state IN ('superseded', 'withdrawn') AND NEW.state IS DISTINCT FROM OLD.state THEN
          RAISE EXCEPTION 'revision % r% is %: final', OLD.entry_id, OLD.number, OLD.state;
        END IF;
        RETURN NEW;
      END $$`);
    await q.query(`
      CREATE TRIGGER revisions_guard BEFORE UPDATE OR DELETE ON revisions
      FOR EACH ROW EXECUTE FUNCTION revisions_guard()`);
    await q.query(`
      CREATE TABLE review_comments (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        revision_id uuid NOT NULL REFERENCES revisions(id),
        parent_id uuid REFERENCES review_comments(id),
        author_id uuid NOT NULL REFERENCES users(id),
        body text NOT NULL CHECK (length(body) BETWEEN 1 AND 5000),
        kind varchar NOT NULL DEFAULT 'comment' CHECK (kind IN ('comment', 'decision')),
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX review_comments_revision_idx ON review_comments (revision_id, created_at)`);
    await q.query(`
      CREATE TABLE editions (
        id serial PRIMARY KEY,
        label varchar NOT NULL UNIQUE CHECK (label ~ '^[0-9A-Za-z][0-9A-Za-z._-]{0,31}$'),
        notes text NOT NULL DEFAULT '',
        revision_count int NOT NULL,
        created_by uuid NOT NULL REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`
      CREATE TABLE edition_revisions (
        edition_id int NOT NULL REFERENCES editions(id),
        revision_id uuid NOT NULL REFERENCES revisions(id),
        entry_id int NOT NULL REFERENCES entries(id),
        PRIMARY KEY (edition_id, revision_id),
        UNIQUE (edition_id, entry_id)
      )`);
    // Editions are frozen: no change, no removal.
    await q.query(`
      CREATE FUNCTION frozen_table() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        RAISE EXCEPTION '% is frozen: rows cannot be changed or removed', TG_TABLE_NAME;
      END $$`);
    await q.query(`CREATE TRIGGER editions_frozen BEFORE UPDATE OR DELETE ON editions FOR EACH ROW EXECUTE FUNCTION frozen_table()`);
    await q.query(
      `CREATE TRIGGER edition_revisions_frozen BEFORE UPDATE OR DELETE ON edition_revisions FOR EACH ROW EXECUTE FUNCTION frozen_table()`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE edition_revisions`);
    await q.query(`DROP TABLE editions`);
    await q.query(`DROP FUNCTION frozen_table`);
    await q.query(`DROP TABLE review_comments`);
    await q.query(`DROP TABLE revisions`);
    await q.query(`DROP FUNCTION revisions_guard`);
    await q.query(`DROP TABLE entries`);
    await q.query(`DROP SEQUENCE entry_accession_seq`);
  }
}
