import {
  ELEMENT_SYMBOLS,
  mostAbundantIsotope,
  type ElementCounts,
  type ElementSymbol,
} from '../elements/elements';
import { toElementCounts } from './to-element-counts';

const NOMINAL_MASS_DA: Readonly<Record<ElementSymbol, number>> = Object.freeze(
  Object.fromEntries(ELEMENT_SYMBOLS.map((s) => [s, mostAbundantIsotope(s).massNumber])) as Record<
    ElementSymbol,
    number
  >,
);

/**
 * Nominal mass in Da: the sum of the mass numbers of each element's most abundant isotope
 * (12C, 1H, 14N, 16O, 32S, 35Cl, 79Br, 28Si ...; for every supported element that is also the
 * lightest isotope, so this is the nominal mass of the monoisotopic peak M).
 *
 * @param formula - formula text or counts (not changed)
 * @returns an integer (0 for empty counts)
 * @throws {ChemError} for bad formula text or counts (see {@link toElementCounts})
 * @example
 * nominalMass('C6H5Cl') // 112
 */
export function nominalMass(formula: string | ElementCounts): number {
  const counts = toElementCounts(formula);
  let massDa = 0;
  for (const symbol of Object.keys(counts) as ElementSymbol[]) {
    massDa += (counts[symbol] ?? 0) * NOMINAL_MASS_DA[symbol];
  }
  return massDa;
}

/**
 * Nominal mass in Da of one atom of an element (mass number of its most abundant isotope).
 *
 * @example
 * elementNominalMass('Cl') // 35
 */
export function elementNominalMass(symbol: ElementSymbol): number {
  return NOMINAL_MASS_DA[symbol];
}
