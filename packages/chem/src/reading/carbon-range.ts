import { clusterPattern, HYDROGEN_PER_CARBON, isotopeRatio, type HeteroatomHypothesis, heteroatomMassDa } from './cluster-model';
import type { NoiseModel } from './fit-cluster';

/** Carbon count range, whole atoms, and the central estimate (one decimal). */
export interface CarbonRange {
  min: number;
  max: number;
  estimate: number;
}

/** How many standard deviations of the M+1/M ratio the range spans on each side. */
const SIGMAS = 2;

/**
 * Carbon count from the M+1/M ratio: 13C adds 1.08 % of M per carbon (SCIENCE.md §1), hydrogen
 * 0.0115 %/H (H/C taken 1–2), nitrogen 0.37 %/N (1–3 N when M is odd, 0–2 when even), and the
 * hypotheses' S and Si their own M+1 (0.79 %/S, 5.08 %/Si). The range spans ±2σ of the ratio
 * from the noise model and the union over the given heteroatom hypotheses.
 */
export function carbonRange(input: {
  m: number;
  observed: Float64Array;
  noise: NoiseModel;
  hypotheses: readonly HeteroatomHypothesis[];
  oddNitrogen: boolean;
}): (CarbonRange & { explanation: string }) | null {
  const o0 = input.observed[0] ?? 0;
  const o1 = input.observed[1] ?? 0;
  if (o0 <= 0 || input.hypotheses.length === 0) return null;
  const sigma = (value: number): number => input.noise.relative * value + input.noise.absolute;
  const ratio = o1 / o0;
  const ratioSigma = Math.sqrt((sigma(o1) / o0) ** 2 + ((ratio * sigma(o0)) / o0) ** 2);
  const c13 = isotopeRatio('C');
  const h2 = isotopeRatio('H');
  const n15 = isotopeRatio('N');
  const nitrogen = input.oddNitrogen ? { fewest: 1, most: 3, typical: 1 } : { fewest: 0, most: 2, typical: 0 };
  let min = Number.POSITIVE_INFINITY;
  let max = Number.NEGATIVE_INFINITY;
  let estimate = Number.NaN;
  let heteroShare = 0;
  for (const h of input.hypotheses) {
    const base = clusterPattern(h, 0);
    const hetero = (base[1] ?? 0) / (base[0] as number);
    const maxCarbon = Math.max(0, Math.floor((input.m - heteroatomMassDa(h)) / 12));
    const low = (ratio - SIGMAS * ratioSigma - hetero - nitrogen.most * n15) / (c13 + 2 * h2);
    const high = (ratio + SIGMAS * ratioSigma - hetero - nitrogen.fewest * n15) / (c13 + 1 * h2);
    min = Math.min(min, Math.max(0, Math.floor(low)));
    max = Math.max(max, Math.min(maxCarbon, Math.ceil(high)));
    if (Number.isNaN(estimate)) {
      estimate = Math.max(0, (ratio - hetero - nitrogen.typical * n15) / (c13 + HYDROGEN_PER_CARBON * h2));
      heteroShare = hetero;
    }
  }
  if (max < min) max = min;
  const perCarbon = (c13 + HYDROGEN_PER_CARBON * h2) * 100;
  const explanation =
    `M+1/M = ${(ratio * 100).toFixed(2)} ± ${(ratioSigma * 100).toFixed(2)} %` +
    (heteroShare > 0 ? `, less ${(heteroShare * 100).toFixed(2)} % from S/Si` : '') +
    (nitrogen.typical ? `, less ${(n15 * 100).toFixed(2)} % for one N` : '') +
    `, at ${perCarbon.toFixed(3)} % per C (13C with ${HYDROGEN_PER_CARBON} H/C) → ${estimate.toFixed(1)} C;` +
    ` range C${min}–C${max} (±${SIGMAS}σ of the ratio, H/C 1–2, N ${nitrogen.fewest}–${nitrogen.most})`;
  return { min, max, estimate: Math.round(estimate * 10) / 10, explanation };
}
