import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Access keys for tools (only a SHA-256 hash and a short visible prefix are kept) and batch identify
 * jobs, kept in PostgreSQL so that a job outlives a page reload and can be read by any API process.
 */
export class AccessKeys1764642000000 implements MigrationInterface {
  name = 'AccessKeys1764642000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE access_keys (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        owner_id uuid NOT NULL REFERENCES users(id),
        name varchar NOT NULL CHECK (length(name) BETWEEN 1 AND 100),
        prefix varchar NOT NULL,
        secret_sha256 varchar NOT NULL UNIQUE,
        scopes jsonb NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        last_used_at timestamptz,
        revoked_at timestamptz
      )`);
    await q.query(`CREATE INDEX access_keys_owner_idx ON access_keys (owner_id, created_at)`);
    await q.query(`
      CREATE TABLE identify_jobs (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        owner_id uuid NOT NULL REFERENCES users(id),
        status varchar NOT NULL DEFAULT 'queued' CHECK (status IN ('queued', 'running', 'done', 'failed')),
        options jsonb NOT NULL,
        spectra jsonb NOT NULL,
        results jsonb NOT NULL DEFAULT '[]',
        total int NOT NULL,
        done int NOT NULL DEFAULT 0,
        file_name varchar,
        error text,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        finished_at timestamptz
      )`);
    await q.query(`CREATE INDEX identify_jobs_owner_idx ON identify_jobs (owner_id, created_at)`);
    await q.query(`CREATE INDEX identify_jobs_open_idx ON identify_jobs (updated_at) WHERE status IN ('queued', 'running')`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE identify_jobs`);
    await q.query(`DROP TABLE access_keys`);
  }
}
