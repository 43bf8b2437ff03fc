// REST benchmarks against the benchmark database that bench:data filled: index load, memory,
// identify latency and throughput, publish → searchable on two processes, the library list and bulk import.
// Usage: npm run bench:api -- [--duration 10] [--import-spectra 10000] [--list-runs 20] [--publishes 5] [--skip-import]
//        [--cpu-prof DIR]  (process A writes a V8 CPU profile into DIR when it stops)
//        [--only-import]   (just the bulk import, into any benchmark database; needs no replicates file)
import { readFileSync } from 'node:fs';
import { setTimeout as sleep } from 'node:timers/promises';
import autocannon from 'autocannon';
import pg from 'pg';
import { writeJcamp, type Peak } from '@ionfolio/chem';
import { seededRandom } from '../../packages/chem/src/isotopes/seeded-random';
import { createDataSource } from '../../apps/api/src/db/data-source';
import { createEntry, submitRevision } from '../../apps/api/src/modules/entries/entries.service';
import { startImport } from '../../apps/api/src/modules/imports/imports.service';
import { decide } from '../../apps/api/src/modules/reviews/reviews.service';
import { readSpectrumFile } from '../../apps/api/src/modules/uploads/spectrum-file';
import type { SessionUser } from '../../apps/api/src/modules/users/users.schemas';
import { createLogger } from '../../apps/api/src/shared/logger';
import { createBenchAccessKey, identify, residentMiB, startApi, type ApiProcess } from './api-process';
import {
  benchDatabaseUrl,
  hasFlag,
  replicatesFile,
  ms,
  numberFlag,
  quantile,
  type ReplicateQuery,
} from './bench-env';
import { simulatedEntries } from './simulated-entry';

const url = benchDatabaseUrl();
const durationS = numberFlag('duration', 10);
const importSpectra = numberFlag('import-spectra', 10_000);
const listRuns = numberFlag('list-runs', 20);
const publishes = numberFlag('publishes', 5);
const PORT_A = numberFlag('port', 8290);
const PORT_B = PORT_A + 1;

const onlyImport = hasFlag('only-import');
const replicates = onlyImport
  ? []
  : (JSON.parse(readFileSync(replicatesFile(url), 'utf8')) as { entries: number; queries: ReplicateQuery[] }).queries;
const pool = new pg.Pool({ connectionString: url, max: 2 });

async function benchUser(login: string, role: 'contributor' | 'curator'): Promise<SessionUser> {
  await pool.query(
    `INSERT INTO users (github_id, login, display_name, role) VALUES ($1, $2, $3, $4) ON CONFLICT (login) DO NOTHING`,
    [`-${login.length}${role.length}77`, login, `${login} (simulated)`, role],
  );
  const { rows } = await pool.query<SessionUser>(
    `SELECT id, login, display_name AS "displayName", email, role FROM users WHERE login = $1`,
    [login],
  );
  return rows[0]!;
}

async function loadTest(api: ApiProcess, key: string, connections: number) {
  const bodies = replicates.map((q) => JSON.stringify({ peaks: q.peaks }));
  let next = 0;
  const latencies: number[] = [];
  const instance = autocannon({
    url: `${api.baseUrl}/api/v1/identify`,
    connections,
    duration: durationS,
    method: 'POST',
    headers: { 'content-type': 'application/json', authorization: `Bearer ${key}` },
    requests: [
      { method: 'POST', setupRequest: (req) => ({ ...req, body: bodies[next++ % bodies.length]! }) },
    ],
  });
  instance.on('response', (_client, statusCode, _bytes, responseTimeMs) => {
    if (statusCode === 200) latencies.push(responseTimeMs);
  });
  const result = await instance;
  const line =
    `identify, ${String(connections).padStart(2)} connection(s), ${durationS} s: median ${ms(quantile(latencies, 0.5))}, p95 ${ms(quantile(latencies, 0.95))},` +
    ` p99 ${ms(quantile(latencies, 0.99))}, ${(latencies.length / result.duration).toFixed(1)} req/s (${latencies.length} answers, non-2xx ${result.non2xx}, errors ${result.errors})`;
  console.log(line);
  return {
    connections,
    median: quantile(latencies, 0.5),
    p95: quantile(latencies, 0.95),
    p99: quantile(latencies, 0.99),
    rps: latencies.length / result.duration,
  };
}

async function waitUntilFound(
  baseUrl: string,
  key: string,
  peaks: Peak[],
  accession: string,
  fromMs: number,
  timeoutMs = 10_000,
): Promise<number> {
  for (;;) {
    const answer = await identify(baseUrl, key, peaks, { limit: 3 });
    if (answer.candidates.some((c) => c.accession === accession)) return performance.now() - fromMs;
    if (performance.now() - fromMs > timeoutMs) return Number.POSITIVE_INFINITY;
    await sleep(10);
  }
}

