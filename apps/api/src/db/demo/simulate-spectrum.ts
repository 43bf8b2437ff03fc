import { isotopeCluster, nominalMass, parseFormula, rdbe, type ElementCounts, type ElementSymbol } from '@ionfolio/chem';
import { demoRandom, demoTextHash } from './demo-random';

/** Options of {@link simulateSpectrum}. */
export interface SimulateSpectrumOptions {
  /**
   * 0 (default): the compound's own simulated pattern. Another integer: the same compound "on another
   * instrument" — every fragment's intensity scaled by its own factor of 0.7–1.4, fixed per variant.
   */
  variant?: number;
  /** Lowest m/z kept (the scan range start); peaks below it are dropped before normalising. Default 1. */
  fromMz?: number;
}

/** What the simulator reads from a structure: crude text patterns of the SMILES, not a parser. */
interface Traits {
  aromatic: boolean;
  hydroxyl: boolean;
  thiol: boolean;
  aldehyde: boolean;
  acetyl: boolean;
  acetate: boolean;
  methoxy: boolean;
  ethoxy: boolean;
  acid: boolean;
  tms: boolean;
  nitro: boolean;
  nitrile: boolean;
  gemDimethyl: boolean;
  benzoyl: boolean;
  chloromethyl: boolean;
  bromomethyl: boolean;
  phthalate: boolean;
  acyclic: boolean;
  terpenoid: boolean;
  halogenated: boolean;
  saturatedChain: boolean;
  /** Share of heavy atoms that are aromatic (0–1), from the SMILES; 1 when guessed from the formula. */
  aromaticShare: number;
}

/** A fragment rule: a neutral loss from M or an ion, with an intensity range before normalising. */
interface Rule {
  kind: 'loss' | 'ion';
  atoms: ElementCounts;
  /** Intensity range (base peak ~100) from which the compound's pattern draws one value. */
  weight: readonly [min: number, max: number];
  when: (t: Traits) => boolean;
  /** A characteristic fragment, always kept; other rules are kept with probability 0.85 for variety. */
  core?: boolean;
}

const always = (): boolean => true;
const f = (text: string): ElementCounts => parseFormula(text);

function readTraits(counts: ElementCounts, smiles: string | undefined): Traits {
  const c = counts.C ?? 0;
  const h = counts.H ?? 0;
  const s = smiles ?? '';
  const aromatic = smiles === undefined ? rdbe(counts) >= 4 && c >= 6 : /c/.test(s);
  const acyclic = smiles !== undefined && !/\d/.test(s.replace(/\[[^\]]*\]/g, ''));
  const heavyAtoms = Object.entries(counts).reduce((n, [symbol, count]) => (symbol === 'H' ? n : n + (count ?? 0)), 0);
  const aromaticAtoms = (s.match(/[cnos]/g) ?? []).length;
  const ring = rdbe(counts);
  return {
    aromatic,
    // O ending a branch or the string, or opening it, not as =O or a ring bond.
    hydroxyl: /(^O[^=]|[^=]O\)|[^=]O$)/.test(s),
    thiol: /(^S[^=]|[^=S]S\)|[^=S]S$)/.test(s),
    aldehyde: /(^O=C[^(\d]|[^)\d]C=O(\)|$))/.test(s),
    acetyl: /(^CC\(=O\)|C\(C\)=O)/.test(s),
    acetate: /(^CC\(=O\)O|OC\(C\)=O)/.test(s),
    methoxy: /(^CO[^)=]|[^C]OC$|\(OC\))/.test(s),
    ethoxy: /(^CCO[^)=]|[^C]OCC$)/.test(s),
    acid: /(C\(=O\)O$|^OC\(=O\))/.test(s),
    tms: /\[Si\]\(C\)\(C\)C|C\[Si\]\(C\)\(C\)/.test(s),
    nitro: /\[N\+\]\(\[O-\]\)|\[N\+\]\(=O\)\[O-\]/.test(s),
    nitrile: /C#N|N#C/.test(s),
    gemDimethyl: /\(C\)\(C\)|C\d\(C\)|C\(C\)\(/.test(s),
    benzoyl: /C\(=O\)c|c1ccccc1C\(=O\)|O=C\(c|\)c1ccccc1$/.test(s) && /c1ccccc1/.test(s) && /C\(=O\)|O=C\(/.test(s),
    chloromethyl: /CCl|ClC[^l]|ClC$/.test(s),
    bromomethyl: /CBr|BrC/.test(s),
    phthalate: /c1ccccc1C\(=O\)O/.test(s) && (counts.O ?? 0) >= 4,
    acyclic,
    terpenoid: !aromatic && c >= 9 && c <= 16 && h >= c + 2 && ring >= 2,
    halogenated: (counts.Cl ?? 0) + (counts.Br ?? 0) > 0,
    saturatedChain: ring <= 2 && h >= 2 * c - 2,
    aromaticShare: smiles === undefined ? (aromatic ? 1 : 0) : heavyAtoms === 0 ? 0 : aromaticAtoms / heavyAtoms,
  };
}

