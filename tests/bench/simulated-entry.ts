// One simulated library entry for the benchmarks: an invented formula from realistic element ranges,
// fragments from packages/chem's simulated spectra, and the molecular-ion isotope cluster of the formula.
import {
  isotopeCluster,
  monoisotopicMass,
  nominalMass,
  simulatedReplicate,
  simulatedSpectrum,
} from '@ionfolio/chem';

export interface SimulatedEntry {
  name: string;
  formula: string;
  nominalMass: number;
  monoisotopicMass: number;
  /** Base peak 100, two decimals, sorted by m/z. */
  peaks: [number, number][];
  retentionIndex: number | null;
}

const SYLLABLES = [
  ['lin', 'ger', 'cit', 'myr', 'car', 'thy', 'eug', 'van', 'ion', 'dam', 'pel', 'sor', 'tam', 'bor', 'fen'],
  ['al', 'ol', 'ene', 'one', 'ate', 'ide', 'yl', 'ine', 'ane'],
  ['ox', 'ram', 'tex', 'mel', 'qui', 'dor', 'vin', 'zan'],
];

const pick = <T>(random: () => number, items: readonly T[]): T => items[Math.floor(random() * items.length)]!;

function count(random: () => number, weights: readonly number[]): number {
  let r = random() * weights.reduce((a, b) => a + b, 0);
  for (const [i, w] of weights.entries()) {
    r -= w;
    if (r < 0) return i;
  }
  return weights.length - 1;
}

/**
 * A formula drawn from ranges typical of GC–MS-amenable compounds (common practice, from memory):
 * C 4–30, N 0–2, O 0–4, sometimes Cl, Br, F or S; hydrogens from a ring-plus-double-bond count 0–8.
 * Hill order.
 */
export function simulatedFormula(random: () => number): string {
  const c = 4 + Math.floor(Math.pow(random(), 1.3) * 27);
  const n = count(random, [75, 18, 7]);
  const o = count(random, [35, 30, 18, 10, 7]);
  const cl = random() < 0.1 ? 1 + count(random, [60, 30, 10]) : 0;
  const br = random() < 0.04 ? 1 + count(random, [80, 20]) : 0;
  const f = random() < 0.04 ? 1 + count(random, [50, 20, 30]) : 0;
  const s = random() < 0.05 ? 1 : 0;
  const maxH = 2 * c + 2 + n - cl - br - f;
  let rings = Math.floor(random() * Math.min(9, c));
  while (maxH - 2 * rings < 0) rings--;
  const h = maxH - 2 * rings;
  const part = (symbol: string, atoms: number) =>
    atoms === 0 ? '' : atoms === 1 ? symbol : `${symbol}${atoms}`;
  return (
    part('C', c) +
    part('H', h) +
    part('Br', br) +
    part('Cl', cl) +
    part('F', f) +
    part('N', n) +
    part('O', o) +
    part('S', s)
  );
}

const clusterCache = new Map<string, { mz: number; relIntensity: number }[]>();

function molecularCluster(formula: string) {
  let cluster = clusterCache.get(formula);
  if (!cluster) {
    cluster = isotopeCluster(formula, { minRelIntensity: 0.5 });
    if (clusterCache.size > 50_000) clusterCache.clear();
    clusterCache.set(formula, cluster);
  }
  return cluster;
}

/** Base peak 100, intensities rounded to two decimals, peaks below 0.01 dropped, sorted by m/z. */
export function normalised(peaks: Iterable<readonly [number, number]>): [number, number][] {
  const list = [...peaks];
  const max = Math.max(...list.map(([, i]) => i));
  return list
    .map(([mz, i]): [number, number] => [mz, Math.round((i / max) * 10000) / 100])
    .filter(([, i]) => i >= 0.01)
    .sort((a, b) => a[0] - b[0]);
}

function withMolecularIon(
  random: () => number,
  formula: string,
  fragments: readonly (readonly [number, number])[],
): [number, number][] {
  const byMz = new Map<number, number>(fragments.map(([mz, i]) => [mz, i]));
  // About one in seven EI spectra shows no molecular ion (alcohols, branched alkanes): common practice.
  if (random() >= 0.15) {
    const scale = (100 * Math.max(0.02, Math.pow(random(), 2))) / 100;
    for (const { mz, relIntensity } of molecularCluster(formula))
      byMz.set(mz, Math.max(byMz.get(mz) ?? 0, relIntensity * scale));
  }
  return normalised(byMz);
}

function retentionIndex(random: () => number, massDa: number): number | null {
  return random() < 0.6 ? Math.round(600 + massDa * 7 + (random() - 0.5) * 400) : null;
}

/**
 * Simulated entries in families: a parent and, three times in ten, 1–4 isomers (same formula) whose
 * spectra are perturbed copies of the parent's, so that near neighbours exist as for real isomers.
 */
export function* simulatedEntries(random: () => number): Generator<SimulatedEntry> {
  let serial = 0;
  for (;;) {
    const formula = simulatedFormula(random);
    const massDa = nominalMass(formula);
    const mono = monoisotopicMass(formula);
    const fragments = simulatedSpectrum(random, {
      minMz: 26,
      maxMz: Math.max(40, massDa - 1),
      peakCount: 25 + Math.floor(random() * 40),
    });
    const stem = pick(random, SYLLABLES[0]!) + pick(random, SYLLABLES[1]!) + pick(random, SYLLABLES[2]!);
    const name = `${stem[0]!.toUpperCase()}${stem.slice(1)} ${++serial}`;
    const parent = withMolecularIon(random, formula, fragments);
    yield {
      name,
      formula,
      nominalMass: massDa,
      monoisotopicMass: mono,
      peaks: parent,
      retentionIndex: retentionIndex(random, massDa),
    };
    const isomers = random() < 0.3 ? 1 + Math.floor(random() * 4) : 0;
    for (let i = 0; i < isomers; i++) {
      const peaks = normalised(
        simulatedReplicate(parent, random, { noise: 0.4, dropFraction: 0.2, extraPeaks: 5, maxMz: massDa }),
      );
      yield {
        name: `${name} isomer ${i + 1}`,
        formula,
        nominalMass: massDa,
        monoisotopicMass: mono,
        peaks,
        retentionIndex: retentionIndex(random, massDa),
      };
    }
  }
}