async function listBench(api: ApiProcess, key: string) {
  const cases: [string, string][] = [
    ['first page, no filter', ''],
    ['name word (q=linal)', 'q=linal'],
    ['name with a typo (q=lianlox)', 'q=lianlox'],
    ['formula exact (C10H18O)', 'formula=C10H18O'],
    ['formula ranges (C6-8 Cl1-3)', `formula=${encodeURIComponent('C6-8 Cl1-3')}`],
    ['mass 150-160', 'minMass=150&maxMass=160'],
    ['mass 150-160 sorted by mass', 'minMass=150&maxMass=160&sort=nominalMass'],
    ['elements=Cl,N', 'elements=Cl,N'],
    ['sort by name, desc', 'sort=name&order=desc'],
  ];
  for (const [label, query] of cases) {
    const times: number[] = [];
    let count = 0;
    for (let i = 0; i < listRuns; i++) {
      const t = performance.now();
      const r = await fetch(`${api.baseUrl}/api/v1/entries?limit=50${query ? `&${query}` : ''}`, {
        headers: { authorization: `Bearer ${key}` },
      });
      if (!r.ok) throw new Error(`GET /entries ${query} answered ${r.status}: ${await r.text()}`);
      const body = (await r.json()) as { entries?: unknown[]; items?: unknown[] };
      times.push(performance.now() - t);
      count = (body.entries ?? body.items ?? []).length;
    }
    console.log(
      `GET /api/v1/entries ${label.padEnd(32)} median ${ms(quantile(times, 0.5))}, p90 ${ms(quantile(times, 0.9))} (${count} rows on the page)`,
    );
  }
}

async function importBench(curator: SessionUser) {
  const random = seededRandom(4242);
  const generator = simulatedEntries(random);
  const blocks: string[] = [];
  for (let i = 0; i < importSpectra; i++) {
    const e = generator.next().value!;
    blocks.push(
      writeJcamp({
        title: `${e.name} import (simulated)`,
        formula: e.formula,
        peaks: e.peaks,
        labels: { BLOCK_ID: String(i + 1) },
      }).trimEnd(),
    );
  }
  const text = [
    '##TITLE=Benchmark import (simulated)',
    '##JCAMP-DX=5.01',
    '##DATA TYPE=LINK',
    `##BLOCKS=${blocks.length}`,
    ...blocks,
    '##END=',
    '',
  ].join('\n');
  const buffer = Buffer.from(text, 'utf8');
  const ds = createDataSource(url);
  await ds.initialize();
  const t0 = performance.now();
  const { blocks: parsed } = readSpectrumFile('benchmark-import.jdx', buffer);
  const parseMs = performance.now() - t0;
  const started = await startImport(
    ds,
    createLogger('warn'),
    curator,
    'benchmark-import.jdx',
    parsed,
    'draft',
  );
  const id = (started.job as { id: string }).id;
  let job: { status: string; done: number; imported: number; rejected: number } | undefined;
  for (;;) {
    const { rows } = await pool.query(
      `SELECT status, done, imported, rejected FROM import_jobs WHERE id = $1`,
      [id],
    );
    job = rows[0];
    if (job && job.status !== 'running') break;
    await sleep(250);
  }
  const totalS = (performance.now() - t0) / 1000;
  console.log(
    `import: ${importSpectra} spectra in one multi-block JCAMP-DX (${(buffer.length / 2 ** 20).toFixed(1)} MiB): parsed in ${ms(parseMs, 0)},` +
      ` ${job!.status} in ${totalS.toFixed(1)} s: ${Math.round(job!.imported / totalS)} spectra/s (${job!.imported} imported, ${job!.rejected} rejected)`,
  );
  await ds.destroy();
}

