import { clusterPattern, heteroatomMassDa, hypotheses, type HeteroatomHypothesis } from './cluster-model';
import { fitPattern, type NoiseModel, type PatternFit } from './fit-cluster';

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

/** Largest χ² taken as a fit for `points` compared m/z: dof + 4√(2·dof) + 4, dof = points − 2. */
export function acceptableChiSquare(points: number): number {
  const dof = Math.max(1, points - 2);
  return dof + 4 * Math.sqrt(2 * dof) + 4;
}

/** Whether a fit is acceptable by {@link acceptableChiSquare}. */
export function acceptable(fit: PatternFit): boolean {
  return fit.chiSquare <= acceptableChiSquare(fit.points);
}

/**
 * Fits every heteroatom hypothesis (with carbon near the M+1 estimate) to the observed intensities
 * from `m` to `endMz`, best first by χ² plus a prior cost per S/Si atom.
 */
export function fitHypothesesAt(intensity: ReadonlyMap<number, number>, m: number, endMz: number, noise: NoiseModel): HypothesisFit[] {
  const length = Math.max(2, endMz + 1 - m);
  const observed = new Float64Array(length);
  for (let k = 0; k < length; k += 1) observed[k] = intensity.get(m + k) ?? 0;
  const o0 = observed[0] as number;
  const o1 = observed[1] as number;
  const out: HypothesisFit[] = [];
  for (const h of hypotheses(m)) {
    const maxCarbon = Math.floor((m - heteroatomMassDa(h)) / 12);
    const base = clusterPattern(h, 0);
    const perCarbon = clusterPattern(h, 1);
    const carbonStep = (perCarbon[1] as number) / (perCarbon[0] as number) - (base[1] ?? 0) / (base[0] as number);
    const estimate = (o1 / o0 - (base[1] ?? 0) / (base[0] as number)) / carbonStep;
    const centre = Math.min(maxCarbon, Math.max(0, Math.round(estimate)));
    for (let carbon = Math.max(0, centre - 1); carbon <= Math.min(maxCarbon, centre + 1); carbon += 1) {
      if (carbon === 0 && heteroatomMassDa(h) === 0) continue;
      const fit = fitPattern(observed, clusterPattern(h, carbon), noise);
      const score = fit.chiSquare + PENALTY.sulfur * h.sulfur + PENALTY.silicon * h.silicon;
      out.push({ m, h, carbon, fit, score, observed });
    }
  }
  return out.sort((a, b) => a.score - b.score);
}

