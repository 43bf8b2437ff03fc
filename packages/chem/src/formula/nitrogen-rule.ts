import type { ElementCounts } from '../elements/elements';
import { nominalMass } from './nominal-mass';
import { toElementCounts } from './to-element-counts';

/**
 * Nitrogen rule (SCIENCE.md §2, textbook): a molecule has an odd nominal mass exactly when it has
 * an odd number of nitrogen atoms. Returns whether the formula's nominal-mass parity matches its
 * N-count parity.
 *
 * Phosphorus is deliberately not counted with N: 31P has an odd mass and an odd valence, like H,
 * so it does not flip the parity (PH3 is 34, PCl3 136). Only 14N combines an even mass with an
 * odd valence. For the supported elements the rule holds exactly when {@link rdbe} is a whole number.
 *
 * @param formula - formula text or counts (not changed)
 * @throws {ChemError} for bad formula text or counts (see {@link toElementCounts})
 * @example
 * nitrogenRuleHolds('C5H5N') // true  (79, one N)
 * nitrogenRuleHolds('C7H7')  // false (91, no N: an even-electron ion, not a molecule)
 */
export function nitrogenRuleHolds(formula: string | ElementCounts): boolean {
  const counts = toElementCounts(formula);
  return nominalMass(counts) % 2 === (counts.N ?? 0) % 2;
}
