// The few host facilities the benchmark needs, reached through globalThis so that packages/chem keeps
// compiling without Node or DOM types (its tsconfig has `types: []`).
interface Host {
  performance: { now(): number };
  console: { log(...values: unknown[]): void };
  process?: {
    argv: string[];
    memoryUsage?: () => { heapUsed: number; rss: number };
    cpuUsage?: () => { user: number; system: number };
    version?: string;
  };
  gc?: () => void;
}

const host = globalThis as unknown as Host;

/** Milliseconds from a monotonic clock. */
export const now = (): number => host.performance.now();

/** CPU time of this process in milliseconds (user + system), when the host reports it; NaN elsewhere. */
export function cpuMs(): number {
  const usage = host.process?.cpuUsage?.();
  return usage === undefined ? NaN : (usage.user + usage.system) / 1000;
}

/** Prints one line. */
export const print = (...values: unknown[]): void => host.console.log(...values);

/** Command-line arguments after the script name. */
export const argv = (): string[] => host.process?.argv.slice(2) ?? [];

/** Heap in use, in bytes, when the host reports it (Node); NaN elsewhere. */
export function heapUsedBytes(): number {
  host.gc?.();
  return host.process?.memoryUsage?.().heapUsed ?? NaN;
}

/** The runtime's version string, when known. */
export const runtimeVersion = (): string => host.process?.version ?? 'unknown';

/** Reads `--name value` or `--name=value` as a number, with a default. */
export function numberArg(args: string[], name: string, fallback: number): number {
  for (let i = 0; i < args.length; i++) {
    const arg = args[i] as string;
    if (arg === `--${name}`) return Number(args[i + 1]);
    if (arg.startsWith(`--${name}=`)) return Number(arg.slice(name.length + 3));
  }
  return fallback;
}

/** The q-quantile (0–1) of a list of numbers, nearest rank. */
export function quantile(values: number[], q: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil(q * sorted.length) - 1))] as number;
}
