import { convert } from 'jcampconverter';
import { describe, expect, it } from 'vitest';
import { ChemError } from '../errors/chem-error';
import { AFFN_FILE, COMPRESSED_FILE, LINK_FILE, PEAK_TABLE_FILE } from './jcamp-test-files';
import { readJcamp } from './read-jcamp';

function catchChem(run: () => unknown): ChemError {
  try {
    run();
  } catch (error) {
    if (error instanceof ChemError) return error;
    throw error;
  }
  throw new Error('expected a ChemError');
}

/** Independent reading by jcampconverter 10.0.2 (MIT), spectra only, as [x, y] pairs with zeros dropped. */
function independent(text: string): { title: string; peaks: [number, number][] }[] {
  return convert(text)
    .flatten.filter((entry) => entry.spectra.length > 0)
    .map((entry) => {
      const data = entry.spectra[0]?.data as { x: number[]; y: number[] };
      const peaks = data.x.map((x, i) => [x, data.y[i] as number] as [number, number]).filter(([, y]) => y !== 0);
      return { title: String(entry.title), peaks };
    });
}

const PROFILE = [
  [11, 5],
  [12, 12],
  [13, 12],
  [14, 12],
  [15, 40],
  [16, 100],
  [17, 37],
  [18, 8],
];

describe('readJcamp', () => {
  it('when a block has a peak table and EI labels in mixed spelling, reads peaks and metadata', () => {
    const [spectrum] = readJcamp(PEAK_TABLE_FILE);
    expect(spectrum).toMatchObject({
      title: 'Simulated ketone (test data)',
      peaks: [
        [15, 10],
        [27, 5],
        [42, 8],
        [43, 100],
        [58, 25],
      ],
      formula: 'C 3 H 6 O',
      casRn: '00000-00-0',
      molecularWeight: 58,
      ionizationEnergyEv: 70,
      ionizationMode: 'EI+',
      spectrometerType: 'QUADRUPOLE',
      inlet: 'GC',
      retentionIndex: 503,
    });
    expect(spectrum?.labels['ORIGIN']).toBe('Ionfolio tests');
    expect(spectrum?.labels['JCAMP-DX']).toBe('5.01');
  });

  it('when the peak table is read, agrees with jcampconverter 10.0.2', () => {
    const [ours] = readJcamp(PEAK_TABLE_FILE);
    expect(independent(PEAK_TABLE_FILE)[0]?.peaks).toEqual(ours?.peaks);
  });

  it('when XYDATA is SQZ/DIF/DUP compressed with a Y check value (McDonald & Wilks 1988), decodes it', () => {
    const [spectrum] = readJcamp(COMPRESSED_FILE);
    expect(spectrum?.peaks).toEqual(PROFILE.map(([x, y]) => [x, (y as number) * 0.5]));
  });

  it('when XYDATA is compressed, agrees with jcampconverter 10.0.2', () => {
    const [ours] = readJcamp(COMPRESSED_FILE);
    expect(independent(COMPRESSED_FILE)[0]?.peaks).toEqual(ours?.peaks);
  });

  it('when XYDATA is AFFN with PAC signs, decodes it and agrees with jcampconverter', () => {
    const [ours] = readJcamp(AFFN_FILE);
    expect(ours?.peaks).toEqual(PROFILE);
    expect(independent(AFFN_FILE)[0]?.peaks).toEqual(PROFILE);
  });

  it('when a LINK block holds a structure and two spectra, returns the two spectra in order', () => {
    const spectra = readJcamp(LINK_FILE);
    expect(spectra.map((s) => s.title)).toEqual(['first spectrum', 'second spectrum']);
    expect(spectra[1]?.peaks).toEqual([
      [50, 20],
      [77, 100],
      [105, 60],
    ]);
    expect(independent(LINK_FILE).map((s) => s.peaks)).toEqual(spectra.map((s) => s.peaks));
  });

  it('when blocks are plainly concatenated, returns each', () => {
    const spectra = readJcamp(PEAK_TABLE_FILE + '\n' + AFFN_FILE);
    expect(spectra).toHaveLength(2);
    expect(spectra[1]?.title).toBe('Simulated profile, AFFN/PAC (test data)');
  });

  it('when ##END= is missing at the end, throws JCAMP_SYNTAX naming the block', () => {
    const text = PEAK_TABLE_FILE.replace('##END=\n', '');
    const error = catchChem(() => readJcamp(text));
    expect(error.code).toBe('JCAMP_SYNTAX');
    expect(error.field).toBe('block 1');
    expect(error.position).toBe(text.length - 1);
  });

  it('when ##END= is missing before the next block, throws at the next ##TITLE=', () => {
    const text = PEAK_TABLE_FILE.replace('##END=\n', '') + AFFN_FILE;
    const error = catchChem(() => readJcamp(text));
    expect(error.position).toBe(text.lastIndexOf('##TITLE='));
    expect(error.message).toMatch(/^block 1, line 22:/);
  });

  it('when a peak-table value is not a number, throws at it with block and line', () => {
    const text = PEAK_TABLE_FILE + PEAK_TABLE_FILE.replace('43,100', '43,1O0');
    const error = catchChem(() => readJcamp(text));
    expect(error.position).toBe(text.lastIndexOf('1O0'));
    expect(error.field).toBe('block 2');
    expect(error.message).toContain('line 42');
  });

  it('when a peak table ends with an unpaired value, throws at it', () => {
    const text = PEAK_TABLE_FILE.replace('58,25', '58,25 60');
    expect(catchChem(() => readJcamp(text)).position).toBe(text.indexOf(' 60') + 1);
  });

  it('when a DIF line is followed by a wrong Y check value, throws at the check value', () => {
    const text = COMPRESSED_FILE.replace('14A2K8', '14A3K8');
    const error = catchChem(() => readJcamp(text));
    expect(error.position).toBe(text.indexOf('A3'));
    expect(error.message).toContain('check value');
  });

  it('when NPOINTS disagrees with the decoded ordinates, throws', () => {
    const text = COMPRESSED_FILE.replace('##NPOINTS=10', '##NPOINTS=11').replace('##LASTX=19', '##LASTX=20');
    expect(catchChem(() => readJcamp(text)).message).toContain('NPOINTS=11');
  });

  it('when an XYDATA character is not ASDF, throws at it', () => {
    const text = AFFN_FILE.replace('15+40', '15+4!');
    expect(catchChem(() => readJcamp(text)).position).toBe(text.indexOf('!'));
  });

  it('when a line X value does not match its point, throws at the X value', () => {
    const text = AFFN_FILE.replace('15+40', '16+40');
    expect(catchChem(() => readJcamp(text)).position).toBe(text.indexOf('16+40'));
  });

  it('when a LINK block declares more blocks than it holds (truncated), throws', () => {
    const text = LINK_FILE.replace('##BLOCKS=3', '##BLOCKS=4');
    expect(catchChem(() => readJcamp(text)).message).toContain('BLOCKS=4');
  });

  it('when the data type is not a mass spectrum, throws naming it', () => {
    const text = PEAK_TABLE_FILE.replace('MASS SPECTRUM', 'INFRARED SPECTRUM');
    expect(catchChem(() => readJcamp(text)).message).toContain('INFRARED SPECTRUM');
  });

  it('when a metadata number is malformed, throws at its value', () => {
    const text = PEAK_TABLE_FILE.replace('##M-W=58', '##M-W=5x8');
    expect(catchChem(() => readJcamp(text)).position).toBe(text.indexOf('5x8'));
  });

  it('when the text is binary or not JCAMP-DX at all, throws', () => {
    expect(catchChem(() => readJcamp('\u0000\u0001abc')).code).toBe('JCAMP_SYNTAX');
    expect(catchChem(() => readJcamp('hello\nworld')).position).toBe(0);
    expect(catchChem(() => readJcamp('')).code).toBe('JCAMP_SYNTAX');
  });

  it('when given a non-string, throws TypeError', () => {
    expect(() => readJcamp(undefined as unknown as string)).toThrow(TypeError);
  });
});
