import { describe, expect, it } from 'vitest';
import { loadEnv } from './env';

// The keys loadEnv requires, with placeholder values.
const base = {
  DATABASE_URL: 'postgres://ionfolio@127.0.0.1:5432/ionfolio',
  SESSION_SECRET: 'a-secret-of-enough-length',
  GITHUB_CLIENT_ID: 'client',
  GITHUB_CLIENT_SECRET: 'secret',
};

describe('IONFOLIO_SEARCH_WORKERS', () => {
  it('when unset or empty, is 2; when set, takes 0 to 16', () => {
    expect(loadEnv(base).IONFOLIO_SEARCH_WORKERS).toBe(2);
    expect(loadEnv({ ...base, IONFOLIO_SEARCH_WORKERS: '' }).IONFOLIO_SEARCH_WORKERS).toBe(2);
    expect(loadEnv({ ...base, IONFOLIO_SEARCH_WORKERS: '0' }).IONFOLIO_SEARCH_WORKERS).toBe(0);
    expect(loadEnv({ ...base, IONFOLIO_SEARCH_WORKERS: '3' }).IONFOLIO_SEARCH_WORKERS).toBe(3);
    expect(loadEnv({ ...base, IONFOLIO_SEARCH_WORKERS: '16' }).IONFOLIO_SEARCH_WORKERS).toBe(16);
  });

  it('when not an integer from 0 to 16, stops start-up with a line naming the key', () => {
    for (const value of ['two', '-1', '17', '1.5']) {
      expect(() => loadEnv({ ...base, IONFOLIO_SEARCH_WORKERS: value })).toThrow(
        /\n {2}IONFOLIO_SEARCH_WORKERS: must be an integer from 0 to 16\n/,
      );
    }
  });
});
