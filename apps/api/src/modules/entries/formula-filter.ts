import { ChemError, formatFormula, isElementSymbol, parseFormula, type ElementSymbol } from '@ionfolio/chem';

/** One element's allowed atom count; `max` null means no upper bound. */
export interface ElementRange {
  symbol: ElementSymbol;
  min: number;
  max: number | null;
}

/** The `formula` filter: one exact formula (Hill order) or element ranges that must all hold. */
export type FormulaFilter = { kind: 'exact'; formula: string } | { kind: 'ranges'; ranges: ElementRange[] };

const RANGE_TOKEN = /^([A-Z][a-z]?)(\d+)?(?:-(\d*))?$/;

/**
 * Reads the `formula` filter. Text with a `-` is a list of element ranges separated by blanks or
 * commas: `C6-8 Cl1-3` (6 to 8 carbons and 1 to 3 chlorines), `Br1-` (at least one), `N0` (none),
 * `S` (at least one). Anything else is one formula, written back in Hill order so `ClC6H5` finds
 * `C6H5Cl`. Throws an Error whose message names the part that could not be read.
 */
export function parseFormulaFilter(text: string): FormulaFilter {
  if (!text.includes('-')) {
    try {
      return { kind: 'exact', formula: formatFormula(parseFormula(text)) };
    } catch (err) {
      if (err instanceof ChemError) {
        const at = err.position === undefined ? '' : ` near "${text.slice(err.position, err.position + 4)}"`;
        throw new Error(`"${text}" is not a formula${at}: ${err.message}`, { cause: err });
      }
      throw err;
    }
  }
  const ranges: ElementRange[] = [];
  for (const token of text.split(/[\s,]+/).filter(Boolean)) {
    const m = RANGE_TOKEN.exec(token);
    if (!m) throw new Error(`"${token}" is not an element range (write e.g. C6-8 Cl1-3 or Br1-)`);
    const symbol = m[1]!;
    if (!isElementSymbol(symbol)) throw new Error(`"${token}": ${symbol} is not an element this library knows`);
    const low = m[2] === undefined ? (m[3] === undefined ? 1 : 0) : Number(m[2]);
    const high = m[3] === undefined ? (m[2] === undefined ? null : low) : m[3] === '' ? null : Number(m[3]);
    if (high !== null && high < low) throw new Error(`"${token}": the range ends below where it starts`);
    if (ranges.some((r) => r.symbol === symbol)) throw new Error(`"${token}": ${symbol} is given twice`);
    ranges.push({ symbol, min: low, max: high });
  }
  if (ranges.length === 0) throw new Error('the formula filter is empty');
  return { kind: 'ranges', ranges };
}
