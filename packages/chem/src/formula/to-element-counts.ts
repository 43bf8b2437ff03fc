import { ChemError } from '../errors/chem-error';
import { isElementSymbol, type ElementCounts, type ElementSymbol } from '../elements/elements';
import { MAX_ATOM_COUNT, parseFormula } from './parse-formula';

/**
 * Turns a formula given as text or as counts into validated counts (a new frozen object holding
 * only elements with a count above 0). The input is never changed.
 *
 * @param formula - formula text (see {@link parseFormula}) or atom counts per element
 * @param field - name used in error messages and in `ChemError.field` (default `formula`)
 * @throws {TypeError} when `formula` is neither a string nor an object
 * @throws {ChemError} what {@link parseFormula} throws for text; for counts `UNKNOWN_ELEMENT`
 *   (unsupported key) or `INVALID_ARGUMENT` (count not a non-negative integer up to
 *   {@link MAX_ATOM_COUNT}), with `field` such as `formula.Cl`
 * @example
 * toElementCounts('CH2Cl2')          // { C: 1, H: 2, Cl: 2 }
 * toElementCounts({ C: 6, H: 6, N: 0 }) // { C: 6, H: 6 }
 */
export function toElementCounts(formula: string | ElementCounts, field = 'formula'): ElementCounts {
  if (typeof formula === 'string') return parseFormula(formula);
  if (formula === null || typeof formula !== 'object' || Array.isArray(formula)) {
    throw new TypeError(`${field} must be a formula string or an object of element counts`);
  }
  const result: Partial<Record<ElementSymbol, number>> = {};
  for (const key of Object.keys(formula)) {
    if (!isElementSymbol(key)) {
      throw new ChemError('UNKNOWN_ELEMENT', `Unknown element "${key}" in ${field}`, {
        field: `${field}.${key}`,
      });
    }
    const count: unknown = formula[key];
    if (count === undefined) continue;
    if (typeof count !== 'number' || !Number.isInteger(count) || count < 0 || count > MAX_ATOM_COUNT) {
      throw new ChemError(
        'INVALID_ARGUMENT',
        `${field}.${key} must be an integer from 0 to ${MAX_ATOM_COUNT}, got ${String(count)}`,
        { field: `${field}.${key}` },
      );
    }
    if (count > 0) result[key] = count;
  }
  return Object.freeze(result);
}
