import type { ElementCounts } from '../elements/elements';
import { toElementCounts } from './to-element-counts';

/**
 * Rings plus double bonds equivalent, SCIENCE.md §2:
 * RDBE = C + Si − (H + F + Cl + Br + I)/2 + (N + P)/2 + 1 (O and S count as divalent and drop out).
 * A half-integer value means an even-electron ion (or an impossible neutral molecule).
 *
 * @param formula - formula text or counts (not changed)
 * @returns a whole or half-integer number, may be negative for impossible formulas
 * @throws {ChemError} for bad formula text or counts (see {@link toElementCounts})
 * @example
 * rdbe('C6H6')   // 4
 * rdbe('C7H7')   // 4.5
 */
export function rdbe(formula: string | ElementCounts): number {
  const c = toElementCounts(formula);
  const n = (s: keyof typeof c) => c[s] ?? 0;
  return n('C') + n('Si') - (n('H') + n('F') + n('Cl') + n('Br') + n('I')) / 2 + (n('N') + n('P')) / 2 + 1;
}
