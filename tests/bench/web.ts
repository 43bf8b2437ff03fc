// Web benchmarks: the production build's initial JavaScript and lazily loaded route chunks (gzip),
// and the time to first render of the identify page in headless Chromium against the API.
// Usage: npm run bench:web -- [--runs 5] [--port 8294]
// Builds into $TMPDIR/ionfolio-bench-web (never dist/web, which the browser journeys serve).
import { randomBytes, createHmac } from 'node:crypto';
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import pg from 'pg';
import { chromium } from 'playwright-core';
import { createBenchAccessKey, startApi } from './api-process';
import {
  ROOT,
  benchDatabaseUrl,
  replicatesFile,
  ms,
  numberFlag,
  quantile,
  type ReplicateQuery,
} from './bench-env';

const url = benchDatabaseUrl();
const runs = numberFlag('runs', 5);
const port = numberFlag('port', 8294);
// Outside .data: express's sendFile refuses paths with a dot-directory in them.
const OUT_DIR = path.join(tmpdir(), 'ionfolio-bench-web');
const SESSION_SECRET = 'bench-session-secret-0123456789';

interface ManifestChunk {
  file: string;
  src?: string;
  isEntry?: boolean;
  isDynamicEntry?: boolean;
  imports?: string[];
  dynamicImports?: string[];
  css?: string[];
}

const kB = (bytes: number) => `${(bytes / 1000).toFixed(1)} kB`;

function build(): Record<string, ManifestChunk> {
  const t = performance.now();
  const r = spawnSync(
    path.join(ROOT, 'node_modules/.bin/vite'),
    ['build', '--outDir', OUT_DIR, '--emptyOutDir', '--manifest', '--logLevel', 'warn'],
    {
      cwd: ROOT,
      stdio: 'inherit',
    },
  );
  if (r.status !== 0) throw new Error(`vite build exited ${r.status}`);
  console.log(
    `vite build into ${path.relative(ROOT, OUT_DIR)} in ${((performance.now() - t) / 1000).toFixed(1)} s`,
  );
  return JSON.parse(readFileSync(path.join(OUT_DIR, '.vite/manifest.json'), 'utf8')) as Record<
    string,
    ManifestChunk
  >;
}

const gzipBytes = (file: string) => gzipSync(readFileSync(path.join(OUT_DIR, file)), { level: 9 }).length;

/** The chunk and everything it imports statically, as manifest keys. */
function staticClosure(
  manifest: Record<string, ManifestChunk>,
  key: string,
  into = new Set<string>(),
): Set<string> {
  if (into.has(key)) return into;
  into.add(key);
  for (const dep of manifest[key]?.imports ?? []) staticClosure(manifest, dep, into);
  return into;
}

function sizes(manifest: Record<string, ManifestChunk>) {
  const entryKey = Object.keys(manifest).find((k) => manifest[k]!.isEntry)!;
  const initial = staticClosure(manifest, entryKey);
  const initialJs = [...initial].reduce((sum, k) => sum + gzipBytes(manifest[k]!.file), 0);
  const initialCss = [...initial]
    .flatMap((k) => manifest[k]!.css ?? [])
    .reduce((sum, f) => sum + gzipBytes(f), 0);
  // Cross-check against index.html: every script and modulepreload it names belongs to the initial set.
  const html = readFileSync(path.join(OUT_DIR, 'index.html'), 'utf8');
  const named = [...html.matchAll(/(?:src|href)="\/(assets\/[^"]+\.js)"/g)].map((m) => m[1]!);
  const initialFiles = new Set([...initial].map((k) => manifest[k]!.file));
  const unlisted = named.filter((f) => !initialFiles.has(f));
  console.log(
    `initial JavaScript: ${kB(initialJs)} gzip in ${initial.size} chunk(s) (index.html names ${named.length}${unlisted.length ? `, ${unlisted.length} not in the manifest closure!` : ''}); initial CSS ${kB(initialCss)} gzip`,
  );
  const lazy = Object.keys(manifest).filter((k) => manifest[k]!.isDynamicEntry);
  const rows = lazy
    .map((k) => {
      const extra = [...staticClosure(manifest, k)].filter((d) => !initial.has(d));
      return {
        src: manifest[k]!.src ?? k,
        own: gzipBytes(manifest[k]!.file),
        withShared: extra.reduce((s, d) => s + gzipBytes(manifest[d]!.file), 0),
      };
    })
    .sort((a, b) => b.withShared - a.withShared);
  console.log(
    '\n| lazily loaded chunk | own gzip | with its static imports beyond the initial set |\n|---|---|---|',
  );
  for (const r of rows)
    console.log(`| ${r.src.replace('apps/web/src/', '')} | ${kB(r.own)} | ${kB(r.withShared)} |`);
  return { initialJs, initialCss };
}

