// Loads a simulated library into the benchmark database as published revisions, writes replicate
// queries with known answers, and prints identification quality by method.
// Usage: npm run bench:data -- [--entries 300000] [--replicates 500] [--quality-queries 100] [--seed 1] [--batch 5000]
// Every row is invented (simulated = true). The benchmark database is emptied first.
import { createHash } from 'node:crypto';
import { mkdirSync, writeFileSync } from 'node:fs';
import pg from 'pg';
import { SpectrumIndex } from '@ionfolio/chem';
import { seededRandom } from '../../packages/chem/src/isotopes/seeded-random';
import { simulatedReplicate } from '@ionfolio/chem';
import { createDataSource } from '../../apps/api/src/db/data-source';
import { BENCH_DIR, benchDatabaseUrl, replicatesFile, numberFlag, type ReplicateQuery } from './bench-env';
import { qualityTable, replicateQuality } from './replicate-quality';
import { simulatedEntries, type SimulatedEntry } from './simulated-entry';

const entries = numberFlag('entries', 300_000);
const replicateCount = Math.min(entries, numberFlag('replicates', 500));
const qualityQueries = Math.min(replicateCount, numberFlag('quality-queries', 100));
const seed = numberFlag('seed', 1);
const batchSize = numberFlag('batch', 5000);
const url = benchDatabaseUrl();
export const BENCH_LOGIN = 'bench-curator';

const accessionOf = (i: number) => `IF-${String(i + 1).padStart(6, '0')}`;

async function resetAndMigrate(): Promise<void> {
  const admin = new pg.Client({ connectionString: url });
  await admin.connect();
  await admin.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public');
  await admin.end();
  const ds = createDataSource(url);
  await ds.initialize();
  await ds.runMigrations({ transaction: 'each' });
  await ds.destroy();
}

interface Row {
  i: number;
  entry: SimulatedEntry;
  publishedAt: string;
}

async function insertBatch(pool: pg.Pool, userId: string, rows: Row[]): Promise<void> {
  const client = await pool.connect();
  try {
    await client.query('BEGIN');
    await client.query(
      `INSERT INTO entries (id, accession, created_by, created_at)
       SELECT id, acc, $3, ts FROM unnest($1::int[], $2::text[], $4::timestamptz[]) AS t(id, acc, ts)`,
      [rows.map((r) => r.i + 1), rows.map((r) => accessionOf(r.i)), userId, rows.map((r) => r.publishedAt)],
    );
    await client.query(
      `INSERT INTO revisions (entry_id, number, state, name, formula, nominal_mass, monoisotopic_mass, peaks, peak_count,
                              base_peak_mz, retention_index, retention_index_column, simulated, content_sha256, author_id,
                              reviewer_id, created_at, updated_at, submitted_at, decided_at, published_at, change_note, conditions)
       SELECT e, 1, 'published', n, f, nm, mm, p::jsonb, pc, bp, ri, CASE WHEN ri IS NOT NULL THEN 'non-polar' END, true, sha, $12, $12,
              ts, ts, ts, ts, ts, 'Simulated benchmark entry', '{"ionizationEnergyEv": 70}'
         FROM unnest($1::int[], $2::text[], $3::text[], $4::int[], $5::float8[], $6::text[], $7::int[], $8::float8[], $9::float8[],
                     $10::text[], $11::timestamptz[]) AS t(e, n, f, nm, mm, p, pc, bp, ri, sha, ts)`,
      [
        rows.map((r) => r.i + 1),
        rows.map((r) => r.entry.name),
        rows.map((r) => r.entry.formula),
        rows.map((r) => r.entry.nominalMass),
        rows.map((r) => r.entry.monoisotopicMass),
        rows.map((r) => JSON.stringify(r.entry.peaks)),
        rows.map((r) => r.entry.peaks.length),
        rows.map((r) => r.entry.peaks.find(([, i]) => i === 100)![0]),
        rows.map((r) => r.entry.retentionIndex),
        rows.map((r) =>
          createHash('sha256')
            .update(JSON.stringify([r.entry.name, r.entry.formula, r.entry.peaks]))
            .digest('hex'),
        ),
        rows.map((r) => r.publishedAt),
        userId,
      ],
    );
    await client.query('COMMIT');
  } catch (err) {
    await client.query('ROLLBACK').catch(() => undefined);
    throw err;
  } finally {
    client.release();
  }
}

