import { z } from 'zod';

const bool = z
  .enum(['true', 'false', '1', '0'])
  .transform((v) => v === 'true' || v === '1');

/** Sign-in requests per client address and minute when SIGN_IN_RATE_PER_MINUTE is unset. */
export const SIGN_IN_RATE_DEFAULT = 30;
const SIGN_IN_RATE_TEST_DEFAULT = 600;

// Worker threads of the search pool (identify/search-pool.ts): default 2, one per core of the machine
// the figures in docs/benchmarks.md come from; 0 searches and reads on the main thread. Empty counts
// as unset.
const SEARCH_WORKERS_MESSAGE = 'must be an integer from 0 to 16';
const SearchWorkers = z.preprocess(
  (v) => (v === '' ? undefined : v),
  z.coerce.number({ error: SEARCH_WORKERS_MESSAGE }).int(SEARCH_WORKERS_MESSAGE).min(0, SEARCH_WORKERS_MESSAGE).max(16, SEARCH_WORKERS_MESSAGE).default(2),
);

const EnvSchema = z
  .object({
    NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
    HOST: z.string().min(1).default('127.0.0.1'),
    PORT: z.coerce.number().int().min(0).max(65535).default(8080),
    PUBLIC_URL: z.url().default('http://127.0.0.1:8080'),
    DATABASE_URL: z.string().regex(/^postgres(ql)?:\/\//, 'must be a postgres:// URL'),
    SESSION_SECRET: z.string().min(16, 'must be at least 16 characters'),
    GITHUB_CLIENT_ID: z.string().min(1),
    GITHUB_CLIENT_SECRET: z.string().min(1),
    GITHUB_AUTHORIZATION_URL: z.url().default('https://github.com/login/oauth/authorize'),
    GITHUB_TOKEN_URL: z.url().default('https://github.com/login/oauth/access_token'),
    GITHUB_PROFILE_URL: z.url().default('https://api.github.com/user'),
    GITHUB_EMAILS_URL: z.url().default('https://api.github.com/user/emails'),
    AUTH_LOCAL_STAND_IN: bool.default(false),
    SMTP_HOST: z.string().min(1).default('127.0.0.1'),
    SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(25),
    SMTP_SECURE: bool.default(false),
    SMTP_USER: z.string().optional(),
    SMTP_PASSWORD: z.string().optional(),
    MAIL_FROM: z.string().min(3).default('Ionfolio <ionfolio@localhost>'),
    FIRST_ADMIN_LOGIN: z.string().min(1).optional(),
    WEB_DIST: z.string().default('dist/web'),
    LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
    // Identify calls (single, batch submission, readings) per caller and minute, per API process.
    IDENTIFY_RATE_PER_MINUTE: z.coerce.number().int().min(1).max(100000).default(120),
    // Calls a caller may make at once after being idle (the bucket size); defaults to the rate.
    IDENTIFY_RATE_BURST: z.coerce.number().int().min(1).max(100000).optional(),
    IDENTIFY_BATCH_MAX_SPECTRA: z.coerce.number().int().min(1).max(100000).default(1000),
    // Sign-in requests (/auth/github and its callback) per client address and minute, per API process.
    // Unset: 30, or 600 when NODE_ENV=test (test suites sign dozens of users in from 127.0.0.1).
    SIGN_IN_RATE_PER_MINUTE: z.coerce.number().int().min(1).max(100000).optional(),
    IONFOLIO_SEARCH_WORKERS: SearchWorkers,
  })
  .superRefine((env, ctx) => {
    if (env.NODE_ENV === 'production' && env.SESSION_SECRET.startsWith('dev-only')) {
      ctx.addIssue({ code: 'custom', path: ['SESSION_SECRET'], message: 'set a real secret in production' });
    }
  })
  .transform((env) => ({
    ...env,
    SIGN_IN_RATE_PER_MINUTE: env.SIGN_IN_RATE_PER_MINUTE ?? (env.NODE_ENV === 'test' ? SIGN_IN_RATE_TEST_DEFAULT : SIGN_IN_RATE_DEFAULT),
  }));

export type Env = z.infer<typeof EnvSchema>;

/**
 * Parses the environment once at start-up. A bad or missing key stops the process with one line
 * per key, naming it, instead of failing later somewhere far away.
 */
export function loadEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = EnvSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.') || '(env)'}: ${i.message}`);
    throw new Error(`Invalid configuration:\n${lines.join('\n')}\nSee .env.example for every key.`);
  }
  return parsed.data;
}

/** For command-line entries (migrate, seed) that need only the database. */
export function loadDatabaseUrl(source: NodeJS.ProcessEnv = process.env): string {
  const parsed = z.object({ DATABASE_URL: z.string().regex(/^postgres(ql)?:\/\//) }).safeParse(source);
  if (!parsed.success) throw new Error('Invalid configuration:\n  DATABASE_URL: must be a postgres:// URL');
  return parsed.data.DATABASE_URL;
}
