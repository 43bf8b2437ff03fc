import { ELEMENTS, type ElementCounts, type ElementSymbol } from '../elements/elements';
import { toElementCounts } from './to-element-counts';

/**
 * Monoisotopic mass in u: the sum of the exact masses of each element's lightest isotope
 * (SCIENCE.md §1, AME 2016). Not rounded. Neutral molecule: no electron mass is removed.
 *
 * @param formula - formula text or counts (not changed)
 * @throws {ChemError} for bad formula text or counts (see {@link toElementCounts})
 * @example
 * monoisotopicMass('C6H6') // 78.04695019338
 */
export function monoisotopicMass(formula: string | ElementCounts): number {
  const counts = toElementCounts(formula);
  let massU = 0;
  for (const symbol of Object.keys(counts) as ElementSymbol[]) {
    const lightest = ELEMENTS[symbol].isotopes[0];
    if (lightest !== undefined) massU += (counts[symbol] ?? 0) * lightest.massU;
  }
  return massU;
}
