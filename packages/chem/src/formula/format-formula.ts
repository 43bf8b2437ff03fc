import type { ElementCounts, ElementSymbol } from '../elements/elements';
import { toElementCounts } from './to-element-counts';

/**
 * Writes counts as a formula in Hill order: C first, then H, then the other elements
 * alphabetically; without carbon, all elements alphabetically (H included). A count of 1 is not
 * written; elements with count 0 are left out. Empty counts give `''`.
 *
 * @param counts - atom counts per element (not changed)
 * @throws {ChemError} `UNKNOWN_ELEMENT` or `INVALID_ARGUMENT` for bad counts (see {@link toElementCounts})
 * @example
 * formatFormula({ H: 5, Cl: 1, C: 6 }) // 'C6H5Cl'
 * formatFormula({ O: 1, H: 2 })        // 'H2O'
 */
export function formatFormula(counts: ElementCounts): string {
  const valid = toElementCounts(counts, 'counts');
  const symbols = Object.keys(valid) as ElementSymbol[];
  const hasCarbon = (valid.C ?? 0) > 0;
  const rank = (symbol: ElementSymbol): number =>
    hasCarbon ? (symbol === 'C' ? 0 : symbol === 'H' ? 1 : 2) : 2;
  symbols.sort((a, b) => rank(a) - rank(b) || (a < b ? -1 : a > b ? 1 : 0));
  let text = '';
  for (const symbol of symbols) {
    const count = valid[symbol] ?? 0;
    text += count === 1 ? symbol : `${symbol}${count}`;
  }
  return text;
}