async function main(): Promise<void> {
  console.log(
    `# bench:data: ${entries} simulated entries into ${url.replace(/\/\/[^@]*@/, '//')}, seed ${seed}, batches of ${batchSize}`,
  );
  let t = performance.now();
  await resetAndMigrate();
  console.log(`schema reset and migrated in ${Math.round(performance.now() - t)} ms`);

  const pool = new pg.Pool({ connectionString: url, max: 2 });
  const users = await pool.query<{ id: string }>(
    `INSERT INTO users (github_id, login, display_name, role) VALUES ('-7007', $1, 'Bench Curator (simulated)', 'curator') RETURNING id`,
    [BENCH_LOGIN],
  );
  const userId = users.rows[0]!.id;

  const random = seededRandom(seed);
  const pickRandom = seededRandom(seed + 7);
  const sources = new Set<number>();
  while (sources.size < replicateCount) sources.add(Math.floor(pickRandom() * entries));
  const sourcePeaks = new Map<number, SimulatedEntry>();
  const index = new SpectrumIndex({ reserve: { spectra: entries, peaks: entries * 45 } });
  const generator = simulatedEntries(random);
  const nowMs = Date.now();

  t = performance.now();
  let pending: Promise<void> | undefined;
  let genMs = 0;
  let peakTotal = 0;
  for (let start = 0; start < entries; start += batchSize) {
    const g0 = performance.now();
    const rows: Row[] = [];
    for (let i = start; i < Math.min(entries, start + batchSize); i++) {
      const entry = generator.next().value as SimulatedEntry;
      // Published over the last two years, so monthly figures have something to count.
      rows.push({ i, entry, publishedAt: new Date(nowMs - random() * 730 * 86_400_000).toISOString() });
      index.add(i, entry.peaks, { nominalMass: entry.nominalMass });
      peakTotal += entry.peaks.length;
      if (sources.has(i)) sourcePeaks.set(i, entry);
    }
    genMs += performance.now() - g0;
    await pending;
    pending = insertBatch(pool, userId, rows);
    if ((start / batchSize) % 10 === 9) {
      const s = (performance.now() - t) / 1000;
      console.log(`  ${start + rows.length} rows, ${Math.round((start + rows.length) / s)} rows/s`);
    }
  }
  await pending;
  const loadS = (performance.now() - t) / 1000;
  await pool.query(`SELECT setval('entries_id_seq', $1), setval('entry_accession_seq', $1)`, [entries]);
  console.log(
    `loaded ${entries} entries (${(peakTotal / entries).toFixed(1)} peaks each) in ${loadS.toFixed(1)} s: ${Math.round(entries / loadS)} rows/s` +
      ` (generating ${(genMs / 1000).toFixed(1)} s of it, overlapped with the inserts)`,
  );
  t = performance.now();
  await pool.query('VACUUM ANALYZE entries');
  await pool.query('VACUUM ANALYZE revisions');
  console.log(`VACUUM ANALYZE in ${((performance.now() - t) / 1000).toFixed(1)} s`);
  const size = await pool.query<{ size: string }>(
    `SELECT pg_size_pretty(pg_database_size(current_database())) AS size`,
  );
  console.log(`database size ${size.rows[0]!.size}`);
  await pool.end();

  // Replicates: a second run of the source compound (±20 % intensities, 10 % of peaks lost, 3 small
  // extra peaks anywhere up to the compound's nominal mass, as co-eluting background would add).
  const replicateRandom = seededRandom(seed + 1000);
  const queries = [...sources]
    .sort((a, b) => a - b)
    .map((i) => {
      const source = sourcePeaks.get(i)!;
      return {
        sourceId: i,
        peaks: simulatedReplicate(source.peaks, replicateRandom, { maxMz: Math.max(40, source.nominalMass) }),
      };
    });
  const file: ReplicateQuery[] = queries.map((q) => ({ accession: accessionOf(q.sourceId), peaks: q.peaks }));
  mkdirSync(BENCH_DIR, { recursive: true });
  writeFileSync(replicatesFile(url), JSON.stringify({ entries, seed, simulated: true, queries: file }));
  console.log(`wrote ${file.length} replicate queries with known answers to ${replicatesFile(url)}`);

  index.pack();
  t = performance.now();
  const rows = replicateQuality(index, queries.slice(0, qualityQueries));
  console.log(
    `\nidentification quality, ${qualityQueries} replicate queries against ${entries} spectra (${((performance.now() - t) / 1000).toFixed(1)} s):\n`,
  );
  console.log(qualityTable(rows, qualityQueries));
}

await main();
