import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import type { TestProject } from 'vitest/node';

const ROOT = path.resolve(import.meta.dirname, '../..');
const TSX = path.join(ROOT, 'node_modules/.bin/tsx');
const DATABASE_URL = process.env.TEST_DATABASE_URL ?? 'postgres://ionfolio@127.0.0.1:54330/ionfolio_test';
// IONFOLIO_E2E_PORT moves the three ports together, for a second run beside this one.
const BASE_PORT = Number(process.env.IONFOLIO_E2E_PORT ?? 8190);
const PORTS = { api: BASE_PORT, oauth: BASE_PORT + 1, smtp: BASE_PORT - 8190 + 2591 };
const BASE_URL = `http://127.0.0.1:${PORTS.api}`;
const OAUTH_URL = `http://127.0.0.1:${PORTS.oauth}`;

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    oauthUrl: string;
  }
}

function run(args: string[], env: NodeJS.ProcessEnv): Promise<void> {
  return new Promise((resolve, reject) => {
    const p = spawn(TSX, args, { cwd: ROOT, env, stdio: 'inherit' });
    p.on('exit', (code) => (code === 0 ? resolve() : reject(new Error(`${args.join(' ')} exited ${code}`))));
  });
}

async function waitFor(url: string, timeoutMs: number): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    try {
      const r = await fetch(url);
      if (r.ok) return;
    } catch {
      // not up yet
    }
    await sleep(250);
  }
  throw new Error(`${url} did not answer within ${timeoutMs} ms`);
}

/**
 * Serves the built web app and the API on one port, with the OAuth stand-in and the fake SMTP
 * server beside it, against the test database with the demo users loaded.
 */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: 'test',
    HOST: '127.0.0.1',
    PORT: String(PORTS.api),
    PUBLIC_URL: BASE_URL,
    DATABASE_URL,
    SESSION_SECRET: 'e2e-session-secret-0123456789',
    FAKE_OAUTH_PORT: String(PORTS.oauth),
    FAKE_SMTP_PORT: String(PORTS.smtp),
    GITHUB_CLIENT_ID: 'ionfolio-e2e-client',
    GITHUB_CLIENT_SECRET: 'ionfolio-e2e-secret',
    GITHUB_AUTHORIZATION_URL: `${OAUTH_URL}/login/oauth/authorize`,
    GITHUB_TOKEN_URL: `${OAUTH_URL}/login/oauth/access_token`,
    GITHUB_PROFILE_URL: `${OAUTH_URL}/api/user`,
    GITHUB_EMAILS_URL: `${OAUTH_URL}/api/user/emails`,
    AUTH_LOCAL_STAND_IN: 'true',
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(PORTS.smtp),
    FIRST_ADMIN_LOGIN: 'ines.varga',
    WEB_DIST: path.join(ROOT, 'dist/web'),
    LOG_LEVEL: 'warn',
  };
  await run(['apps/api/src/db/migrate.ts'], env);
  await run(['apps/api/src/db/seed.ts'], env);
  const children: ChildProcess[] = [
    spawn(TSX, ['apps/fakes/src/main.ts'], { cwd: ROOT, env, stdio: 'inherit' }),
    spawn(TSX, ['apps/api/src/main.ts'], { cwd: ROOT, env, stdio: 'inherit' }),
  ];
  await waitFor(`${BASE_URL}/api/health`, 60000);
  await waitFor(`${OAUTH_URL}/_mail`, 30000);
  project.provide('baseUrl', BASE_URL);
  project.provide('oauthUrl', OAUTH_URL);
  return async () => {
    for (const c of children) c.kill('SIGTERM');
    await Promise.all(children.map((c) => new Promise((r) => (c.exitCode !== null ? r(null) : c.once('exit', r)))));
  };
}
