import { isotopeCluster, nominalMass, type PeakList } from '@ionfolio/chem';

/** One line of the cluster overlay: a peak from M up, observed and theoretical, both as % of M. */
export type ClusterOverlayRow = {
  /** Distance from M in Da: 0 for M, 1 for M+1 … */
  offset: number;
  mz: number;
  /** Observed intensity at this m/z as % of the observed M, or null when the spectrum has no peak there. */
  observedPctOfM: number | null;
  /** Theoretical intensity of the formula's cluster as % of its M, or null below the listing floor. */
  theoreticalPctOfM: number | null;
};

export type ClusterOverlay =
  | { kind: 'rows'; molecularIonMz: number; rows: ClusterOverlayRow[] }
  /** The formula cannot be read by packages/chem. */
  | { kind: 'bad-formula' }
  /** The spectrum has no peak at the formula's nominal mass, so nothing can be put on the M scale. */
  | { kind: 'no-m'; molecularIonMz: number };

/** Theoretical peaks below this share of M are not listed (they are too small to see beside the observed). */
const MIN_THEORETICAL_PCT_OF_M = 0.5;

/**
 * The formula's isotope cluster (packages/chem, isotope table of SCIENCE.md §1) beside the spectrum's
 * own peaks at the same m/z, both scaled so that M (the formula's nominal mass) is 100 — not to the
 * most intense peak, so that Br clusters read the same way as the rest.
 */
export function clusterOverlay(peaks: PeakList, formula: string): ClusterOverlay {
  let theory: { mz: number; relIntensity: number }[];
  let m: number;
  try {
    theory = isotopeCluster(formula, { minRelIntensity: 0 });
    m = nominalMass(formula);
  } catch {
    return { kind: 'bad-formula' };
  }
  const observedAt = new Map<number, number>();
  for (const [mz, intensity] of peaks) {
    const nominal = Math.round(mz);
    observedAt.set(nominal, (observedAt.get(nominal) ?? 0) + intensity);
  }
  const observedM = observedAt.get(m) ?? 0;
  if (observedM <= 0) return { kind: 'no-m', molecularIonMz: m };
  const theoryM = theory.find((p) => p.mz === m)?.relIntensity ?? 0;
  const theoretical = new Map(
    theory
      .map((p) => [p.mz, theoryM > 0 ? (p.relIntensity / theoryM) * 100 : 0] as const)
      .filter(([, pct]) => pct >= MIN_THEORETICAL_PCT_OF_M),
  );
  const lastMz = Math.max(m, ...theoretical.keys());
  const rows: ClusterOverlayRow[] = [];
  for (let mz = m; mz <= lastMz; mz += 1) {
    const observed = observedAt.get(mz);
    rows.push({
      offset: mz - m,
      mz,
      observedPctOfM: observed === undefined ? null : (observed / observedM) * 100,
      theoreticalPctOfM: theoretical.get(mz) ?? null,
    });
  }
  return { kind: 'rows', molecularIonMz: m, rows };
}
