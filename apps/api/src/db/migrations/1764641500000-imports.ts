import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Bulk imports of multi-block JCAMP-DX files: one job row with its per-block results. */
export class Imports1764641500000 implements MigrationInterface {
  name = 'Imports1764641500000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE import_jobs (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        created_by uuid NOT NULL REFERENCES users(id),
        file_name varchar NOT NULL,
        target varchar NOT NULL CHECK (target IN ('draft', 'in_review')),
        status varchar NOT NULL CHECK (status IN ('running', 'done', 'failed')),
        total int NOT NULL,
        done int NOT NULL DEFAULT 0,
        imported int NOT NULL DEFAULT 0,
        rejected int NOT NULL DEFAULT 0,
        results jsonb NOT NULL DEFAULT '[]',
        error text,
        created_at timestamptz NOT NULL DEFAULT now(),
        finished_at timestamptz
      )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE import_jobs`);
  }
}
