/** Noise model of observed intensities: σ = relative × intensity + absolute (absolute in % of base peak). */
export interface NoiseModel {
  readonly relative: number;
  readonly absolute: number;
}

/** Result of fitting one theoretical pattern to the observed intensities from the candidate M up. */
export interface PatternFit {
  /** Weighted sum of squared residuals over every m/z from M to the end of the window. */
  readonly chiSquare: number;
  /** Number of m/z positions compared. */
  readonly points: number;
  /** Fitted intensity of pattern fraction 1, so that `scale × pattern[k]` models M+k. */
  readonly scale: number;
}

function sigma(value: number, noise: NoiseModel): number {
  return noise.relative * value + noise.absolute;
}

/**
 * Weighted least-squares scale of `pattern` to `observed` (both indexed from M), then χ².
 * Positions beyond the pattern count as predicted 0, so peaks the pattern cannot explain weigh in.
 */
export function fitPattern(observed: Float64Array, pattern: Float64Array, noise: NoiseModel): PatternFit {
  const points = observed.length;
  let scale = (observed[0] ?? 0) / (pattern[0] || 1);
  for (let iteration = 0; iteration < 3; iteration += 1) {
    let numerator = 0;
    let denominator = 0;
    for (let k = 0; k < points; k += 1) {
      const p = pattern[k] ?? 0;
      const o = observed[k] as number;
      const s = sigma(Math.max(o, scale * p), noise);
      numerator += (o * p) / (s * s);
      denominator += (p * p) / (s * s);
    }
    scale = denominator > 0 ? numerator / denominator : 0;
  }
  let chiSquare = 0;
  for (let k = 0; k < points; k += 1) {
    const model = scale * (pattern[k] ?? 0);
    const o = observed[k] as number;
    const s = sigma(Math.max(o, model), noise);
    chiSquare += ((o - model) / s) ** 2;
  }
  return { chiSquare, points, scale };
}
