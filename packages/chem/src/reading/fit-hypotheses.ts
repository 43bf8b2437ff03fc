import { clusterPattern, heteroatomMassDa, hypotheses, type HeteroatomHypothesis } from './cluster-model';
import { fitPattern, LEAD_DA, moleculeShare, type NoiseModel, type PatternFit } from './fit-cluster';

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

function carbonEstimate(h: HeteroatomHypothesis, m0: number, m1: number): number {
  const base = clusterPattern(h, 0);
  const perCarbon = clusterPattern(h, 1);
  const heteroRatio = (base[1] ?? 0) / (base[0] as number);
  const carbonStep = (perCarbon[1] as number) / (perCarbon[0] as number) - heteroRatio;
  return m0 > 0 ? (m1 / m0 - heteroRatio) / carbonStep : 0;
}

/**
 * Fits every heteroatom hypothesis to the observed intensities from `m − LEAD_DA` to `endMz`, with
 * carbon near the M+1 estimate (raw, then corrected for the fitted [M−H]+ share), best first by χ²
 * plus a prior cost per S/Si atom. `observed` of each result starts at `m − LEAD_DA`.
 */
export function fitHypothesesAt(intensity: ReadonlyMap<number, number>, m: number, endMz: number, noise: NoiseModel): HypothesisFit[] {
  const start = m - LEAD_DA;
  const length = Math.max(LEAD_DA + 2, endMz + 1 - start);
  const observed = new Float64Array(length);
  for (let k = 0; k < length; k += 1) observed[k] = intensity.get(start + k) ?? 0;
  const out: HypothesisFit[] = [];
  for (const h of hypotheses(m)) {
    const maxCarbon = Math.floor((m - heteroatomMassDa(h)) / 12);
    const tried = new Map<number, HypothesisFit>();
    const tryAround = (estimate: number): void => {
      const centre = Math.min(maxCarbon, Math.max(0, Math.round(estimate)));
      for (let carbon = Math.max(0, centre - 1); carbon <= Math.min(maxCarbon, centre + 1); carbon += 1) {
        if (tried.has(carbon) || (carbon === 0 && heteroatomMassDa(h) === 0)) continue;
        const fit = fitPattern(observed, clusterPattern(h, carbon), noise);
        const score = fit.chiSquare + PENALTY.sulfur * h.sulfur + PENALTY.silicon * h.silicon;
        tried.set(carbon, { m, h, carbon, fit, score, observed });
      }
    };
    tryAround(carbonEstimate(h, observed[LEAD_DA] as number, observed[LEAD_DA + 1] as number));
    const first = [...tried.values()].sort((a, b) => a.score - b.score)[0];
    if (first && (first.fit.shiftedScales[0] > 0 || first.fit.shiftedScales[1] > 0)) {
      const pattern = clusterPattern(h, first.carbon);
      tryAround(carbonEstimate(h, moleculeShare(observed, pattern, first.fit, 0), moleculeShare(observed, pattern, first.fit, 1)));
    }
    out.push(...tried.values());
  }
  return out.sort((a, b) => a.score - b.score);
}
