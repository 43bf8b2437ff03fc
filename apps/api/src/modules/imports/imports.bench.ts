/**
 * Benchmark of bulk import: one multi-block JCAMP-DX file of simulated spectra, read with
 * readSpectrumFile and imported by startImport as the route does. Prints figures; it is not a test.
 * Run against a database of its own (it adds rows):
 *
 *   BENCH_DATABASE_URL=postgres://ionfolio@127.0.0.1:54361/ionfolio_importbench \
 *   BENCH_SPECTRA=10000 npx tsx apps/api/src/modules/imports/imports.bench.ts
 *
 * BENCH_TARGET=in_review imports for review instead of as drafts; BENCH_BAD_EVERY=n makes every
 * n-th block carry an unknown element in its formula, so rejections are part of the run.
 * A second line breaks the time down: checks per block on one thread, and the database writes alone.
 * Every spectrum is invented (random fragments plus the molecular-ion cluster of a random formula)
 * and titled "(simulated)".
 */
import { isotopeCluster, simulatedSpectrum, writeJcamp } from '@ionfolio/chem';
import { createDataSource } from '../../db/data-source';
import { demoRandom } from '../../db/demo/demo-random';
import { createLogger } from '../../shared/logger';
import { readSpectrumFile, type UploadedBlock } from '../uploads/spectrum-file';
import type { SessionUser } from '../users/users.schemas';
import { prepareBlock } from './import-block';
import { CHUNK_BLOCKS } from './import-chunk';
import { writeImportedEntries, type ValidBlock } from './import-writer';
import { startImport } from './imports.service';

const url = process.env.BENCH_DATABASE_URL;
if (!url || !/bench/.test(url))
  throw new Error('Set BENCH_DATABASE_URL to a database whose name contains "bench"');
const spectra = Number(process.env.BENCH_SPECTRA ?? 10_000);
const target = process.env.BENCH_TARGET === 'in_review' ? 'in_review' : 'draft';
const badEvery = Number(process.env.BENCH_BAD_EVERY ?? 0);

function simulatedBlock(random: () => number, index: number): string {
  const c = 4 + Math.floor(random() * 20);
  const o = Math.floor(random() * 4);
  const n = random() < 0.2 ? 1 : 0;
  const cl = random() < 0.1 ? 1 : 0;
  const h = 2 * c + 2 + n - cl - 2 * Math.floor(random() * Math.min(5, c));
  const formula = `C${c}H${h}${cl ? 'Cl' : ''}${n ? 'N' : ''}${o ? `O${o > 1 ? o : ''}` : ''}`;
  const massDa = 12 * c + h + 35 * cl + 14 * n + 16 * o;
  const peaks = new Map(
    simulatedSpectrum(random, {
      minMz: 26,
      maxMz: Math.max(40, massDa - 1),
      peakCount: 25 + Math.floor(random() * 40),
    }),
  );
  const scale = Math.max(2, 100 * random() ** 2);
  for (const p of isotopeCluster(formula, { minRelIntensity: 0.5 }))
    peaks.set(p.mz, (p.relIntensity * scale) / 100);
  const bad = badEvery > 0 && index % badEvery === 0;
  return writeJcamp({
    title: `Bench compound ${index} (simulated)`,
    formula: bad ? `${formula}Xx` : formula,
    peaks: [...peaks].sort((a, b) => a[0] - b[0]),
    ...(random() < 0.6 ? { retentionIndex: Math.round(600 + massDa * 7) } : {}),
  }).trimEnd();
}

function simulatedFile(count: number): Buffer {
  const random = demoRandom(20260);
  const blocks = Array.from({ length: count }, (_, i) => simulatedBlock(random, i + 1));
  const text = [
    '##TITLE=Import benchmark (simulated)',
    '##JCAMP-DX=5.01',
    '##DATA TYPE=LINK',
    `##BLOCKS=${count}`,
    ...blocks,
    '##END=',
    '',
  ];
  return Buffer.from(text.join('\n'), 'utf8');
}

async function benchCurator(ds: ReturnType<typeof createDataSource>): Promise<SessionUser> {
  await ds.query(
    `INSERT INTO users (github_id, login, display_name, role) VALUES ('-2026061', 'bench-importer', 'Bench Importer (simulated)', 'curator')
     ON CONFLICT (login) DO NOTHING`,
  );
  const rows: SessionUser[] = await ds.query(
    `SELECT id, login, display_name AS "displayName", email, role FROM users WHERE login = 'bench-importer'`,
  );
  return rows[0]!;
}

async function main() {
  const ds = createDataSource(url!);
  await ds.initialize();
  await ds.runMigrations({ transaction: 'each' });
  const curator = await benchCurator(ds);
  const buffer = simulatedFile(spectra);

  const t0 = performance.now();
  const { blocks } = readSpectrumFile('bench-import.jdx', buffer);
  const parseMs = performance.now() - t0;

  const t1 = performance.now();
  const started = await startImport(ds, createLogger('warn'), curator, 'bench-import.jdx', blocks, target);
  const id = (started.job as { id: string }).id;
  let job: { status: string; imported: number; rejected: number } | undefined;
  for (;;) {
    const rows: { status: string; imported: number; rejected: number }[] = await ds.query(
      `SELECT status, imported, rejected FROM import_jobs WHERE id = $1`,
      [id],
    );
    job = rows[0];
    if (job && job.status !== 'running') break;
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  const importS = (performance.now() - t1) / 1000;
  const totalS = (performance.now() - t0) / 1000;
  console.log(
    `${spectra} spectra (${(buffer.length / 2 ** 20).toFixed(1)} MiB JCAMP-DX, target ${target}): parsed in ${Math.round(parseMs)} ms; ` +
      `import ${job!.status} in ${importS.toFixed(2)} s: ${Math.round(job!.imported / importS)} spectra/s ` +
      `(${job!.imported} imported, ${job!.rejected} rejected); with parsing ${Math.round(job!.imported / totalS)} spectra/s`,
  );
  await breakdown(ds, curator, blocks.slice(0, 2000), id);
  await ds.destroy();
}

/**
 * Where the time goes: the checks of one block on one thread, and the database writes alone
 * (chunks of prepared blocks, the same prepared blocks written again until there are `spectra` rows).
 */
async function breakdown(
  ds: ReturnType<typeof createDataSource>,
  curator: SessionUser,
  sample: UploadedBlock[],
  jobId: string,
) {
  const t0 = performance.now();
  const prepared = sample.map(prepareBlock).filter((p): p is ValidBlock => p.ok);
  const checkMs = (performance.now() - t0) / sample.length;
  const t1 = performance.now();
  for (let written = 0; written < spectra;) {
    for (let start = 0; start < prepared.length && written < spectra; start += CHUNK_BLOCKS) {
      const chunk = prepared.slice(start, Math.min(start + CHUNK_BLOCKS, start + spectra - written));
      await ds.transaction((m) => writeImportedEntries(m, curator, jobId, chunk, target));
      written += chunk.length;
    }
  }
  const writeS = (performance.now() - t1) / 1000;
  console.log(
    `breakdown: validation and checks ${checkMs.toFixed(2)} ms a block on one thread (${Math.round(1000 / checkMs)} blocks/s); ` +
      `database writes alone ${spectra} rows in ${writeS.toFixed(2)} s: ${Math.round(spectra / writeS)} spectra/s`,
  );
}

await main();
