/** Noise model of observed intensities: σ = relative × intensity + absolute (absolute in % of base peak). */
export interface NoiseModel {
  readonly relative: number;
  readonly absolute: number;
  /**
   * Peak lists leave out peaks below the instrument's or the author's reporting threshold (% of
   * base peak). A position observed as 0 whose model stays at or below this limit is no evidence
   * against the model and adds nothing to χ². Default 0.
   */
  readonly detectionLimit?: number;
}

/** True when an absent peak is explained by the list's reporting threshold. */
function belowDetection(observed: number, model: number, noise: NoiseModel): boolean {
  return observed === 0 && model <= (noise.detectionLimit ?? 0);
}

/**
 * How many m/z below the candidate M the fit looks at: [M−H]+ and [M−2H]+ ions are common in EI
 * (common practice) and their clusters overlap the molecular ion's, so the model adds the same
 * cluster shifted by −1 and −2 with free non-negative scales.
 */
export const LEAD_DA = 2;

/** Result of fitting one theoretical pattern to the observed intensities around a candidate M. */
export interface PatternFit {
  /** Weighted sum of squared residuals over every m/z from M−2 to the end of the window. */
  readonly chiSquare: number;
  /** Number of m/z positions compared. */
  readonly points: number;
  /** Fitted scale of the M cluster: `scale × pattern[k]` models the M ion's share of M+k. */
  readonly scale: number;
  /** Fitted scales of the same cluster starting at M−1 and at M−2. */
  readonly shiftedScales: readonly [minusOne: number, minusTwo: number];
}

function sigma(value: number, noise: NoiseModel): number {
  return noise.relative * value + noise.absolute;
}

/** Pattern value of component j (0: at M, 1: at M−1, 2: at M−2) at observed index k (index 0 ↔ M−2). */
function component(pattern: Float64Array, j: number, k: number): number {
  return pattern[k - LEAD_DA + j] ?? 0;
}

/** The model at position k: coef[0]·p0[k] + coef[1]·p1[k] + coef[2]·p2[k]. */
function modelAt(coef: Float64Array, p0: Float64Array, p1: Float64Array, p2: Float64Array, k: number): number {
  return (coef[0] as number) * (p0[k] as number) + (coef[1] as number) * (p1[k] as number) + (coef[2] as number) * (p2[k] as number);
}

/** The weighted least-squares scale of column j with the other two scales held (never below 0). */
function refitScale(
  observed: Float64Array,
  weights: Float64Array,
  coef: Float64Array,
  p0: Float64Array,
  p1: Float64Array,
  p2: Float64Array,
  j: number,
): number {
  const column = j === 0 ? p0 : j === 1 ? p1 : p2;
  const own = coef[j] as number;
  let numerator = 0;
  let denominator = 0;
  for (let k = 0; k < observed.length; k += 1) {
    const p = column[k] as number;
    if (p === 0) continue;
    const rest = modelAt(coef, p0, p1, p2, k) - own * p;
    numerator += (weights[k] as number) * ((observed[k] as number) - rest) * p;
    denominator += (weights[k] as number) * p * p;
  }
  return denominator > 0 ? Math.max(0, numerator / denominator) : 0;
}

/**
 * Weighted non-negative least squares of the pattern at M, M−1 and M−2 to `observed` (index 0 ↔
 * M−2), re-weighted with σ from the model, then χ². Positions beyond the pattern count as predicted
 * 0, so peaks the pattern cannot explain weigh in.
 */
export function fitPattern(observed: Float64Array, pattern: Float64Array, noise: NoiseModel): PatternFit {
  const points = observed.length;
  // The pattern at each position for M, M−1 and M−2 (component(pattern, j, k)), read once.
  const p0 = new Float64Array(points);
  const p1 = new Float64Array(points);
  const p2 = new Float64Array(points);
  for (let k = 0; k < points; k += 1) {
    p0[k] = component(pattern, 0, k);
    p1[k] = component(pattern, 1, k);
    p2[k] = component(pattern, 2, k);
  }
  const coef = Float64Array.of((observed[LEAD_DA] ?? 0) / (pattern[0] || 1), 0, 0);
  const weights = new Float64Array(points);
  for (let round = 0; round < 3; round += 1) {
    for (let k = 0; k < points; k += 1) {
      const s = sigma(Math.max(observed[k] as number, modelAt(coef, p0, p1, p2, k)), noise);
      weights[k] = 1 / (s * s);
    }
    for (let sweep = 0; sweep < 6; sweep += 1) {
      for (let j = 0; j < 3; j += 1) coef[j] = refitScale(observed, weights, coef, p0, p1, p2, j);
    }
  }
  // The fit itself weighs every position (a zero weight would let a shifted cluster grow there
  // unchecked); only the verdict forgives absent peaks the reporting threshold explains.
  let chiSquare = 0;
  for (let k = 0; k < points; k += 1) {
    const m = modelAt(coef, p0, p1, p2, k);
    const o = observed[k] as number;
    if (belowDetection(o, m, noise)) continue;
    const s = sigma(Math.max(o, m), noise);
    chiSquare += ((o - m) / s) ** 2;
  }
  return { chiSquare, points, scale: (coef[0] as number), shiftedScales: [(coef[1] as number), (coef[2] as number)] };
}

/**
 * Observed intensity at M+k less the fitted [M−H]+ and [M−2H]+ shares, so ratios such as M+1/M
 * describe the molecular ion alone. Never below 0.
 */
export function moleculeShare(observed: Float64Array, pattern: Float64Array, fit: PatternFit, k: number): number {
  const [minusOne, minusTwo] = fit.shiftedScales;
  const raw = observed[LEAD_DA + k] ?? 0;
  return Math.max(0, raw - minusOne * (pattern[k + 1] ?? 0) - minusTwo * (pattern[k + 2] ?? 0));
}
