/**
 * Benchmark of the library list, the overview and structure search on a large synthetic library.
 * Prints figures; it is not a test. Run against a database of its own (it adds rows):
 *
 *   BENCH_DATABASE_URL=postgres://ionfolio@127.0.0.1:54330/ionfolio_bench_library \
 *   BENCH_ENTRIES=100000 npx tsx apps/api/src/modules/entries/entries-list.bench.ts
 *
 * The rows are invented: names from made-up syllables, formulas from random element counts,
 * two-peak spectra, structures from a handful of SMILES. They are flagged simulated.
 */
import { createDataSource } from '../../db/data-source';
import { getOverview } from '../overview/overview.service';
import { searchStructures } from '../structure-search/structure-search.service';
import { listEntries } from './entries.list';
import { ListEntriesQuery } from './entries.schemas';

const url = process.env.BENCH_DATABASE_URL;
if (!url || !/bench/.test(url)) throw new Error('Set BENCH_DATABASE_URL to a database whose name contains "bench"');
const target = Number(process.env.BENCH_ENTRIES ?? 100_000);
const runs = Number(process.env.BENCH_RUNS ?? 20);

const SMILES = ['Clc1ccccc1', 'Cc1ccccc1', 'O=Cc1ccccc1', 'CCCCCC=O', 'C1CCCCC1', 'c1ccncc1', 'CC(C)=CCCC(C)(O)C=C', 'COc1ccccc1O', 'CCOC(C)=O', 'Brc1ccc(Cl)cc1'];

async function seed(ds: ReturnType<typeof createDataSource>) {
  const [{ n }] = (await ds.query(`SELECT count(*)::int AS n FROM revisions WHERE state = 'published'`)) as [{ n: number }];
  if (n >= target) return n;
  await ds.query(`INSERT INTO users (github_id, login, display_name, role) VALUES ('-424242', 'bench-curator', 'Bench Curator', 'curator') ON CONFLICT DO NOTHING`);
  const [{ id: userId }] = (await ds.query(`SELECT id FROM users WHERE login = 'bench-curator'`)) as [{ id: string }];
  const started = performance.now();
  for (let done = n; done < target; done += 10_000) {
    const count = Math.min(10_000, target - done);
    await ds.query(
      `WITH e AS (
         INSERT INTO entries (created_by) SELECT $1 FROM generate_series(1, $2) RETURNING id
       ), g AS (
         SELECT id, 6 + (random() * 14)::int AS c, (random() * 3)::int AS o, (random() < 0.15)::int AS cl, (random() < 0.1)::int AS n,
                (random() * 9)::int AS s
           FROM e
       )
       INSERT INTO revisions (entry_id, number, state, name, synonyms, formula, nominal_mass, monoisotopic_mass, structure, structure_format,
                              peaks, peak_count, base_peak_mz, retention_index, retention_index_column, simulated, content_sha256, author_id,
                              reviewer_id, submitted_at, decided_at, published_at, updated_at, checks, checks_worst)
       SELECT g.id, 1, 'published',
              initcap((ARRAY['lin','ger','cit','myr','car','thy','eug','van','ion','dam'])[1 + (random() * 9)::int] ||
                      (ARRAY['al','ol','ene','one','ate','ide','yl'])[1 + (random() * 6)::int] ||
                      (ARRAY['ox','ram','tex','mel','sor','qui'])[1 + (random() * 5)::int]) || ' ' || g.id,
              '[]'::jsonb,
              'C' || g.c || 'H' || (2 * g.c + 2 - 2 * g.cl) || CASE WHEN g.cl > 0 THEN 'Cl' ELSE '' END || CASE WHEN g.n > 0 THEN 'N' ELSE '' END
                || CASE g.o WHEN 0 THEN '' WHEN 1 THEN 'O' ELSE 'O' || g.o END,
              12 * g.c + (2 * g.c + 2 - 2 * g.cl) + 35 * g.cl + 14 * g.n + 16 * g.o, 0,
              ($3::text[])[1 + floor(random() * array_length($3::text[], 1))::int], 'smiles',
              jsonb_build_array(jsonb_build_array(41, 60), jsonb_build_array(12 * g.c, 100)), 2, 12 * g.c,
              CASE WHEN random() < 0.6 THEN 800 + random() * 1400 END, 'non-polar', true, md5(g.id::text), $1, $1,
              now() - (g.s * 30 + 3) * interval '1 day', now() - (g.s * 30 + 2) * interval '1 day', now() - (g.s * 30 + 2) * interval '1 day',
              now() - g.s * 30 * interval '1 day', '[]'::jsonb, 'pass'
         FROM g`,
      [userId, count, SMILES],
    );
  }
  await ds.query(`ANALYZE entries; ANALYZE revisions`);
  console.log(`seeded ${target - n} entries in ${Math.round(performance.now() - started)} ms`);
  return target;
}

