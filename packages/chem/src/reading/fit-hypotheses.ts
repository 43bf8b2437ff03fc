import { clusterPattern, heteroatomMassDa, hypotheses, type HeteroatomHypothesis } from './cluster-model';
import { fitInPlace, lastFit, LEAD_DA, shareWithout, type NoiseModel, type PatternFit } from './fit-cluster';

/** One hypothesis fitted at one candidate M. */
export interface HypothesisFit {
  m: number;
  h: HeteroatomHypothesis;
  carbon: number;
  fit: PatternFit;
  score: number;
  observed: Float64Array;
}

/** Prior cost (in χ² units) per S or Si atom: they are rarer than none, Si rarer than S. */
const PENALTY = { sulfur: 1, silicon: 3 };

/** Largest χ² taken as a fit for `points` compared m/z: dof + 4√(2·dof) + 4, dof = points − 4 (three scales and the carbon count). */
export function acceptableChiSquare(points: number): number {
  const dof = Math.max(1, points - 4);
  return dof + 4 * Math.sqrt(2 * dof) + 4;
}

/** Whether a fit is acceptable by {@link acceptableChiSquare}. */
export function acceptable(fit: PatternFit): boolean {
  return fit.chiSquare <= acceptableChiSquare(fit.points);
}

/** A hypothesis with what every fit of it reuses: its mass, prior costs, M+1 terms and patterns by carbon. */
interface HypothesisEntry {
  readonly h: HeteroatomHypothesis;
  readonly massDa: number;
  readonly sulfurCost: number;
  readonly siliconCost: number;
  /** M+1/M of the heteroatoms alone. */
  readonly heteroRatio: number;
  /** M+1/M added by one carbon (with its hydrogens). */
  readonly carbonStep: number;
  readonly patterns: Float64Array[];
}

function entryOf(h: HeteroatomHypothesis): HypothesisEntry {
  const base = clusterPattern(h, 0);
  const perCarbon = clusterPattern(h, 1);
  const heteroRatio = (base[1] ?? 0) / (base[0] as number);
  return {
    h: Object.freeze(h),
    massDa: heteroatomMassDa(h),
    sulfurCost: PENALTY.sulfur * h.sulfur,
    siliconCost: PENALTY.silicon * h.silicon,
    heteroRatio,
    carbonStep: (perCarbon[1] as number) / (perCarbon[0] as number) - heteroRatio,
    patterns: [],
  };
}

/** Every hypothesis in the order of `hypotheses()`, built on first use. */
let entries: HypothesisEntry[] | undefined;

function patternOf(e: HypothesisEntry, carbon: number): Float64Array {
  return e.patterns[carbon] ?? (e.patterns[carbon] = clusterPattern(e.h, carbon));
}

function carbonEstimate(e: HypothesisEntry, m0: number, m1: number): number {
  return m0 > 0 ? (m1 / m0 - e.heteroRatio) / e.carbonStep : 0;
}

/** The fits of one call, by position in fitting order (a call makes at most six per hypothesis). */
const fits = {
  capacity: 0,
  count: 0,
  entry: new Int32Array(0),
  carbon: new Int32Array(0),
  score: new Float64Array(0),
  chiSquare: new Float64Array(0),
  scale: new Float64Array(0),
  minusOne: new Float64Array(0),
  minusTwo: new Float64Array(0),
};

function reserve(capacity: number): void {
  if (fits.capacity >= capacity) return;
  fits.capacity = capacity;
  fits.entry = new Int32Array(capacity);
  fits.carbon = new Int32Array(capacity);
  fits.score = new Float64Array(capacity);
  fits.chiSquare = new Float64Array(capacity);
  fits.scale = new Float64Array(capacity);
  fits.minusOne = new Float64Array(capacity);
  fits.minusTwo = new Float64Array(capacity);
}

/** Whether the hypothesis' fits from `from` on include one at `carbon`. */
function triedCarbon(from: number, carbon: number): boolean {
  for (let i = from; i < fits.count; i += 1) if (fits.carbon[i] === carbon) return true;
  return false;
}

/** Fits `e` with carbon counts around `estimate`, each carbon once per hypothesis (fits from `from` on). */
function tryAround(observed: Float64Array, noise: NoiseModel, index: number, e: HypothesisEntry, maxCarbon: number, from: number, estimate: number): void {
  const centre = Math.min(maxCarbon, Math.max(0, Math.round(estimate)));
  for (let carbon = Math.max(0, centre - 1); carbon <= Math.min(maxCarbon, centre + 1); carbon += 1) {
    if (triedCarbon(from, carbon) || (carbon === 0 && e.massDa === 0)) continue;
    const chiSquare = fitInPlace(observed, patternOf(e, carbon), noise);
    const i = fits.count++;
    fits.entry[i] = index;
    fits.carbon[i] = carbon;
    fits.score[i] = chiSquare + e.sulfurCost + e.siliconCost;
    fits.chiSquare[i] = chiSquare;
    fits.scale[i] = lastFit.scale;
    fits.minusOne[i] = lastFit.minusOne;
    fits.minusTwo[i] = lastFit.minusTwo;
  }
}

