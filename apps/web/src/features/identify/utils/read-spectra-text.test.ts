import { describe, expect, it } from 'vitest';
import { looksLikeJcamp, readSpectraText, SpectrumFileError } from './read-spectra-text';

describe('readSpectraText', () => {
  it('when a CSV holds blank-line-separated blocks, reads each with its # name and reuses the first header', () => {
    const text = '# Lot 7 peak 1\nm/z,intensity,note\n43,100,base\n58,25,\n\n# Lot 7 peak 2\n77,60,x\n112,100,y\n';
    const spectra = readSpectraText(text, 'lot7.csv');
    expect(spectra).toEqual([
      { name: 'Lot 7 peak 1', peaks: [[43, 100], [58, 25]] },
      { name: 'Lot 7 peak 2', peaks: [[77, 60], [112, 100]] },
    ]);
  });

  it('when a block has a bad value, names the file and the line counted from the top of the file', () => {
    const text = '43 100\n58 25\n\n77 60\n112 1O0\n';
    expect(() => readSpectraText(text, 'two.txt')).toThrow(SpectrumFileError);
    expect(() => readSpectraText(text, 'two.txt')).toThrow(/^two\.txt: line 5, column 5/);
  });

  it('when one unnamed block is read, names it after the file', () => {
    expect(readSpectraText('43:100 58:25', 'acetone-lot3.txt')).toEqual([{ name: 'acetone-lot3', peaks: [[43, 100], [58, 25]] }]);
  });

  it('when the text is JCAMP-DX with two blocks, returns both with title, formula and retention index', () => {
    const block = (title: string, extra: string, data: string) =>
      `##TITLE=${title}\n##JCAMP-DX=5.01\n##DATA TYPE=MASS SPECTRUM\n${extra}##PEAK TABLE=(XY..XY)\n${data}\n##END=\n`;
    const text = block('Unknown A', '##MOLFORM=C 6 H 5 Cl\n##RETENTION INDEX=985\n', '77,60 112,100') + block('Unknown B', '', '43,100');
    const spectra = readSpectraText(text, 'unknowns.jdx');
    expect(spectra.map((s) => s.name)).toEqual(['Unknown A', 'Unknown B']);
    expect(spectra[0]).toMatchObject({ peaks: [[77, 60], [112, 100]], formula: 'C 6 H 5 Cl', retentionIndex: 985 });
  });

  it('when a JCAMP-DX block lacks ##END=, reports the file and the reader’s message', () => {
    expect(() => readSpectraText('##TITLE=x\n##JCAMP-DX=5.01\n##DATA TYPE=MASS SPECTRUM\n##PEAK TABLE=(XY..XY)\n43,100\n', 'cut.jdx')).toThrow(/^cut\.jdx: /);
  });

  it('when the file holds NUL bytes, refuses it as binary', () => {
    expect(() => readSpectraText('\u0000\u0001PK', 'spectrum.raw')).toThrow('spectrum.raw is not a text file.');
  });

  it('tells JCAMP-DX by extension or by a first ## line', () => {
    expect(looksLikeJcamp('43 100', 'a.JDX')).toBe(true);
    expect(looksLikeJcamp('\n  ##TITLE=x', 'a.txt')).toBe(true);
    expect(looksLikeJcamp('m/z,intensity', 'a.csv')).toBe(false);
  });
});