async function time(label: string, fn: () => Promise<unknown>) {
  const ms: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    await fn();
    ms.push(performance.now() - t);
  }
  ms.sort((a, b) => a - b);
  console.log(`${label.padEnd(44)} median ${ms[Math.floor(ms.length / 2)]!.toFixed(1)} ms   p90 ${ms[Math.floor(ms.length * 0.9)]!.toFixed(1)} ms`);
}

async function main() {
  const ds = createDataSource(url!);
  await ds.initialize();
  await ds.runMigrations({ transaction: 'each' });
  const total = await seed(ds);
  // After seeding or a migration that rewrote the table, so plans and visibility are current.
  await ds.query(`VACUUM ANALYZE revisions`);
  await ds.query(`VACUUM ANALYZE structure_keys`);
  console.log(`published entries: ${total}, runs per figure: ${runs}`);
  const cases: [string, Record<string, string>][] = [
    ['first page, no filter', {}],
    ['name, one word (q=geralox)', { q: 'geralox' }],
    ['name with a typo (q=gerallox)', { q: 'gerallox' }],
    ['formula exact (C10H22O)', { formula: 'C10H22O' }],
    ['formula ranges (C6-8 Cl1-3)', { formula: 'C6-8 Cl1-3' }],
    ['mass 150-160', { minMass: '150', maxMass: '160' }],
    ['mass 150-160 sorted by mass', { minMass: '150', maxMass: '160', sort: 'nominalMass' }],
    ['elements=Cl,N', { elements: 'Cl,N' }],
    ['sort by name, desc', { sort: 'name', order: 'desc' }],
  ];
  for (const [label, raw] of cases) {
    const query = ListEntriesQuery.parse({ ...raw, limit: '200' });
    await time(`GET /entries ${label}`, () => listEntries(ds, query));
  }
  // A deep page: follow the cursor 25 pages in, then time that page.
  let query = ListEntriesQuery.parse({ sort: 'name', limit: '200' });
  for (let i = 0; i < 25; i++) {
    const page = await listEntries(ds, query);
    query = ListEntriesQuery.parse({ sort: 'name', limit: '200', cursor: page.nextCursor! });
  }
  await time('GET /entries sort=name, page 26', () => listEntries(ds, query));
  await time('GET /overview', () => getOverview(ds));

  const t = performance.now();
  const first = await searchStructures(ds, { smiles: 'c1ccccc1', mode: 'substructure', limit: 500 });
  console.log(`first structure search (computes missing keys) ${Math.round(performance.now() - t)} ms, ${first.entries.length} hits`);
  await time('POST /structure-search c1ccccc1 (limit 100)', () => searchStructures(ds, { smiles: 'c1ccccc1', mode: 'substructure', limit: 100 }));
  await time('POST /structure-search exact Clc1ccccc1', () => searchStructures(ds, { smiles: 'Clc1ccccc1', mode: 'exact', limit: 100 }));

  for (const [label, sql] of [
    ['q', `EXPLAIN (ANALYZE, COSTS OFF, TIMING OFF) SELECT e.accession FROM revisions r JOIN entries e ON e.id = r.entry_id WHERE r.state = 'published' AND (revision_search_text(r.name, r.synonyms) LIKE '%gerallox%' OR 'gerallox' <% revision_search_text(r.name, r.synonyms)) LIMIT 201`],
    ['mass', `EXPLAIN (ANALYZE, COSTS OFF, TIMING OFF) SELECT e.accession FROM revisions r JOIN entries e ON e.id = r.entry_id WHERE r.state = 'published' AND r.nominal_mass BETWEEN 150 AND 160 ORDER BY e.accession LIMIT 201`],
  ] as const) {
    const plan = (await ds.query(sql)) as { 'QUERY PLAN': string }[];
    console.log(`\nEXPLAIN ${label}:\n${plan.map((p) => p['QUERY PLAN']).join('\n')}`);
  }
  await ds.destroy();
}

await main();