/**
 * Neutral losses from M (SCIENCE.md §6, Lange's Handbook of Chemistry, 15th ed., §7.8, plus the loss
 * of acetic acid, 60, common practice for acetates) and low-mass ions (same sources; the hydrocarbon
 * series 27/39/41/55/67/69/79/81/93 and the siloxane ion 75 are common practice). Intensity ranges
 * are invented for the demo.
 */
const RULES: readonly Rule[] = [
  { kind: 'loss', atoms: f('H'), weight: [3, 25], when: (t) => t.aldehyde || t.aromatic },
  { kind: 'loss', atoms: f('CH3'), weight: [3, 25], when: (t) => !t.tms && !t.gemDimethyl },
  { kind: 'loss', atoms: f('CH3'), weight: [10, 50], when: (t) => !t.tms && t.gemDimethyl },
  { kind: 'loss', atoms: f('CH3'), weight: [60, 100], when: (t) => t.tms, core: true },
  { kind: 'loss', atoms: f('OH'), weight: [5, 25], when: (t) => t.acid || (t.hydroxyl && t.aromatic) },
  { kind: 'loss', atoms: f('H2O'), weight: [10, 50], when: (t) => t.hydroxyl && !t.aromatic && !t.acid },
  { kind: 'loss', atoms: f('CO'), weight: [8, 40], when: (t) => t.aromatic && !t.tms && !t.nitro },
  { kind: 'loss', atoms: f('C2H4'), weight: [8, 40], when: (t) => t.ethoxy },
  { kind: 'loss', atoms: f('CHO'), weight: [5, 40], when: (t) => t.aldehyde || (t.hydroxyl && t.aromatic) },
  { kind: 'loss', atoms: f('C2H5'), weight: [5, 30], when: (t) => t.acyclic && !t.aromatic },
  { kind: 'loss', atoms: f('CH2O'), weight: [5, 20], when: (t) => t.methoxy && t.aromatic },
  { kind: 'loss', atoms: f('CH3O'), weight: [10, 60], when: (t) => t.methoxy, core: true },
  { kind: 'loss', atoms: f('HS'), weight: [5, 30], when: (t) => t.thiol },
  { kind: 'loss', atoms: f('H2S'), weight: [5, 30], when: (t) => t.thiol },
  { kind: 'loss', atoms: f('Cl'), weight: [15, 90], when: always, core: true },
  { kind: 'loss', atoms: f('HCl'), weight: [3, 20], when: always },
  { kind: 'loss', atoms: f('C2H2O'), weight: [5, 30], when: (t) => t.acetyl || t.acetate },
  { kind: 'loss', atoms: f('C3H7'), weight: [5, 40], when: (t) => t.gemDimethyl && !t.tms },
  { kind: 'loss', atoms: f('C2H3O'), weight: [10, 50], when: (t) => t.acetyl },
  { kind: 'loss', atoms: f('C2H5O'), weight: [10, 60], when: (t) => t.ethoxy },
  { kind: 'loss', atoms: f('CHO2'), weight: [10, 40], when: (t) => t.acid },
  { kind: 'loss', atoms: f('C2H4O2'), weight: [10, 80], when: (t) => t.acetate, core: true },
  { kind: 'loss', atoms: f('NO2'), weight: [30, 90], when: (t) => t.nitro, core: true },
  { kind: 'loss', atoms: f('NO'), weight: [5, 20], when: (t) => t.nitro },
  { kind: 'loss', atoms: f('HCN'), weight: [10, 40], when: (t) => t.nitrile || (t.aromatic && !t.nitro) },
  { kind: 'loss', atoms: f('Br'), weight: [25, 100], when: always, core: true },
  { kind: 'loss', atoms: f('HBr'), weight: [3, 15], when: always },
  { kind: 'ion', atoms: f('CH3'), weight: [1, 8], when: always },
  { kind: 'ion', atoms: f('C2H3'), weight: [5, 30], when: (t) => !t.aromatic },
  { kind: 'ion', atoms: f('C2H5'), weight: [10, 40], when: (t) => !t.aromatic },
  { kind: 'ion', atoms: f('CHO'), weight: [5, 30], when: (t) => t.aldehyde },
  { kind: 'ion', atoms: f('CH3O'), weight: [10, 60], when: (t) => t.hydroxyl || t.methoxy },
  { kind: 'ion', atoms: f('C3H3'), weight: [5, 25], when: always },
  { kind: 'ion', atoms: f('C3H5'), weight: [10, 60], when: (t) => !t.aromatic },
  { kind: 'ion', atoms: f('C3H7'), weight: [10, 90], when: (t) => !t.aromatic && !t.acetyl && !t.acetate },
  { kind: 'ion', atoms: f('C2H3O'), weight: [40, 100], when: (t) => t.acetyl || t.acetate, core: true },
  { kind: 'ion', atoms: f('CH3S'), weight: [10, 50], when: always },
  { kind: 'ion', atoms: f('CH2Cl'), weight: [10, 50], when: (t) => t.chloromethyl },
  { kind: 'ion', atoms: f('C4H3'), weight: [5, 25], when: (t) => t.aromatic },
  { kind: 'ion', atoms: f('C4H7'), weight: [10, 60], when: (t) => !t.aromatic },
  { kind: 'ion', atoms: f('C4H9'), weight: [10, 80], when: (t) => (!t.aromatic && t.saturatedChain) || t.gemDimethyl },
  { kind: 'ion', atoms: f('C5H5'), weight: [5, 30], when: (t) => t.aromatic },
  { kind: 'ion', atoms: f('C5H7'), weight: [10, 40], when: (t) => t.terpenoid },
  { kind: 'ion', atoms: f('C5H9'), weight: [10, 100], when: (t) => t.terpenoid || t.acyclic },
  { kind: 'ion', atoms: f('C5H11'), weight: [5, 40], when: (t) => t.acyclic && !t.aromatic },
  { kind: 'ion', atoms: f('C3H9Si'), weight: [40, 100], when: (t) => t.tms, core: true },
  { kind: 'ion', atoms: f('C2H7OSi'), weight: [10, 40], when: (t) => t.tms },
  { kind: 'ion', atoms: f('C6H5'), weight: [10, 50], when: (t) => t.aromatic },
  { kind: 'ion', atoms: f('C6H7'), weight: [5, 35], when: (t) => t.terpenoid },
  { kind: 'ion', atoms: f('C6H9'), weight: [5, 35], when: (t) => t.terpenoid },
  { kind: 'ion', atoms: f('C7H7'), weight: [20, 100], when: (t) => t.aromatic, core: true },
  { kind: 'ion', atoms: f('C7H9'), weight: [20, 100], when: (t) => t.terpenoid, core: true },
  { kind: 'ion', atoms: f('CH2Br'), weight: [5, 30], when: (t) => t.bromomethyl },
  { kind: 'ion', atoms: f('C7H5O'), weight: [60, 100], when: (t) => t.benzoyl && !t.phthalate, core: true },
  { kind: 'ion', atoms: f('C8H5O3'), weight: [80, 100], when: (t) => t.phthalate, core: true },
  { kind: 'ion', atoms: f('C8H9'), weight: [10, 40], when: (t) => t.aromatic },
  { kind: 'ion', atoms: f('C8H9O'), weight: [20, 80], when: (t) => t.methoxy && t.aromatic },
];

