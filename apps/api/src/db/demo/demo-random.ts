/**
 * A small, stable 32-bit hash of a text (FNV-1a), so that invented demo values can depend on a
 * compound's key or formula and stay the same on every run.
 */
export function demoTextHash(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h;
}

/**
 * A deterministic generator of numbers in [0, 1) for demo content (xorshift32 after one hash
 * round of the seed). Not for anything that needs good statistics or secrecy.
 */
export function demoRandom(seed: number): () => number {
  let x = demoTextHash(`seed:${seed >>> 0}`) || 0x9e3779b9;
  return () => {
    x ^= x << 13;
    x >>>= 0;
    x ^= x >>> 17;
    x ^= x << 5;
    x >>>= 0;
    return x / 4294967296;
  };
}
