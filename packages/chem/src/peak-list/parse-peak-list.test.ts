import { describe, expect, it } from 'vitest';
import { ChemError } from '../errors/chem-error';
import { parsePeakList } from './parse-peak-list';

// Layouts: the ones issue 4 lists for pasted peaks (common practice of GC–MS labs). All data invented.
function catchChem(run: () => unknown): ChemError {
  try {
    run();
  } catch (error) {
    if (error instanceof ChemError) return error;
    throw error;
  }
  throw new Error('expected a ChemError');
}

describe('parsePeakList', () => {
  it('when peaks are "mz intensity" lines, returns them in order', () => {
    expect(parsePeakList('43 100\n58 25.5\n\n15 10\n')).toEqual([
      [43, 100],
      [58, 25.5],
      [15, 10],
    ]);
  });

  it('when pairs are "mz:intensity" separated by spaces, semicolons or commas, returns each pair', () => {
    expect(parsePeakList('41:12 43:100; 58:25, 59:1.2')).toEqual([
      [41, 12],
      [43, 100],
      [58, 25],
      [59, 1.2],
    ]);
  });

  it('when pairs are written "mz,intensity mz,intensity", pairs values in sequence', () => {
    expect(parsePeakList('(41,12) (43,100)\n58,25 59,1')).toEqual([
      [41, 12],
      [43, 100],
      [58, 25],
      [59, 1],
    ]);
  });

  it('when a CSV has a header with extra columns, takes the m/z and abundance columns by name', () => {
    const text = 'annotation,Abundance,m/z\nbase,999,43\nM+,250,58\n';
    expect(parsePeakList(text)).toEqual([
      [43, 999],
      [58, 250],
    ]);
  });

  it('when a TSV has a header and Windows line ends, parses it', () => {
    expect(parsePeakList('mz\tintensity\r\n43\t100\r\n58\t25\r\n')).toEqual([
      [43, 100],
      [58, 25],
    ]);
  });

  it('when there are # comments and a header with units, ignores the comments', () => {
    const text = '# simulated test data\nm/z (Th);rel. intensity (%)\n43;100 # base peak\n58;25\n';
    expect(parsePeakList(text)).toEqual([
      [43, 100],
      [58, 25],
    ]);
  });

  it('when values use exponents, reads them as numbers', () => {
    expect(parsePeakList('43 1e3\n58 2.5E2')).toEqual([
      [43, 1000],
      [58, 250],
    ]);
  });

  it('when a value is not a number, throws PEAK_LIST_SYNTAX at its position and line', () => {
    const text = '43 100\n58 2x5\n';
    const error = catchChem(() => parsePeakList(text));
    expect(error.code).toBe('PEAK_LIST_SYNTAX');
    expect(error.position).toBe(text.indexOf('2x5'));
    expect(error.field).toBe('line 2');
    expect(error.message).toContain('line 2, column 4');
  });

  it('when a line has an unpaired value, throws at that value', () => {
    const text = '43 100 58';
    const error = catchChem(() => parsePeakList(text));
    expect(error.code).toBe('PEAK_LIST_SYNTAX');
    expect(error.position).toBe(7);
  });

  it('when an m/z is zero or negative or an intensity negative, throws at it', () => {
    expect(catchChem(() => parsePeakList('43 100\n-5 3')).position).toBe(7);
    expect(catchChem(() => parsePeakList('43 -1')).position).toBe(3);
    expect(catchChem(() => parsePeakList('0 10')).position).toBe(0);
  });

  it('when a header names no m/z column, throws at the header', () => {
    const error = catchChem(() => parsePeakList('\nname,value\n43,100'));
    expect(error.code).toBe('PEAK_LIST_SYNTAX');
    expect(error.position).toBe(1);
    expect(error.field).toBe('line 2');
  });

  it('when a data row after a header has too few columns, throws on that row', () => {
    const error = catchChem(() => parsePeakList('m/z,intensity\n43,100\n58\n'));
    expect(error.field).toBe('line 3');
  });

  it('when letters appear after the data began, throws instead of taking them as a header', () => {
    const error = catchChem(() => parsePeakList('43 100\nmz intensity\n'));
    expect(error.code).toBe('PEAK_LIST_SYNTAX');
    expect(error.position).toBe(7);
  });

  it('when the text holds only comments and blank lines, throws EMPTY_SPECTRUM', () => {
    expect(catchChem(() => parsePeakList('# nothing\n\n  \n')).code).toBe('EMPTY_SPECTRUM');
  });

  it('when given a non-string, throws TypeError', () => {
    expect(() => parsePeakList(42 as unknown as string)).toThrow(TypeError);
  });
});