function contains(whole: ElementCounts, part: ElementCounts): boolean {
  return (Object.keys(part) as ElementSymbol[]).every((s) => (part[s] ?? 0) <= (whole[s] ?? 0));
}

function subtract(whole: ElementCounts, part: ElementCounts): ElementCounts {
  const out: Partial<Record<ElementSymbol, number>> = { ...whole };
  for (const s of Object.keys(part) as ElementSymbol[]) {
    const left = (out[s] ?? 0) - (part[s] ?? 0);
    if (left > 0) out[s] = left;
    else delete out[s];
  }
  return out;
}

/** Intensity of the most intense molecular-ion peak, before normalising (base peak ~100). */
function molecularIonRange(t: Traits, counts: ElementCounts): readonly [number, number] {
  if (t.tms) return [3, 15];
  if (t.aromatic) {
    // A small ring on a big molecule holds the charge less well: scale by the aromatic share.
    const share = Math.min(1, Math.max(0.05, 1.5 * t.aromaticShare));
    return [40 * share, 100 * share];
  }
  if (t.hydroxyl || t.acetate) return [1.5, 6];
  if (t.halogenated) return [5, 30];
  if (t.acyclic && (counts.C ?? 0) >= 6) return [3, 15];
  return [10, 45];
}

/** Long chains and rings give hydrocarbon series ions C_kH_(2k+1) and C_kH_(2k−1), fading with k. */
function seriesFragments(counts: ElementCounts, t: Traits, massDa: number): { atoms: ElementCounts; weight: readonly [number, number] }[] {
  const c = counts.C ?? 0;
  const out: { atoms: ElementCounts; weight: readonly [number, number] }[] = [];
  if (t.aromatic || c < 7) return out;
  for (let k = 6; k < c; k++) {
    const fade = 40 / (k - 3);
    for (const hk of t.acyclic ? [2 * k + 1, 2 * k - 1] : [2 * k - 1, 2 * k - 3, 2 * k - 5]) {
      const atoms: ElementCounts = { C: k, H: hk };
      if (hk > 0 && contains(counts, atoms) && nominalMass(atoms) < massDa - 14) out.push({ atoms, weight: [fade * 0.2, fade] });
    }
  }
  return out;
}

