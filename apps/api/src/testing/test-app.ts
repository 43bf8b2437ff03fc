import { randomBytes } from 'node:crypto';
import pg from 'pg';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { startFakeOAuth, startFakeSmtp, type FakeOAuth, type FakeSmtp } from '@ionfolio/fakes';
import { createApp } from '../app';
import { loadEnv, type Env } from '../config/env';
import { createDataSource } from '../db/data-source';
import { createLogger } from '../shared/logger';
import type { Role } from '../modules/users/user.entity';
import { TEST_DATABASE_URL } from './test-database';

export interface TestContext {
  app: ReturnType<typeof createApp>;
  env: Env;
  ds: ReturnType<typeof createDataSource>;
  oauth: FakeOAuth;
  smtp: FakeSmtp;
  close(): Promise<void>;
}

/**
 * The real app against the test database, with sign-in going to the local OAuth stand-in and mail
 * to the local SMTP fake, both on free ports.
 */
export async function createTestContext(overrides: Record<string, string> = {}): Promise<TestContext> {
  const smtp = await startFakeSmtp();
  const oauth = await startFakeOAuth({ mailbox: smtp.messages });
  const env = loadEnv({
    NODE_ENV: 'test',
    DATABASE_URL: TEST_DATABASE_URL,
    PUBLIC_URL: 'http://127.0.0.1:8080',
    SESSION_SECRET: 'test-session-secret-0123456789',
    GITHUB_CLIENT_ID: 'ionfolio-test-client',
    GITHUB_CLIENT_SECRET: 'ionfolio-test-secret',
    GITHUB_AUTHORIZATION_URL: `${oauth.url}/login/oauth/authorize`,
    GITHUB_TOKEN_URL: `${oauth.url}/login/oauth/access_token`,
    GITHUB_PROFILE_URL: `${oauth.url}/api/user`,
    GITHUB_EMAILS_URL: `${oauth.url}/api/user/emails`,
    AUTH_LOCAL_STAND_IN: 'true',
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(smtp.port),
    WEB_DIST: '/nonexistent',
    LOG_LEVEL: 'silent',
    ...overrides,
  });
  const ds = createDataSource(env.DATABASE_URL);
  await ds.initialize();
  const sessionPool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 2 });
  // An idle client that the server drops (a restart) is reported here; the pool replaces it. Unheard, it would crash the run.
  sessionPool.on('error', () => undefined);
  const app = createApp({ env, dataSource: ds, logger: createLogger('silent'), sessionPool });
  return {
    app,
    env,
    ds,
    oauth,
    smtp,
    async close() {
      await sessionPool.end();
      await ds.destroy();
      await oauth.close();
      await smtp.close();
    },
  };
}

/** A login nobody else in this run uses, so each test makes its own rows. */
export const uniqueLogin = (prefix = 'user') => `${prefix}-${randomBytes(4).toString('hex')}`;

/**
 * Signs `agent` in through the whole OAuth flow: the app's redirect to the provider, the
 * provider's sign-in form, the callback with its code, the token exchange and the profile fetch.
 * `agent` may also be bound to the URL of a spawned API process that uses `ctx.oauth`.
 */
export async function signIn(ctx: Pick<TestContext, 'oauth'>, agent: TestAgent, login: string): Promise<void> {
  const start = await agent.get('/auth/github?returnTo=/identify').expect(302);
  const authorize = new URL(start.headers.location ?? '');
  if (!authorize.href.startsWith(ctx.oauth.url)) throw new Error(`sign-in went to ${authorize.href}`);
  const form = new URLSearchParams(authorize.searchParams);
  form.set('login', login);
  const granted = await fetch(`${ctx.oauth.url}/login/oauth/authorize`, {
    method: 'POST',
    body: form,
    redirect: 'manual',
  });
  const callback = new URL(granted.headers.get('location') ?? '');
  const back = await agent.get(callback.pathname + callback.search);
  if (back.status !== 302 || back.headers.location !== '/identify') {
    throw new Error(`callback answered ${back.status} → ${String(back.headers.location)}`);
  }
}

/** Signs a fresh user in and gives them `role` directly in the database (test set-up only). */
export async function signInAs(ctx: TestContext, role: Role): Promise<{ agent: TestAgent; login: string; id: string }> {
  const agent = request.agent(ctx.app);
  const login = uniqueLogin(role);
  await signIn(ctx, agent, login);
  await ctx.ds.query(`UPDATE users SET role = $2 WHERE login = $1`, [login, role]);
  const rows: { id: string }[] = await ctx.ds.query(`SELECT id FROM users WHERE login = $1`, [login]);
  return { agent, login, id: rows[0]!.id };
}
