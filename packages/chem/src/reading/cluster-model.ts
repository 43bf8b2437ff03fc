import type { ElementSymbol } from '../elements/elements';
import { ELEMENTS } from '../elements/elements';
import { convolve, elementDistribution, type NominalDistribution } from '../isotopes/nominal-distribution';

/** Heteroatoms whose isotopes shape the molecular-ion cluster enough to be counted from it. */
export interface HeteroatomHypothesis {
  readonly chlorine: number;
  readonly bromine: number;
  readonly sulfur: number;
  readonly silicon: number;
}

/** Hydrogen atoms assumed per carbon in the model (typical organic H/C 1–2, Kind & Fiehn 2007 range 0.2–3.1). */
export const HYDROGEN_PER_CARBON = 1.5;

/** Upper limits tried by the reading (Kind & Fiehn 2007 caps are higher; EI library compounds rarely exceed these). */
export const HYPOTHESIS_LIMITS = Object.freeze({ chlorine: 6, bromine: 4, sulfur: 3, silicon: 2 });

/** Lightest-isotope nominal mass of a hypothesis' heteroatoms, Da. */
export function heteroatomMassDa(h: HeteroatomHypothesis): number {
  return 35 * h.chlorine + 79 * h.bromine + 32 * h.sulfur + 28 * h.silicon;
}

const cache = new Map<string, Float64Array>();

function distribution(symbol: ElementSymbol, count: number): NominalDistribution {
  return elementDistribution(symbol, count);
}

/**
 * Cluster pattern (M, M+1, … as fractions, M+k at index k) of `carbon` carbons with
 * {@link HYDROGEN_PER_CARBON} hydrogens each plus the hypothesis' heteroatoms, from the isotope
 * table of SCIENCE.md §1. Cached: the reading tries the same patterns at many candidate M.
 */
export function clusterPattern(h: HeteroatomHypothesis, carbon: number): Float64Array {
  const key = `${h.chlorine},${h.bromine},${h.sulfur},${h.silicon},${carbon}`;
  const hit = cache.get(key);
  if (hit) return hit;
  const parts: [ElementSymbol, number][] = [
    ['C', carbon],
    ['H', Math.round(HYDROGEN_PER_CARBON * carbon)],
    ['Cl', h.chlorine],
    ['Br', h.bromine],
    ['S', h.sulfur],
    ['Si', h.silicon],
  ];
  let total: NominalDistribution = { start: 0, values: Float64Array.of(1) };
  for (const [symbol, count] of parts) if (count > 0) total = convolve(total, distribution(symbol, count));
  const values = new Float64Array(total.start + total.values.length);
  values.set(total.values, total.start);
  cache.set(key, values);
  return values;
}

/** Abundance ratio heavy/light of one isotope pair from the table, e.g. 13C/12C. */
export function isotopeRatio(symbol: ElementSymbol, heavyIndex = 1): number {
  const isotopes = ELEMENTS[symbol].isotopes;
  return (isotopes[heavyIndex]?.abundance ?? 0) / (isotopes[0]?.abundance ?? 1);
}

/** Every hypothesis within {@link HYPOTHESIS_LIMITS} whose heteroatoms weigh at most `maxMassDa`. */
export function hypotheses(maxMassDa: number): HeteroatomHypothesis[] {
  const out: HeteroatomHypothesis[] = [];
  for (let chlorine = 0; chlorine <= HYPOTHESIS_LIMITS.chlorine; chlorine += 1)
    for (let bromine = 0; bromine <= HYPOTHESIS_LIMITS.bromine; bromine += 1)
      for (let sulfur = 0; sulfur <= HYPOTHESIS_LIMITS.sulfur; sulfur += 1)
        for (let silicon = 0; silicon <= HYPOTHESIS_LIMITS.silicon; silicon += 1) {
          const h = { chlorine, bromine, sulfur, silicon };
          if (heteroatomMassDa(h) <= maxMassDa) out.push(h);
        }
  return out;
}
