import { parseFormula } from '@ionfolio/chem';

/**
 * The elements an identify call may filter on, one bit each of the search index's 32-bit element mask:
 * the elements of organic compounds and their usual heteroatoms first, then common metals.
 */
export const FILTER_ELEMENTS = [
  'C', 'H', 'N', 'O', 'S', 'P', 'F', 'Cl', 'Br', 'I', 'Si', 'B', 'Se', 'Sn', 'As', 'Hg',
  'Na', 'K', 'Li', 'Mg', 'Al', 'Ge', 'Te', 'Fe', 'Cu', 'Zn', 'Pb', 'Ti', 'Cr', 'Co', 'Ni', 'Mn',
] as const;
export type FilterElement = (typeof FILTER_ELEMENTS)[number];

const BIT = new Map<string, number>(FILTER_ELEMENTS.map((symbol, i) => [symbol, 2 ** i]));

/** The mask of a list of filter elements. */
export function maskOf(symbols: readonly FilterElement[]): number {
  return symbols.reduce((mask, symbol) => (mask | (BIT.get(symbol) ?? 0)) >>> 0, 0);
}

/** The mask of the elements of a formula (elements outside {@link FILTER_ELEMENTS} have no bit). */
export function formulaMask(formula: string): number {
  return maskOf(Object.keys(parseFormula(formula)) as FilterElement[]);
}
