/** Machine-readable reason for a {@link ChemError}. */
export type ChemErrorCode =
  | 'FORMULA_SYNTAX'
  | 'UNKNOWN_ELEMENT'
  | 'INVALID_PEAKS'
  | 'EMPTY_SPECTRUM'
  | 'PEAK_LIST_SYNTAX'
  | 'JCAMP_SYNTAX'
  | 'INVALID_ARGUMENT';

/**
 * The one error that packages/chem throws for bad chemical input.
 *
 * `position` is the 0-based character offset in the parsed text (formula, peak list, JCAMP-DX file)
 * where the problem starts; `field` names the offending field or array index (for example `peaks[3].mz`).
 *
 * @example
 * try { parseFormula('C6H(') } catch (e) { if (e instanceof ChemError) console.log(e.code, e.position) }
 */
export class ChemError extends Error {
  readonly code: ChemErrorCode;
  readonly position: number | undefined;
  readonly field: string | undefined;

  constructor(code: ChemErrorCode, message: string, where: { position?: number; field?: string } = {}) {
    super(message);
    this.name = 'ChemError';
    this.code = code;
    this.position = where.position;
    this.field = where.field;
  }
}
