import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Users with roles, PostgreSQL-backed sessions, the append-only audit log and the mail outbox. */
export class Foundation1764640000000 implements MigrationInterface {
  name = 'Foundation1764640000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE EXTENSION IF NOT EXISTS pgcrypto`);
    await q.query(`
      CREATE TABLE users (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        github_id varchar NOT NULL UNIQUE,
        login varchar NOT NULL UNIQUE,
        display_name varchar NOT NULL,
        email varchar,
        role varchar NOT NULL DEFAULT 'reader'
          CHECK (role IN ('reader', 'contributor', 'curator', 'admin')),
        created_at timestamptz NOT NULL DEFAULT now(),
        last_sign_in_at timestamptz
      )`);
    // The layout connect-pg-simple expects (its table.sql), created here so that no library
    // creates tables behind the migrations' back.
    await q.query(`
      CREATE TABLE session (
        sid varchar NOT NULL PRIMARY KEY,
        sess json NOT NULL,
        expire timestamp(6) NOT NULL
      )`);
    await q.query(`CREATE INDEX session_expire_idx ON session (expire)`);
    await q.query(`
      CREATE TABLE audit_events (
        id bigserial PRIMARY KEY,
        occurred_at timestamptz NOT NULL DEFAULT now(),
        actor_id uuid REFERENCES users(id),
        action varchar NOT NULL,
        subject_type varchar NOT NULL,
        subject_id varchar NOT NULL,
        data jsonb NOT NULL DEFAULT '{}'
      )`);
    await q.query(`CREATE INDEX audit_events_subject_idx ON audit_events (subject_type, subject_id)`);
    // Append-only: the database itself refuses to change or remove an audit line.
    await q.query(`
      CREATE FUNCTION audit_events_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        RAISE EXCEPTION 'audit_events is append-only';
      END $$`);
    await q.query(`
      CREATE TRIGGER audit_events_no_change BEFORE UPDATE OR DELETE ON audit_events
      FOR EACH ROW EXECUTE FUNCTION audit_events_append_only()`);
    await q.query(`
      CREATE TABLE mail_messages (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        created_at timestamptz NOT NULL DEFAULT now(),
        to_address varchar NOT NULL,
        subject varchar NOT NULL,
        body_text text NOT NULL,
        status varchar NOT NULL DEFAULT 'pending' CHECK (status IN ('pending', 'sent', 'failed')),
        attempts int NOT NULL DEFAULT 0,
        last_error text,
        next_attempt_at timestamptz NOT NULL DEFAULT now(),
        sent_at timestamptz
      )`);
    await q.query(`CREATE INDEX mail_messages_pending_idx ON mail_messages (next_attempt_at) WHERE status = 'pending'`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE mail_messages`);
    await q.query(`DROP TABLE audit_events`);
    await q.query(`DROP FUNCTION audit_events_append_only`);
    await q.query(`DROP TABLE session`);
    await q.query(`DROP TABLE users`);
  }
}