/** Air, water and CO2 ions (SCIENCE.md §6, common practice) that background subtraction removes. */
const AIR_WATER_MZ: readonly number[] = [18, 28, 32, 40, 44];
/** Siloxane column-bleed ions (SCIENCE.md §6), removed too unless the compound itself holds Si. */
const BLEED_MZ: readonly number[] = [207, 281];

const round2 = (value: number): number => Math.round(value * 100) / 100;

/**
 * SIMULATED 70 eV EI spectrum for the demo library — invented, plausible-looking, not science to rely
 * on and not any measured spectrum.
 *
 * Heuristics:
 * - The molecular-ion cluster is the exact isotope cluster of the formula (`isotopeCluster`, SCIENCE.md
 *   §1), its most intense peak set to a plausible strength: strong for aromatics (40–100), weak for
 *   TMS ethers (3–15), alcohols and acetates (1.5–6) and long open chains (3–15), otherwise 10–45.
 * - Fragments come from common neutral losses from M and common low-mass ions (SCIENCE.md §6, Lange
 *   §7.8: M−1, M−15, M−17, M−18 for alcohols, M−28, M−29, M−30, M−31 for methoxy, M−33/34 for thiols,
 *   M−35/36 for Cl, M−42, M−43, M−45, M−46/30 for nitro, M−60 for acetates, M−79/80 for Br; ions 15, 27,
 *   29, 31, 39, 41, 43, 47, 49, 51, 55, 57, 65, 67, 69, 71, 73, 75, 77, 79, 81, 91, 93, 105, 121). A
 *   rule applies only when the formula holds the atoms lost or kept (no M−35 without Cl, no m/z 73
 *   without Si) and, for many rules, when crude SMILES text patterns suggest the group (hydroxyl,
 *   aldehyde, acetate, methoxy, ethoxy, TMS, nitro …). Long chains and terpenoid rings add a
 *   hydrocarbon ion series.
 * - Every fragment carries the isotope cluster of its own fragment formula, so Cl/Br/S/Si patterns
 *   stay consistent throughout the spectrum.
 * - The pattern (which rules fire, and each intensity) is drawn from a generator seeded by the formula,
 *   the SMILES and `variant`, so a compound keeps its pattern; `rng` adds the measurement noise: each
 *   cluster ×(1 ± 8 %), each peak ×(1 ± 1.5 %).
 * - Strongest fragments first; a fragment whose cluster would reach above M, or that starts 2 m/z from
 *   a kept cluster (two unrelated clusters 2 apart read as a Cl/Br pattern), is left out, and no two
 *   clusters share the top (a second 100 % peak reads as a clipped base peak).
 * - Background-subtracted, as a lab exports library spectra: m/z 18, 28, 32, 40, 44 (air, water, CO2)
 *   and, without Si in the formula, 207 and 281 (column bleed) are removed unless they belong to the
 *   molecular-ion cluster.
 * - Nothing is kept above the highest m/z of the molecular-ion cluster; peaks below 0.05 (base peak
 *   100) and below `fromMz` are dropped; intensities are rounded to 0.01.
 *
 * @param compound - formula (required) and SMILES (optional; without it only formula rules apply)
 * @param rng - uniform numbers in [0, 1); the result is deterministic given its sequence
 * @param options - `variant` and `fromMz`, see {@link SimulateSpectrumOptions}
 * @returns peaks sorted by m/z, unique integer m/z, base peak exactly 100
 * @throws {ChemError} for a bad formula
 * @throws {RangeError} when `fromMz` is above the molecular ion
 */
