// Simulated EI spectra with known answers, for tests only (invented data, no real spectrum):
// molecular-ion cluster from isotopeCluster (SCIENCE.md §1 isotope table), fragments below M
// ([M−H]+ in a third of them, loss of CH3, Cl, Br and small alkyl ions), multiplicative and additive intensity noise.
import { gaussian, seededRandom } from '../isotopes/seeded-random';
import { isotopeCluster } from '../isotopes/isotope-cluster';
import { nominalMass } from '../formula/nominal-mass';
import type { ElementCounts } from '../elements/elements';
import { formatFormula } from '../formula/format-formula';
import type { Peak } from '../types';

/** One simulated spectrum and the truth behind it. */
export interface SimulatedCase {
  formula: string;
  counts: { C: number; H: number; N: number; O: number; S: number; Cl: number; Br: number };
  molecularIonMz: number;
  peaks: Peak[];
}

/** Ranges of the simulation: 0–4 Cl, 0–3 Br, 0–2 S, C1–C30 (issue 3 acceptance), N 0–2, O 0–3. */
export interface SimulationSettings {
  /** Share of spectra that get an [M−H]+ cluster (5–40 % of the molecular-ion cluster). */
  hydrogenLossShare: number;
  relativeNoise: number;
  absoluteNoise: number;
  detectionFloor: number;
}

export const DEFAULT_SIMULATION: SimulationSettings = { hydrogenLossShare: 1 / 3, relativeNoise: 0.03, absoluteNoise: 0.03, detectionFloor: 0.05 };

function integer(random: () => number, min: number, max: number): number {
  return min + Math.floor(random() * (max - min + 1));
}

function addCluster(into: Map<number, number>, formula: ElementCounts, topIntensity: number): void {
  for (const peak of isotopeCluster(formula, { minRelIntensity: 0.001 })) {
    into.set(peak.mz, (into.get(peak.mz) ?? 0) + (peak.relIntensity / 100) * topIntensity);
  }
}

/** Makes `count` simulated spectra from a seed; the same seed gives the same spectra. */
export function simulateSpectra(seed: number, count: number, settings: SimulationSettings = DEFAULT_SIMULATION): SimulatedCase[] {
  const random = seededRandom(seed);
  const normal = gaussian(random);
  const cases: SimulatedCase[] = [];
  while (cases.length < count) {
    const C = integer(random, 1, 30);
    const Cl = integer(random, 0, 4);
    const Br = integer(random, 0, 3);
    const S = integer(random, 0, 2);
    const N = random() < 0.6 ? 0 : integer(random, 1, 2);
    const O = integer(random, 0, 3);
    const maxH = 2 * C + 2 + N - Cl - Br;
    if (maxH < 0) continue;
    const H = maxH - 2 * integer(random, 0, Math.min(6, Math.floor(maxH / 2)));
    const counts = { C, H, N, O, S, Cl, Br };
    const molecule: ElementCounts = Object.fromEntries(Object.entries(counts).filter(([, n]) => n > 0));
    const M = nominalMass(molecule);
    const raw = new Map<number, number>();
    const clusterTop = 10 + random() * 90;
    addCluster(raw, molecule, clusterTop);
    if (H > 0 && random() < settings.hydrogenLossShare) addCluster(raw, { ...molecule, H: H - 1 }, clusterTop * (0.05 + random() * 0.35));
    const fragments: ElementCounts[] = [];
    if (C >= 2 && H >= 3) fragments.push({ ...molecule, C: C - 1, H: H - 3 });
    if (Cl > 0) fragments.push({ ...molecule, Cl: Cl - 1 });
    if (Br > 0) fragments.push({ ...molecule, Br: Br - 1 });
    for (let k = 1; k <= Math.min(C, 6); k += 1) if (14 * k + 1 <= M - 15 && random() < 0.5) fragments.push({ C: k, H: 2 * k + 1 });
    const usable = fragments.filter((f) => Object.values(f).some((n) => (n ?? 0) > 0));
    usable.forEach((fragment, index) => addCluster(raw, fragment, index === 0 ? 100 : 5 + random() * 90));
    const peaks: Peak[] = [];
    for (const [mz, value] of [...raw.entries()].sort((a, b) => a[0] - b[0])) {
      const noisy = value * (1 + settings.relativeNoise * normal()) + settings.absoluteNoise * normal();
      if (noisy >= settings.detectionFloor) peaks.push([mz, Math.round(noisy * 100) / 100]);
    }
    cases.push({ formula: formatFormula(molecule), counts, molecularIonMz: M, peaks });
  }
  return cases;
}