async function publishBench(
  a: ApiProcess,
  b: ApiProcess,
  key: string,
  contributor: SessionUser,
  curator: SessionUser,
) {
  const ds = createDataSource(url);
  await ds.initialize();
  // A new seed per run: with a fixed one, every run would publish the same spectra again, and a later
  // run's copy would rank behind the earlier copies (equal scores rank by id) and not be found.
  const seed = Date.now() % 2 ** 31;
  const generator = simulatedEntries(seededRandom(seed));
  const onA: number[] = [];
  const onB: number[] = [];
  for (let i = 0; i < publishes; i++) {
    const e = generator.next().value!;
    const draft = await createEntry(
      ds,
      contributor,
      {
        name: `${e.name} published during the benchmark (simulated)`,
        formula: e.formula,
        peaks: e.peaks,
      } as never,
      { simulated: true },
    );
    const submitted = await submitRevision(ds, contributor, draft.id, draft.lockVersion);
    const t = performance.now();
    await decide(ds, curator, submitted.id, {
      decision: 'publish',
      comment: '',
      lockVersion: submitted.lockVersion,
    });
    const [ta, tb] = await Promise.all([
      waitUntilFound(a.baseUrl, key, e.peaks, draft.accession, t),
      waitUntilFound(b.baseUrl, key, e.peaks, draft.accession, t),
    ]);
    onA.push(ta);
    onB.push(tb);
  }
  console.log(
    `publish → searchable (commit with NOTIFY, then identify polled every 10 ms), ${publishes} publishes (seed ${seed}):` +
      ` process A median ${ms(quantile(onA, 0.5))} max ${ms(Math.max(...onA))}; process B median ${ms(quantile(onB, 0.5))} max ${ms(Math.max(...onB))}` +
      ` (A: ${onA.map((v) => v.toFixed(0)).join(', ')} ms; B: ${onB.map((v) => v.toFixed(0)).join(', ')} ms)`,
  );
  await ds.destroy();
  return { onA, onB };
}

async function main() {
  if (onlyImport) {
    await importBench(await benchUser('bench-curator', 'curator'));
    await pool.end();
    return;
  }
  const { rows } = await pool.query<{ n: number }>(
    `SELECT count(*)::int AS n FROM revisions WHERE state = 'published'`,
  );
  console.log(
    `# bench:api: ${rows[0]!.n} published revisions, ${replicates.length} replicate queries, load tests ${durationS} s each`,
  );
  const curator = await benchUser('bench-curator', 'curator');
  const reviewer = await benchUser('bench-reviewer', 'curator');
  const contributor = await benchUser('bench-contributor', 'contributor');
  const key = await createBenchAccessKey(pool, curator.id);
  const probe = replicates[0]!.peaks;

  const profileDir = process.argv.includes('--cpu-prof') ? process.argv[process.argv.indexOf('--cpu-prof') + 1] : undefined;
  const nodeArgs = profileDir ? ['--cpu-prof', `--cpu-prof-dir=${profileDir}`] : [];
  const a = await startApi({ databaseUrl: url, port: PORT_A, key, probe, nodeArgs });
  try {
    console.log(
      `process A start: index loaded (${a.indexLoaded?.revisions} revisions) ${ms(a.indexLoaded?.loadMs ?? Number.NaN, 0)} by its log line,` +
        ` at ${ms(a.indexLoaded?.atMs ?? Number.NaN, 0)} after spawn; /api/health at ${ms(a.healthAtMs, 0)}; first identify at ${ms(a.firstIdentifyAtMs, 0)}`,
    );
    const idle = residentMiB(a.child.pid!);
    console.log(
      `process A memory with the index: VmRSS ${idle.rss.toFixed(0)} MiB (peak so far ${idle.hwm.toFixed(0)} MiB)`,
    );

    // Correctness on the way: the known source among the candidates of a few replicates.
    // tookMs is the server's own time inside identify (index search, matched peaks, molecular-ion
    // reading); the rest of the round trip is HTTP, JSON, validation and the access-key lookup.
    let found = 0;
    const took: number[] = [];
    const roundTrip: number[] = [];
    for (const q of replicates.slice(0, 50)) {
      const t = performance.now();
      const answer = (await identify(a.baseUrl, key, q.peaks)) as Awaited<ReturnType<typeof identify>> & {
        tookMs: number;
      };
      roundTrip.push(performance.now() - t);
      took.push(answer.tookMs);
      if (answer.candidates[0]?.accession === q.accession) found++;
    }
    console.log(
      `sanity: source ranked first for ${found}/50 replicate queries through the API (default method);` +
        ` one at a time: round trip median ${ms(quantile(roundTrip, 0.5))}, of which inside identify (tookMs) median ${ms(quantile(took, 0.5))}`,
    );

    const runs = [];
    for (const connections of [1, 4, 16]) runs.push(await loadTest(a, key, connections));
    const loaded = residentMiB(a.child.pid!);
    console.log(
      `process A memory after the load tests: VmRSS ${loaded.rss.toFixed(0)} MiB, peak ${loaded.hwm.toFixed(0)} MiB`,
    );

    await listBench(a, key);

    const b = await startApi({ databaseUrl: url, port: PORT_B, key, probe });
    try {
      console.log(
        `process B start: index loaded ${ms(b.indexLoaded?.loadMs ?? Number.NaN, 0)}, first identify at ${ms(b.firstIdentifyAtMs, 0)} after spawn`,
      );
      await publishBench(a, b, key, contributor, reviewer);
    } finally {
      await b.stop();
    }
  } finally {
    await a.stop();
  }
  if (!hasFlag('skip-import')) await importBench(curator);
  await pool.end();
}

await main();
