import { randomBytes } from 'node:crypto';
import pg from 'pg';
import { createDataSource } from '../../db/data-source';
import { TEST_DATABASE_URL } from '../../testing/test-database';

export interface ScratchDatabase {
  name: string;
  url: string;
  /** Drops the database, ending any connection still open to it. */
  drop(): Promise<void>;
}

/** Runs one statement on the test cluster's `postgres` database (for CREATE/DROP DATABASE). */
export async function onTestCluster(sql: string): Promise<void> {
  const admin = new URL(TEST_DATABASE_URL);
  admin.pathname = '/postgres';
  const client = new pg.Client({ connectionString: admin.href });
  await client.connect();
  try {
    await client.query(sql);
  } finally {
    await client.end();
  }
}

/**
 * A database of its own on the test cluster, migrated to the latest schema, for tests that
 * destroy data (backups) and so must never share `ionfolio_test` with the other API tests.
 */
export async function createScratchDatabase(prefix: string): Promise<ScratchDatabase> {
  const name = `${prefix}_${randomBytes(4).toString('hex')}`;
  if (!/^[a-z0-9_]+$/.test(name)) throw new Error(`not a safe database name: ${name}`);
  await onTestCluster(`CREATE DATABASE "${name}"`);
  const url = new URL(TEST_DATABASE_URL);
  url.pathname = `/${name}`;
  const ds = createDataSource(url.href);
  await ds.initialize();
  try {
    await ds.runMigrations({ transaction: 'each' });
  } finally {
    await ds.destroy();
  }
  return {
    name,
    url: url.href,
    drop: () => onTestCluster(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`),
  };
}
