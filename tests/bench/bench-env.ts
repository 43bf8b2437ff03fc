// Shared bits of the benchmark scripts: the benchmark database, flags and quantiles.
import path from 'node:path';
import type { Peak } from '@ionfolio/chem';

export const ROOT = path.resolve(import.meta.dirname, '../..');
export const BENCH_DIR = path.join(ROOT, '.data/bench');

/** The benchmark database; refuses any database whose name does not say "bench". */
export function benchDatabaseUrl(): string {
  const url = process.env.BENCH_DATABASE_URL ?? 'postgres://ionfolio@127.0.0.1:54330/ionfolio_bench';
  if (!/\/[^/]*bench[^/]*$/.test(url))
    throw new Error(`BENCH_DATABASE_URL must name a database containing "bench": ${url}`);
  return url;
}

/** Replicate queries of the library in the benchmark database `url` (one file per database). */
export function replicatesFile(url: string): string {
  return path.join(BENCH_DIR, `${new URL(url).pathname.slice(1)}-replicates.json`);
}

/** `--name value` from the command line as a number, else the fallback. */
export function numberFlag(name: string, fallback: number): number {
  const i = process.argv.indexOf(`--${name}`);
  if (i < 0) return fallback;
  const value = Number(process.argv[i + 1]);
  if (!Number.isFinite(value)) throw new Error(`--${name} needs a number`);
  return value;
}

export const hasFlag = (name: string): boolean => process.argv.includes(`--${name}`);

/** Quantile by nearest rank of unsorted values (q from 0 to 1). */
export function quantile(values: readonly number[], q: number): number {
  if (values.length === 0) return Number.NaN;
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil(q * sorted.length) - 1))]!;
}

export const ms = (value: number, digits = 1): string => `${value.toFixed(digits)} ms`;

/** One replicate query with its known answer, as bench:data writes them. */
export interface ReplicateQuery {
  accession: string;
  peaks: Peak[];
}
