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

/**
 * The pattern read once per fit with two leading zeros: `shifted[k + j]` is the value of the
 * component at M − j (j = 0, 1, 2) at observed index k (index 0 ↔ M−2), 0 outside the pattern.
 * Reused by every fit (a reading makes thousands; fits never run inside one another).
 */
let shifted = new Float64Array(64);

/** What the last {@link fitInPlace} found; read right after the call, before the next fit. */
export const lastFit = { chiSquare: 0, scale: 0, minusOne: 0, minusTwo: 0 };

/**
 * {@link fitPattern} without allocating: the result goes into {@link lastFit} and χ² is returned.
 * The same operations in the same order as the three-column form (same results, bit for bit).
 */
export function fitInPlace(observed: Float64Array, pattern: Float64Array, noise: NoiseModel): number {
  const points = observed.length;
  if (shifted.length < points + LEAD_DA) shifted = new Float64Array(Math.max(2 * shifted.length, points + LEAD_DA));
  const q = shifted;
  const length = pattern.length;
  q[0] = 0;
  q[1] = 0;
  for (let k = 0; k < points; k += 1) q[k + LEAD_DA] = k < length ? (pattern[k] as number) : 0;
  const relative = noise.relative;
  const absolute = noise.absolute;
  let c0 = (observed[LEAD_DA] ?? 0) / (pattern[0] || 1);
  let c1 = 0;
  let c2 = 0;
  // Per round, the weighted Gram matrix g_ij = Σ w·p_i·p_j and b_j = Σ w·o·p_j of the three columns
  // (p_j[k] = q[k + 2 − j]): each coordinate step is then (b_j − Σ_{i≠j} c_i·g_ij) / g_jj, the
  // least-squares scale of column j with the other two held.
  for (let round = 0; round < 3; round += 1) {
    let b0 = 0;
    let b1 = 0;
    let b2 = 0;
    let g00 = 0;
    let g01 = 0;
    let g02 = 0;
    let g11 = 0;
    let g12 = 0;
    let g22 = 0;
    for (let k = 0; k < points; k += 1) {
      const o = observed[k] as number;
      const a0 = q[k] as number;
      const a1 = q[k + 1] as number;
      const a2 = q[k + 2] as number;
      const model = c0 * a0 + c1 * a1 + c2 * a2;
      const s = relative * (o > model ? o : model) + absolute;
      const w = 1 / (s * s);
      b0 += w * o * a0;
      b1 += w * o * a1;
      b2 += w * o * a2;
      g00 += w * a0 * a0;
      g01 += w * a0 * a1;
      g02 += w * a0 * a2;
      g11 += w * a1 * a1;
      g12 += w * a1 * a2;
      g22 += w * a2 * a2;
    }
    for (let sweep = 0; sweep < 6; sweep += 1) {
      c0 = g00 > 0 ? Math.max(0, (b0 - c1 * g01 - c2 * g02) / g00) : 0;
      c1 = g11 > 0 ? Math.max(0, (b1 - c0 * g01 - c2 * g12) / g11) : 0;
      c2 = g22 > 0 ? Math.max(0, (b2 - c0 * g02 - c1 * g12) / g22) : 0;
    }
  }
  // The fit itself weighs every position (a zero weight would let a shifted cluster grow there
  // unchecked); only the verdict forgives absent peaks the reporting threshold explains.
  const detectionLimit = noise.detectionLimit ?? 0;
  let chiSquare = 0;
  for (let k = 0; k < points; k += 1) {
    const m = c0 * (q[k] as number) + c1 * (q[k + 1] as number) + c2 * (q[k + 2] as number);
    const o = observed[k] as number;
    if (o === 0 && m <= detectionLimit) continue;
    const s = relative * (o > m ? o : m) + absolute;
    chiSquare += ((o - m) / s) ** 2;
  }
  lastFit.chiSquare = chiSquare;
  lastFit.scale = c0;
  lastFit.minusOne = c1;
  lastFit.minusTwo = c2;
  return chiSquare;
}

/**
 * Weighted non-negative least squares of the pattern at M, M−1 and M−2 to `observed` (index 0 ↔
 * M−2), re-weighted with σ from the model, then χ². Positions beyond the pattern count as predicted
 * 0, so peaks the pattern cannot explain weigh in.
 */
export function fitPattern(observed: Float64Array, pattern: Float64Array, noise: NoiseModel): PatternFit {
  const chiSquare = fitInPlace(observed, pattern, noise);
  return { chiSquare, points: observed.length, scale: lastFit.scale, shiftedScales: [lastFit.minusOne, lastFit.minusTwo] };
}

/**
 * Observed intensity at M+k less the fitted [M−H]+ and [M−2H]+ shares, so ratios such as M+1/M
 * describe the molecular ion alone. Never below 0.
 */
export function moleculeShare(observed: Float64Array, pattern: Float64Array, fit: PatternFit, k: number): number {
  const [minusOne, minusTwo] = fit.shiftedScales;
  return shareWithout(observed, pattern, minusOne, minusTwo, k);
}

/** {@link moleculeShare} from the two shifted scales themselves. */
export function shareWithout(observed: Float64Array, pattern: Float64Array, minusOne: number, minusTwo: number, k: number): number {
  const raw = observed[LEAD_DA + k] ?? 0;
  return Math.max(0, raw - minusOne * (pattern[k + 1] ?? 0) - minusTwo * (pattern[k + 2] ?? 0));
}
