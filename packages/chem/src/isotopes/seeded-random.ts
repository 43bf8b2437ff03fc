/**
 * A small deterministic pseudo-random generator (mulberry32) for reproducible test data and
 * benchmarks: returns a function giving numbers in [0, 1).
 *
 * @param seed - any 32-bit integer
 * @example
 * const random = seededRandom(42); random() // the same value on every run
 */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * A standard normal deviate from a uniform generator (Box–Muller).
 *
 * @example
 * const g = gaussian(seededRandom(1)); g()
 */
export function gaussian(random: () => number): () => number {
  return () => {
    const u = Math.max(random(), 1e-12);
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * random());
  };
}
