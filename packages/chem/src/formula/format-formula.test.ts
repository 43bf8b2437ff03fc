import { describe, expect, it } from 'vitest';
import { formatFormula } from './format-formula';
import { parseFormula } from './parse-formula';

describe('formatFormula', () => {
  it('writes carbon compounds in Hill order: C, H, then alphabetical (Hill 1900, common practice)', () => {
    expect(formatFormula({ H: 5, Cl: 1, C: 6 })).toBe('C6H5Cl');
    expect(formatFormula({ Si: 1, O: 1, C: 2, H: 6 })).toBe('C2H6OSi');
    expect(formatFormula({ S: 1, N: 1, Br: 1, C: 1, H: 1 })).toBe('CHBrNS');
  });

  it('writes compounds without carbon all alphabetically, H included', () => {
    expect(formatFormula({ O: 1, H: 2 })).toBe('H2O');
    expect(formatFormula({ Cl: 1, H: 1 })).toBe('ClH');
    expect(formatFormula({ S: 1, O: 4, H: 2 })).toBe('H2O4S');
  });

  it('round-trips through parseFormula, leaves out zero counts and gives "" for no atoms', () => {
    for (const text of ['C6H5Cl', 'C8H8O', 'C7H5BrClNO2S'])
      expect(formatFormula(parseFormula(text))).toBe(text);
    expect(formatFormula({ C: 1, H: 4, N: 0 })).toBe('CH4');
    expect(formatFormula({})).toBe('');
  });

  it('does not mutate its input', () => {
    const input = { H: 6, C: 2, O: 1 };
    formatFormula(input);
    expect(Object.keys(input)).toEqual(['H', 'C', 'O']);
  });

  it('when a count is negative, throws INVALID_ARGUMENT naming the field', () => {
    expect(() => formatFormula({ C: -1 })).toThrow(
      expect.objectContaining({ code: 'INVALID_ARGUMENT', field: 'counts.C' }),
    );
  });
});