/** The fit positions in the order a stable sort by score puts them (of equal scores, the first fitted first). */
function byScore(positions: number[]): number[] {
  return positions.sort((a, b) => (fits.score[a] as number) - (fits.score[b] as number));
}

/** The first of a hypothesis' fits by score, or −1 without any. */
function firstOf(from: number): number {
  let first = -1;
  for (let i = from; i < fits.count; i += 1) {
    const score = fits.score[i] as number;
    // A NaN score orders as the sort leaves it; take the sort's answer then.
    if (!Number.isFinite(score)) return byScore(Array.from({ length: fits.count - from }, (_, k) => from + k))[0] as number;
    if (first < 0 || score < (fits.score[first] as number)) first = i;
  }
  return first;
}

function hypothesisFit(m: number, observed: Float64Array, i: number): HypothesisFit {
  const all = entries as HypothesisEntry[];
  const fit: PatternFit = {
    chiSquare: fits.chiSquare[i] as number,
    points: observed.length,
    scale: fits.scale[i] as number,
    shiftedScales: [fits.minusOne[i] as number, fits.minusTwo[i] as number],
  };
  return { m, h: (all[fits.entry[i] as number] as HypothesisEntry).h, carbon: fits.carbon[i] as number, fit, score: fits.score[i] as number, observed };
}

/**
 * Fits every heteroatom hypothesis to the observed intensities from `m − LEAD_DA` to `endMz`, with
 * carbon near the M+1 estimate (raw, then corrected for the fitted [M−H]+ share), best first by χ²
 * plus a prior cost per S/Si atom. `observed` of each result starts at `m − LEAD_DA`.
 *
 * `within` keeps only the fits whose score is at most that much above the best one's (every fit is
 * still made; the list is the same as the whole list's first part). Should any score not be finite,
 * the whole list comes back, ordered as a stable sort orders it.
 */
export function fitHypothesesAt(intensity: ReadonlyMap<number, number>, m: number, endMz: number, noise: NoiseModel, within = Number.POSITIVE_INFINITY): HypothesisFit[] {
  const start = m - LEAD_DA;
  const length = Math.max(LEAD_DA + 2, endMz + 1 - start);
  const observed = new Float64Array(length);
  for (let k = 0; k < length; k += 1) observed[k] = intensity.get(start + k) ?? 0;
  const all = (entries ??= hypotheses(Number.POSITIVE_INFINITY).map(entryOf));
  reserve(6 * all.length);
  fits.count = 0;
  for (let index = 0; index < all.length; index += 1) {
    const e = all[index] as HypothesisEntry;
    if (e.massDa > m) continue;
    const maxCarbon = Math.floor((m - e.massDa) / 12);
    const from = fits.count;
    tryAround(observed, noise, index, e, maxCarbon, from, carbonEstimate(e, observed[LEAD_DA] as number, observed[LEAD_DA + 1] as number));
    const first = firstOf(from);
    if (first >= 0 && ((fits.minusOne[first] as number) > 0 || (fits.minusTwo[first] as number) > 0)) {
      const pattern = patternOf(e, fits.carbon[first] as number);
      const minusOne = fits.minusOne[first] as number;
      const minusTwo = fits.minusTwo[first] as number;
      tryAround(observed, noise, index, e, maxCarbon, from, carbonEstimate(e, shareWithout(observed, pattern, minusOne, minusTwo, 0), shareWithout(observed, pattern, minusOne, minusTwo, 1)));
    }
  }
  let best = -1;
  let finite = true;
  for (let i = 0; i < fits.count; i += 1) {
    const score = fits.score[i] as number;
    if (!Number.isFinite(score)) finite = false;
    else if (best < 0 || score < (fits.score[best] as number)) best = i;
  }
  const kept: number[] = [];
  if (!finite) {
    for (let i = 0; i < fits.count; i += 1) kept.push(i);
  } else if (best >= 0) {
    const bestScore = fits.score[best] as number;
    for (let i = 0; i < fits.count; i += 1) if ((fits.score[i] as number) - bestScore <= within) kept.push(i);
  }
  return byScore(kept).map((i) => hypothesisFit(m, observed, i));
}
