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

/** Arrays one fit works in, reused by the next (sized for the longest window seen so far). */
function newScratch(points: number) {
  const size = Math.max(64, points);
  return {
    p0: new Float64Array(size),
    p1: new Float64Array(size),
    p2: new Float64Array(size),
    coef: new Float64Array(3),
    g: new Float64Array(9),
    b: new Float64Array(3),
  };
}
let scratch = newScratch(64);

/** The model at position k: coef[0]·p0[k] + coef[1]·p1[k] + coef[2]·p2[k]. */
function modelAt(coef: Float64Array, p0: Float64Array, p1: Float64Array, p2: Float64Array, k: number): number {
  return (coef[0] as number) * (p0[k] as number) + (coef[1] as number) * (p1[k] as number) + (coef[2] as number) * (p2[k] as number);
}

/**
 * Weighted non-negative least squares of the pattern at M, M−1 and M−2 to `observed` (index 0 ↔
 * M−2), re-weighted with σ from the model, then χ². Positions beyond the pattern count as predicted
 * 0, so peaks the pattern cannot explain weigh in.
 */
export function fitPattern(observed: Float64Array, pattern: Float64Array, noise: NoiseModel): PatternFit {
  const points = observed.length;
  // The pattern of the components at M, M−1 and M−2 (j = 0, 1, 2) at each observed index k (index 0 ↔
  // M−2), pattern[k − LEAD_DA + j] or 0 outside it, read once into scratch reused by every fit (a
  // reading makes thousands; fits never run inside one another).
  if (scratch.p0.length < points) scratch = newScratch(points);
  const { p0, p1, p2, coef, g, b } = scratch;
  const length = pattern.length;
  for (let k = 0; k < points; k += 1) {
    const at = k - LEAD_DA;
    p0[k] = at >= 0 && at < length ? (pattern[at] as number) : 0;
    p1[k] = at + 1 >= 0 && at + 1 < length ? (pattern[at + 1] as number) : 0;
    p2[k] = at + 2 >= 0 && at + 2 < length ? (pattern[at + 2] as number) : 0;
  }
  coef[0] = (observed[LEAD_DA] ?? 0) / (pattern[0] || 1);
  coef[1] = 0;
  coef[2] = 0;
  // Per round, the weighted Gram matrix g[i][j] = Σ w·p_i·p_j and b[j] = Σ w·o·p_j of the three columns:
  // each coordinate step is then (b_j − Σ_{i≠j} c_i·g_ij) / g_jj, the least-squares scale of column j
  // with the other two held — the same step as summing the residuals position by position.
  for (let round = 0; round < 3; round += 1) {
    g.fill(0);
    b.fill(0);
    for (let k = 0; k < points; k += 1) {
      const o = observed[k] as number;
      const s = sigma(Math.max(o, modelAt(coef, p0, p1, p2, k)), noise);
      const w = 1 / (s * s);
      const a0 = p0[k] as number;
      const a1 = p1[k] as number;
      const a2 = p2[k] as number;
      b[0] = (b[0] as number) + w * o * a0;
      b[1] = (b[1] as number) + w * o * a1;
      b[2] = (b[2] as number) + w * o * a2;
      g[0] = (g[0] as number) + w * a0 * a0;
      g[1] = (g[1] as number) + w * a0 * a1;
      g[2] = (g[2] as number) + w * a0 * a2;
      g[4] = (g[4] as number) + w * a1 * a1;
      g[5] = (g[5] as number) + w * a1 * a2;
      g[8] = (g[8] as number) + w * a2 * a2;
    }
    g[3] = g[1] as number;
    g[6] = g[2] as number;
    g[7] = g[5] as number;
    for (let sweep = 0; sweep < 6; sweep += 1) {
      for (let j = 0; j < 3; j += 1) {
        const denominator = g[4 * j] as number;
        let numerator = b[j] as number;
        for (let i = 0; i < 3; i += 1) if (i !== j) numerator -= (coef[i] as number) * (g[3 * i + j] as number);
        coef[j] = denominator > 0 ? Math.max(0, numerator / denominator) : 0;
      }
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
