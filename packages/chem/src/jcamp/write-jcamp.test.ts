import { convert } from 'jcampconverter';
import { describe, expect, it } from 'vitest';
import { ChemError } from '../errors/chem-error';
import type { Peak } from '../types';
import { readJcamp } from './read-jcamp';
import { writeJcamp } from './write-jcamp';

// Invented spectrum (simulated test data): 60 peaks so the table wraps over several lines.
const PEAKS: Peak[] = Array.from({ length: 60 }, (_, i) => [27 + i * 3, ((i * 37) % 101) + 0.25 * (i % 4)] as Peak);
const SPECTRUM = {
  title: 'Simulated chloro compound (test data)',
  peaks: PEAKS,
  formula: 'C6H5Cl',
  casRn: '00000-00-0',
  molecularWeight: 112.56,
  ionizationEnergyEv: 70,
  ionizationMode: 'EI+',
  spectrometerType: 'QUADRUPOLE',
  inlet: 'GC',
  retentionIndex: 842.5,
  labels: { '$SOURCE TEMPERATURE': '230 C', TITLE: 'must not override' },
};

describe('writeJcamp', () => {
  it('when written and read back, gives the same peaks and metadata', () => {
    const [back] = readJcamp(writeJcamp(SPECTRUM));
    expect(back).toMatchObject({
      title: SPECTRUM.title,
      peaks: PEAKS.filter(([, y]) => y > 0),
      formula: 'C 6 H 5 Cl',
      casRn: '00000-00-0',
      molecularWeight: 112.56,
      ionizationEnergyEv: 70,
      ionizationMode: 'EI+',
      spectrometerType: 'QUADRUPOLE',
      inlet: 'GC',
      retentionIndex: 842.5,
    });
    expect(back?.labels['$SOURCE TEMPERATURE']).toBe('230 C');
  });

  it('writes the JCAMP-DX 5.01 labels an MS peak table needs (Lampen et al. 1994), lines ≤ 80 characters', () => {
    const text = writeJcamp(SPECTRUM);
    for (const label of ['##TITLE=', '##JCAMP-DX=5.01', '##DATA TYPE=MASS SPECTRUM', '##ORIGIN=', '##OWNER=', '##XUNITS=M/Z', '##NPOINTS=60', '##PEAK TABLE=(XY..XY)']) {
      expect(text).toContain(label);
    }
    expect(text.endsWith('##END=\n')).toBe(true);
    expect(Math.max(...text.split('\n').map((line) => line.length))).toBeLessThanOrEqual(80);
    expect(text.match(/##TITLE=/g)).toHaveLength(1);
  });

  it('when jcampconverter 10.0.2 reads the written file, it finds the same peaks and labels', () => {
    const [entry] = convert(writeJcamp(SPECTRUM), { keepRecordsRegExp: /.*/ }).flatten;
    const data = entry?.spectra[0]?.data as { x: number[]; y: number[] };
    expect(data.x.map((x, i) => [x, data.y[i]])).toEqual(PEAKS);
    expect(entry?.info['MOLFORM']).toBe('C 6 H 5 Cl');
    expect(entry?.info['.IONIZATIONENERGY']).toBe(70);
  });

  it('when m/z and intensities have many decimals, they read back exactly', () => {
    const peaks: Peak[] = [
      [43.0183, 100],
      [58.04186, 1 / 3],
    ];
    expect(readJcamp(writeJcamp({ title: 't', peaks }))[0]?.peaks).toEqual(peaks);
  });

  it('does not mutate its input', () => {
    const input = JSON.parse(JSON.stringify(SPECTRUM)) as typeof SPECTRUM;
    writeJcamp(input);
    expect(input).toEqual(SPECTRUM);
  });

  it('when a value holds a line break or "##", throws INVALID_ARGUMENT naming the field', () => {
    expect(() => writeJcamp({ title: 'a\n##END=', peaks: PEAKS })).toThrow(ChemError);
    try {
      writeJcamp({ title: 'ok', inlet: 'GC $$ x', peaks: PEAKS });
    } catch (error) {
      expect((error as ChemError).field).toBe('inlet');
    }
    expect.assertions(2);
  });

  it('when a peak is invalid or there is none, throws with the field', () => {
    let caught: unknown;
    try {
      writeJcamp({ title: 't', peaks: [[43, 100], [Number.NaN, 3]] });
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(ChemError);
    expect((caught as ChemError).field).toBe('peaks[1]');
    expect(() => writeJcamp({ title: 't', peaks: [] })).toThrow(/at least one peak/);
    expect(() => writeJcamp({ title: 't', peaks: [[43, 1]], molecularWeight: Number.POSITIVE_INFINITY })).toThrow(ChemError);
  });
});
