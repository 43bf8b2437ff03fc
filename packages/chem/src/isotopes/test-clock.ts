// Test and benchmark support: packages/chem compiles without DOM or Node typings (`types: []`), yet
// `performance` and `console` exist in every runtime it targets, so they are reached through globalThis.
const runtime = globalThis as unknown as {
  performance: { now(): number };
  console: { log(...values: unknown[]): void };
};

/**
 * Milliseconds from a monotonic clock (`performance.now()` of the runtime).
 *
 * @example
 * const t0 = nowMs(); work(); const elapsedMs = nowMs() - t0;
 */
export function nowMs(): number {
  return runtime.performance.now();
}

/**
 * Prints one line of measured figures (to the runtime console) so test output shows them.
 *
 * @example
 * reportLine('top-5 rate 92 %');
 */
export function reportLine(line: string): void {
  runtime.console.log(line);
}