export function simulateSpectrum(
  compound: { formula: string; smiles?: string },
  rng: () => number,
  options: SimulateSpectrumOptions = {},
): [mz: number, intensity: number][] {
  const variant = options.variant ?? 0;
  const fromMz = options.fromMz ?? 1;
  const counts = parseFormula(compound.formula);
  const massDa = nominalMass(counts);
  if (fromMz > massDa) throw new RangeError(`fromMz ${fromMz} is above the molecular ion at m/z ${massDa}`);
  const traits = readTraits(counts, compound.smiles);
  const pattern = demoRandom(demoTextHash(`${compound.formula}|${compound.smiles ?? ''}`));
  const variantFactor = variant === 0 ? () => 1 : ((r) => () => 0.7 + 0.7 * r())(demoRandom(demoTextHash(`${compound.formula}|${compound.smiles ?? ''}|${variant}`)));
  const draw = ([min, max]: readonly [number, number]): number => min + (max - min) * pattern();

  const candidates: { atoms: ElementCounts; top: number }[] = [];
  const [mMin, mMax] = molecularIonRange(traits, counts);
  const molecularTop = draw([mMin, mMax]);
  for (const rule of RULES) {
    // Draw for every rule, so one rule's outcome never shifts another's values.
    const weight = draw(rule.weight) * variantFactor();
    const keep = rule.core === true || pattern() < 0.85;
    if (!keep || !rule.when(traits) || !contains(counts, rule.atoms)) continue;
    const atoms = rule.kind === 'loss' ? subtract(counts, rule.atoms) : rule.atoms;
    const mz = nominalMass(atoms);
    if (Object.keys(atoms).length === 0 || mz < 15 || mz > massDa - 1) continue;
    if (rule.kind === 'ion' && Object.keys(subtract(counts, atoms)).length === 0) continue;
    if ((counts.C ?? 0) > 0 && !atoms.C) continue; // OH+, SH+ … are minor ions; leave them out
    candidates.push({ atoms, top: weight });
  }
  for (const series of seriesFragments(counts, traits, massDa)) candidates.push({ atoms: series.atoms, top: draw(series.weight) * variantFactor() });

  // Strongest fragments first. A fragment is left out when its own cluster would reach above M (it
  // would spoil the molecular-ion cluster) or when it sits 2 m/z from a kept cluster start (two
  // unrelated clusters 2 apart read like a Cl or Br pattern).
  const kept: { atoms: ElementCounts; top: number; mz: number; cluster: ReturnType<typeof isotopeCluster> }[] = [
    { atoms: counts, top: molecularTop, mz: massDa, cluster: isotopeCluster(counts) },
  ];
  for (const candidate of candidates.sort((a, b) => b.top - a.top)) {
    const mz = nominalMass(candidate.atoms);
    const cluster = isotopeCluster(candidate.atoms);
    if (cluster.some((p) => p.mz > massDa && p.relIntensity >= 1)) continue;
    if (kept.some((k) => Math.abs(k.mz - mz) === 2)) continue;
    kept.push({ ...candidate, mz, cluster });
  }

  const tops = kept.map(({ top }) => top * (1 + 0.08 * (2 * rng() - 1)));
  // No two clusters of (nearly) equal top: a second 100 % peak reads as a clipped base peak.
  const order = tops.map((_, i) => i).sort((a, b) => (tops[b] as number) - (tops[a] as number));
  const [first, second] = [order[0] as number, order[1]];
  if (second !== undefined && (tops[second] as number) > 0.95 * (tops[first] as number)) tops[second] = 0.9 * (tops[first] as number);

  const sum = new Map<number, number>();
  let molecularTopMz = massDa;
  kept.forEach(({ cluster }, index) => {
    for (const { mz, relIntensity } of cluster) {
      const value = ((tops[index] as number) * relIntensity) / 100;
      if (index === 0 && value >= 0.02) molecularTopMz = Math.max(molecularTopMz, mz);
      sum.set(mz, (sum.get(mz) ?? 0) + value);
    }
  });
  const molecularMzs = new Set(kept[0]?.cluster.map((p) => p.mz));
  const subtracted = (mz: number): boolean =>
    !molecularMzs.has(mz) && (AIR_WATER_MZ.includes(mz) || (BLEED_MZ.includes(mz) && !counts.Si));

  const noisy = [...sum.entries()]
    .filter(([mz]) => mz >= fromMz && mz <= molecularTopMz && !subtracted(mz))
    .map(([mz, value]): [number, number] => [mz, value * (1 + 0.015 * (2 * rng() - 1))])
    .sort((a, b) => a[0] - b[0]);
  const base = Math.max(...noisy.map(([, value]) => value));
  const baseMz = noisy.find(([, value]) => value === base)?.[0];
  // Overlapping clusters can still tie with the base peak: keep every other peak clearly below it.
  for (const peak of noisy) {
    if (peak[0] === baseMz) continue;
    const ceiling = Math.abs(peak[0] - (baseMz ?? 0)) === 1 ? 0.93 : 0.97;
    if (peak[1] > ceiling * base) peak[1] = ceiling * base;
  }
  return noisy
    .map(([mz, value]): [number, number] => [mz, round2((value / base) * 100)])
    .filter(([, value]) => value >= 0.05);
}