/** A signed-in session for the bench curator, written as express-session + connect-pg-simple store it. */
async function sessionCookie(pool: pg.Pool, userId: string): Promise<string> {
  const sid = randomBytes(18).toString('base64url');
  const expires = new Date(Date.now() + 3_600_000);
  const sess = {
    cookie: {
      originalMaxAge: 3_600_000,
      expires: expires.toISOString(),
      httpOnly: true,
      path: '/',
      sameSite: 'lax',
      secure: false,
    },
    passport: { user: userId },
  };
  await pool.query(`INSERT INTO session (sid, sess, expire) VALUES ($1, $2, $3)`, [
    sid,
    JSON.stringify(sess),
    expires,
  ]);
  const signature = createHmac('sha256', SESSION_SECRET).update(sid).digest('base64').replace(/=+$/, '');
  return encodeURIComponent(`s:${sid}.${signature}`);
}

async function main() {
  console.log('# bench:web');
  const manifest = build();
  sizes(manifest);

  const pool = new pg.Pool({ connectionString: url, max: 2 });
  const { rows } = await pool.query<{ id: string }>(`SELECT id FROM users WHERE login = 'bench-curator'`);
  if (!rows[0]) throw new Error('run npm run bench:data first (no bench-curator in the benchmark database)');
  const key = await createBenchAccessKey(pool, rows[0].id);
  const probe = (JSON.parse(readFileSync(replicatesFile(url), 'utf8')) as { queries: ReplicateQuery[] })
    .queries[0]!.peaks;
  const api = await startApi({
    databaseUrl: url,
    port,
    key,
    probe,
    env: { WEB_DIST: OUT_DIR, SESSION_SECRET },
  });
  const browser = await chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
    ],
  });
  try {
    const heading: number[] = [];
    const paint: number[] = [];
    for (let i = 0; i <= runs; i++) {
      const context = await browser.newContext();
      await context.addCookies([
        { name: 'ionfolio.sid', value: await sessionCookie(pool, rows[0].id), url: api.baseUrl },
      ]);
      const page = await context.newPage();
      const problems: string[] = [];
      page.on('pageerror', (err) => problems.push(err.message));
      page.on('response', (r) => {
        if (r.status() >= 400) problems.push(`${r.status()} ${r.url()}`);
      });
      await page.goto(`${api.baseUrl}/identify`);
      try {
        await page
          .getByRole('heading', { name: 'Identify', level: 1 })
          .waitFor({ state: 'visible', timeout: 30_000 });
      } catch (err) {
        const h1 = await page.locator('h1').allTextContents();
        const text = (await page.locator('body').innerText()).slice(0, 300);
        throw new Error(
          `the identify page did not render at ${page.url()} (h1: ${JSON.stringify(h1)}; text: ${text}; ${problems.join('; ')})`,
          { cause: err },
        );
      }
      const atMs = await page.evaluate(() => performance.now());
      const fcp = await page.evaluate(
        () => performance.getEntriesByName('first-contentful-paint')[0]?.startTime ?? Number.NaN,
      );
      await context.close();
      // The first run warms the server's file cache and Chromium; it is not counted.
      if (i === 0) continue;
      heading.push(atMs);
      paint.push(fcp);
    }
    console.log(
      `\nidentify page, cold browser context each run (${runs} runs after one warm-up): first contentful paint median ${ms(quantile(paint, 0.5), 0)};` +
        ` "Identify" heading visible (page rendered, signed in) median ${ms(quantile(heading, 0.5), 0)}, max ${ms(Math.max(...heading), 0)}`,
    );
  } finally {
    await browser.close();
    await api.stop();
    await pool.end();
  }
}

await main();
