import { readMolecularIon, type PeakList } from '@ionfolio/chem';

/** The m/z values a stick plot labels: the base peak and the molecular-ion cluster. */
export type SpectrumLabels = {
  basePeakMz: number | null;
  /** M and the isotope peaks after it that stand out (≥ 10 % of M), sorted by m/z. */
  clusterMz: number[];
};

/** How far above M the cluster is labelled: Cl6 reaches M+12 (SCIENCE.md §1 clusters). */
const CLUSTER_SPAN_DA = 12;
/** An isotope peak is labelled when it is at least this share of M (common practice: keep labels few). */
const CLUSTER_LABEL_SHARE = 0.1;

/**
 * Which sticks carry a label. `molecularIonMz` is the nominal mass of the formula when one is known;
 * without it the molecular-ion reading of packages/chem decides (no label when M is likely absent).
 */
export function spectrumLabels(peaks: PeakList, molecularIonMz?: number | null): SpectrumLabels {
  const positive = peaks.filter(([, intensity]) => intensity > 0);
  if (positive.length === 0) return { basePeakMz: null, clusterMz: [] };
  const base = positive.reduce((best, peak) => (peak[1] > best[1] ? peak : best));
  let m = molecularIonMz ?? null;
  if (molecularIonMz === undefined) {
    try {
      m = readMolecularIon(positive, { suggestLimit: 0 }).molecularIonMz;
    } catch {
      m = null;
    }
  }
  if (m === null) return { basePeakMz: base[0], clusterMz: [] };
  const at = new Map(positive.map(([mz, intensity]) => [Math.round(mz), intensity]));
  const mIntensity = at.get(m);
  if (mIntensity === undefined) return { basePeakMz: base[0], clusterMz: [] };
  const clusterMz = [m];
  for (let mz = m + 1; mz <= m + CLUSTER_SPAN_DA; mz += 1) {
    const intensity = at.get(mz);
    if (intensity !== undefined && intensity >= mIntensity * CLUSTER_LABEL_SHARE) clusterMz.push(mz);
  }
  return { basePeakMz: base[0], clusterMz };
}
