import { createDataSource } from '../db/data-source';
import { TEST_DATABASE_URL } from './test-database';

/** Brings the test database to the latest migration once per run. */
export default async function setup(): Promise<void> {
  const ds = createDataSource(TEST_DATABASE_URL);
  try {
    await ds.initialize();
  } catch (err) {
    throw new Error(
      `The API tests need the test PostgreSQL cluster at ${TEST_DATABASE_URL}. Run them through \`npm test\`, ` +
        `which starts it (scripts/test.sh). Cause: ${(err as Error).message}`,
      { cause: err },
    );
  }
  await ds.runMigrations({ transaction: 'each' });
  await ds.destroy();
}
