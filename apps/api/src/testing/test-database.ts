/** The test cluster that `npm test` starts (scripts/test.sh); never the development database. */
export const TEST_DATABASE_URL =
  process.env.TEST_DATABASE_URL ?? 'postgres://ionfolio@127.0.0.1:54330/ionfolio_test';
