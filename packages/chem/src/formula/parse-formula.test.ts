import { describe, expect, it } from 'vitest';
import { ChemError } from '../errors/chem-error';
import { MAX_ATOM_COUNT, parseFormula } from './parse-formula';

function errorOf(text: string): ChemError {
  try {
    parseFormula(text);
  } catch (e) {
    if (e instanceof ChemError) return e;
    throw e;
  }
  throw new Error(`no error for ${text}`);
}

describe('parseFormula', () => {
  it('reads plain formulas with one- and two-letter symbols (chlorobenzene, common practice)', () => {
    expect(parseFormula('C6H5Cl')).toEqual({ C: 6, H: 5, Cl: 1 });
    expect(parseFormula('C2H6OSi')).toEqual({ C: 2, H: 6, O: 1, Si: 1 });
    expect(parseFormula('CHBr3')).toEqual({ C: 1, H: 1, Br: 3 });
  });

  it('adds repeated elements and multiplies groups: 1-pentanol CH3(CH2)4OH is C5H12O', () => {
    expect(parseFormula('CH3(CH2)4OH')).toEqual({ C: 5, H: 12, O: 1 });
    expect(parseFormula('[(CH3)3Si]2O')).toEqual({ C: 6, H: 18, Si: 2, O: 1 });
    expect(parseFormula('C{CH2[CH3]2}3')).toEqual({ C: 10, H: 24 });
  });

  it('reads JCAMP-DX ##MOLFORM spacing "C 8 H 8 O" (SCIENCE.md §5)', () => {
    expect(parseFormula('C 8 H 8 O')).toEqual({ C: 8, H: 8, O: 1 });
    expect(parseFormula('  C 6 H 4 Cl 2 ')).toEqual({ C: 6, H: 4, Cl: 2 });
  });

  it('reads adducts with a leading multiplier after "." or "·"', () => {
    expect(parseFormula('C2H6O.2H2O')).toEqual({ C: 2, H: 10, O: 3 });
    expect(parseFormula('CH4·H2O')).toEqual({ C: 1, H: 6, O: 1 });
  });

  it('drops elements whose count is 0 and returns a frozen object', () => {
    const counts = parseFormula('C6H6N0');
    expect(counts).toEqual({ C: 6, H: 6 });
    expect(Object.isFrozen(counts)).toBe(true);
  });

  it('when an element is unknown, throws UNKNOWN_ELEMENT at its position', () => {
    const e = errorOf('C6Xx2');
    expect(e.code).toBe('UNKNOWN_ELEMENT');
    expect(e.position).toBe(2);
    expect(errorOf('CL').position).toBe(1);
  });

  it('when a bracket is unbalanced, throws FORMULA_SYNTAX at its position', () => {
    expect(errorOf('C6H(CH3')).toMatchObject({ code: 'FORMULA_SYNTAX', position: 3 });
    expect(errorOf('C6H5)2')).toMatchObject({ code: 'FORMULA_SYNTAX', position: 4 });
    expect(errorOf('(CH3]2')).toMatchObject({ code: 'FORMULA_SYNTAX', position: 4 });
    expect(errorOf('C()2')).toMatchObject({ code: 'FORMULA_SYNTAX', position: 1 });
  });

  it('when the text is empty or blank, throws FORMULA_SYNTAX at position 0', () => {
    expect(errorOf('')).toMatchObject({ code: 'FORMULA_SYNTAX', position: 0 });
    expect(errorOf('   ')).toMatchObject({ code: 'FORMULA_SYNTAX', position: 0 });
  });

  it('when a count is negative, stray or absurd, throws FORMULA_SYNTAX at its position', () => {
    expect(errorOf('C-1H4')).toMatchObject({ code: 'FORMULA_SYNTAX', position: 1 });
    expect(errorOf('2CH4')).toMatchObject({ code: 'FORMULA_SYNTAX', position: 0 });
    expect(errorOf('C 1 2')).toMatchObject({ code: 'FORMULA_SYNTAX', position: 4 });
    expect(errorOf(`C${MAX_ATOM_COUNT + 1}`)).toMatchObject({ code: 'FORMULA_SYNTAX', position: 1 });
    expect(errorOf('(C1000)1001')).toMatchObject({ code: 'FORMULA_SYNTAX', position: 6 });
    expect(errorOf('C6H6.')).toMatchObject({ code: 'FORMULA_SYNTAX', position: 4 });
  });

  it('when given something other than a string, throws TypeError', () => {
    expect(() => parseFormula(42 as unknown as string)).toThrow(TypeError);
  });
});
