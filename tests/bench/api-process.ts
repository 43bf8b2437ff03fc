// Starts an Ionfolio API process against the benchmark database, as the browser journeys do, and
// measures what it takes to come up: the index load it logs, /api/health, the first identify.
import { spawn, type ChildProcess } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import {
  newAccessKeySecret,
  hashAccessKey,
  visiblePrefix,
} from '../../apps/api/src/modules/access-keys/access-key-secret';
import type pg from 'pg';
import { ROOT } from './bench-env';

export interface ApiProcess {
  child: ChildProcess;
  port: number;
  baseUrl: string;
  /** From spawning to the 'library index loaded' log line, with the ms and size the line gives. */
  indexLoaded?: { atMs: number; loadMs: number; revisions: number };
  healthAtMs: number;
  firstIdentifyAtMs: number;
  stop(): Promise<void>;
}

export function apiEnv(databaseUrl: string, port: number): NodeJS.ProcessEnv {
  const publicUrl = `http://127.0.0.1:${port}`;
  return {
    ...process.env,
    NODE_ENV: 'test',
    HOST: '127.0.0.1',
    PORT: String(port),
    PUBLIC_URL: publicUrl,
    DATABASE_URL: databaseUrl,
    SESSION_SECRET: 'bench-session-secret-0123456789',
    GITHUB_CLIENT_ID: 'ionfolio-bench-client',
    GITHUB_CLIENT_SECRET: 'ionfolio-bench-secret',
    GITHUB_AUTHORIZATION_URL: 'http://127.0.0.1:8299/login/oauth/authorize',
    GITHUB_TOKEN_URL: 'http://127.0.0.1:8299/login/oauth/access_token',
    GITHUB_PROFILE_URL: 'http://127.0.0.1:8299/api/user',
    GITHUB_EMAILS_URL: 'http://127.0.0.1:8299/api/user/emails',
    // No mail server listens here: the dispatcher's attempts fail quietly, which the benchmarks do not need.
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: '2699',
    FIRST_ADMIN_LOGIN: 'bench-admin',
    WEB_DIST: path.join(ROOT, 'dist/web'),
    // Load tests would otherwise meet the per-key limit of 120 identifies a minute.
    IDENTIFY_RATE_PER_MINUTE: '100000',
    IDENTIFY_RATE_BURST: '100000',
    LOG_LEVEL: 'info',
  };
}

/** An access key with the search and library:read scopes for `ownerId`, written straight into the table. */
export async function createBenchAccessKey(pool: pg.Pool, ownerId: string): Promise<string> {
  const secret = newAccessKeySecret();
  await pool.query(
    `INSERT INTO access_keys (owner_id, name, prefix, secret_sha256, scopes) VALUES ($1, 'benchmark', $2, $3, $4)`,
    [ownerId, visiblePrefix(secret), hashAccessKey(secret), JSON.stringify(['search', 'library:read'])],
  );
  return secret;
}

export async function identify(
  baseUrl: string,
  key: string,
  peaks: readonly (readonly [number, number])[],
  extra: Record<string, unknown> = {},
) {
  const r = await fetch(`${baseUrl}/api/v1/identify`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', authorization: `Bearer ${key}` },
    body: JSON.stringify({ peaks, ...extra }),
  });
  if (!r.ok) throw new Error(`identify answered ${r.status}: ${(await r.text()).slice(0, 300)}`);
  return (await r.json()) as { candidates: { accession: string; similarity: number }[] };
}

/** Resident and peak resident memory of a process, from /proc (kB → MiB). */
export function residentMiB(pid: number): { rss: number; hwm: number } {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = (label: string) =>
    Number(new RegExp(`^${label}:\\s+(\\d+) kB`, 'm').exec(status)?.[1] ?? Number.NaN);
  return { rss: kb('VmRSS') / 1024, hwm: kb('VmHWM') / 1024 };
}

/**
 * Spawns `node --import tsx apps/api/src/main.ts` (one process, so its pid is the server's) and
 * waits until /api/health answers and an identify with `probe` succeeds.
 */
export async function startApi(options: {
  databaseUrl: string;
  port: number;
  key: string;
  probe: readonly (readonly [number, number])[];
  timeoutMs?: number;
  env?: NodeJS.ProcessEnv;
  /** Extra node flags before the script, e.g. `--cpu-prof` (not allowed in NODE_OPTIONS). */
  nodeArgs?: string[];
}): Promise<ApiProcess> {
  const { databaseUrl, port, key, probe } = options;
  const baseUrl = `http://127.0.0.1:${port}`;
  const t0 = performance.now();
  const child = spawn(process.execPath, [...(options.nodeArgs ?? []), '--import', 'tsx', 'apps/api/src/main.ts'], {
    cwd: ROOT,
    env: { ...apiEnv(databaseUrl, port), ...options.env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const api: ApiProcess = {
    child,
    port,
    baseUrl,
    healthAtMs: Number.NaN,
    firstIdentifyAtMs: Number.NaN,
    async stop() {
      if (child.exitCode !== null) return;
      const exited = new Promise((r) => child.once('exit', r));
      child.kill('SIGTERM');
      await exited;
    },
  };
  let buffered = '';
  const errors: string[] = [];
  child.stdout!.on('data', (chunk: Buffer) => {
    buffered += chunk.toString('utf8');
    let nl: number;
    while ((nl = buffered.indexOf('\n')) >= 0) {
      const line = buffered.slice(0, nl);
      buffered = buffered.slice(nl + 1);
      try {
        const entry = JSON.parse(line) as { msg?: string; ms?: number; revisions?: number; level?: number };
        if (entry.msg === 'library index loaded' && !api.indexLoaded) {
          api.indexLoaded = {
            atMs: performance.now() - t0,
            loadMs: entry.ms ?? Number.NaN,
            revisions: entry.revisions ?? Number.NaN,
          };
        }
        if ((entry.level ?? 0) >= 50) errors.push(line);
      } catch {
        // not a JSON log line
      }
    }
  });
  child.stderr!.on('data', (chunk: Buffer) => errors.push(chunk.toString('utf8')));
  const until = Date.now() + (options.timeoutMs ?? 180_000);
  while (Number.isNaN(api.healthAtMs)) {
    if (child.exitCode !== null)
      throw new Error(`API on ${port} exited ${child.exitCode}: ${errors.join('\n').slice(0, 2000)}`);
    if (Date.now() > until) throw new Error(`API on ${port} did not answer /api/health`);
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok) api.healthAtMs = performance.now() - t0;
    } catch {
      // not listening yet
    }
    if (Number.isNaN(api.healthAtMs)) await sleep(100);
  }
  await identify(baseUrl, key, probe);
  api.firstIdentifyAtMs = performance.now() - t0;
  return api;
}
