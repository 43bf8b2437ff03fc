import { ChemError } from '../errors/chem-error';
import type { JcampSpectrum } from './jcamp-spectrum';
import { jcampLabelKey } from './jcamp-records';

/**
 * What {@link writeJcamp} writes: the fields of a {@link JcampSpectrum} (all but `title` and
 * `peaks` optional), plus the two labels JCAMP-DX 5.01 requires.
 */
export type JcampWriteInput = Omit<JcampSpectrum, 'labels'> & {
  /** ##ORIGIN (required by JCAMP-DX 5.01); default `Ionfolio`. */
  origin?: string;
  /** ##OWNER (required by JCAMP-DX 5.01); default `unspecified`. */
  owner?: string;
  /** Further labels, written as `##LABEL=value` after the standard ones (standard ones win). */
  labels?: Readonly<Record<string, string>>;
};

const LINE_WIDTH = 80;

/** Labels this writer sets itself (normalised, without a leading `.` or `$`): extra labels never override them. */
const RESERVED_KEYS = new Set(
  ['TITLE', 'JCAMP-DX', 'DATA TYPE', 'DATA CLASS', 'ORIGIN', 'OWNER', 'MOLFORM', 'CAS REGISTRY NO', 'MW',
    'SPECTROMETER TYPE', 'INLET', 'IONIZATION MODE', 'IONIZATION ENERGY', 'RETENTION INDEX', 'XUNITS', 'YUNITS',
    'FIRSTX', 'LASTX', 'MAXY', 'NPOINTS', 'PEAK TABLE', 'XYDATA', 'XYPOINTS', 'XFACTOR', 'YFACTOR', 'BLOCKS', 'END',
  ].map(jcampLabelKey),
);

/** `C8H8O` → `C 8 H 8 O`, the way JCAMP-DX MS files write ##MOLFORM; other text unchanged. */
function jcampFormula(formula: string): string {
  const compact = formula.replace(/\s+/g, '');
  if (!/^(?:[A-Z][a-z]?\d*)+$/.test(compact)) return formula.trim();
  return Array.from(compact.matchAll(/([A-Z][a-z]?)(\d*)/g), ([, symbol, count]) => (count ? `${symbol} ${count}` : symbol)).join(' ');
}

function checkValue(value: string, field: string): string {
  if (/[\r\n]/.test(value) || value.includes('##') || value.includes('$$')) {
    throw new ChemError('INVALID_ARGUMENT', `${field} must be one line without "##" or "$$"`, { field });
  }
  return value.trim();
}

function checkNumber(value: number, field: string): string {
  if (!Number.isFinite(value)) throw new ChemError('INVALID_ARGUMENT', `${field} must be a finite number`, { field });
  return String(value);
}

/**
 * Writes one mass spectrum as a JCAMP-DX 5.01 block with a `##PEAK TABLE=(XY..XY)`
 * (McDonald & Wilks 1988, Appl. Spectrosc. 42, 151; MS labels per Lampen et al. 1994,
 * Appl. Spectrosc. 48, 1545). Peaks are written in the order given, m/z and intensity as the
 * shortest decimal text that reads back to the same number, lines at most 80 characters.
 * {@link readJcamp} reads the result back to the same peaks and metadata.
 *
 * @throws {ChemError} `INVALID_ARGUMENT` (with `field`) for a metadata value with a line break,
 *   `##` or `$$`, or a non-finite number; `INVALID_PEAKS` (with `field` `peaks[i]`) for a
 *   non-positive or non-finite m/z or a negative or non-finite intensity; `EMPTY_SPECTRUM`
 *   when there is no peak.
 * @example
 * writeJcamp({ title: 'acetone (simulated)', formula: 'C3H6O', peaks: [[43, 100], [58, 25]] })
 * // '##TITLE=acetone (simulated)\n##JCAMP-DX=5.01\n##DATA TYPE=MASS SPECTRUM\n...##END=\n'
 */
export function writeJcamp(spectrum: JcampWriteInput): string {
  const peaks = spectrum.peaks;
  if (peaks.length === 0) throw new ChemError('EMPTY_SPECTRUM', 'a spectrum needs at least one peak', { field: 'peaks' });
  peaks.forEach(([mz, intensity], index) => {
    if (!Number.isFinite(mz) || mz <= 0 || !Number.isFinite(intensity) || intensity < 0) {
      throw new ChemError('INVALID_PEAKS', `peak ${index} [${mz}, ${intensity}] is not a valid peak`, { field: `peaks[${index}]` });
    }
  });
  const mzs = peaks.map(([mz]) => mz);
  const intensities = peaks.map(([, intensity]) => intensity);
  const lines: string[] = [
    `##TITLE=${checkValue(spectrum.title, 'title')}`,
    '##JCAMP-DX=5.01',
    '##DATA TYPE=MASS SPECTRUM',
    '##DATA CLASS=PEAK TABLE',
    `##ORIGIN=${checkValue(spectrum.origin ?? 'Ionfolio', 'origin')}`,
    `##OWNER=${checkValue(spectrum.owner ?? 'unspecified', 'owner')}`,
  ];
  const optional: [string, string | undefined][] = [
    ['MOLFORM', spectrum.formula === undefined ? undefined : jcampFormula(checkValue(spectrum.formula, 'formula'))],
    ['CAS REGISTRY NO', spectrum.casRn === undefined ? undefined : checkValue(spectrum.casRn, 'casRn')],
    ['MW', spectrum.molecularWeight === undefined ? undefined : checkNumber(spectrum.molecularWeight, 'molecularWeight')],
    ['.SPECTROMETER TYPE', spectrum.spectrometerType === undefined ? undefined : checkValue(spectrum.spectrometerType, 'spectrometerType')],
    ['.INLET', spectrum.inlet === undefined ? undefined : checkValue(spectrum.inlet, 'inlet')],
    ['.IONIZATION MODE', spectrum.ionizationMode === undefined ? undefined : checkValue(spectrum.ionizationMode, 'ionizationMode')],
    ['.IONIZATION ENERGY', spectrum.ionizationEnergyEv === undefined ? undefined : checkNumber(spectrum.ionizationEnergyEv, 'ionizationEnergyEv')],
    ['$RETENTION INDEX', spectrum.retentionIndex === undefined ? undefined : checkNumber(spectrum.retentionIndex, 'retentionIndex')],
  ];
  for (const [label, value] of optional) if (value !== undefined && value !== '') lines.push(`##${label}=${value}`);
  for (const [label, value] of Object.entries(spectrum.labels ?? {})) {
    const name = checkValue(label, 'labels').replace(/^##/, '');
    const key = jcampLabelKey(name).replace(/^[.$]/, '');
    if (key === '' || name.includes('=') || RESERVED_KEYS.has(key)) continue;
    lines.push(`##${name}=${checkValue(value, `labels.${label}`)}`);
  }
  lines.push(
    '##XUNITS=M/Z',
    '##YUNITS=RELATIVE ABUNDANCE',
    `##FIRSTX=${Math.min(...mzs)}`,
    `##LASTX=${Math.max(...mzs)}`,
    `##MAXY=${Math.max(...intensities)}`,
    `##NPOINTS=${peaks.length}`,
    '##PEAK TABLE=(XY..XY)',
  );
  let row = '';
  for (const [mz, intensity] of peaks) {
    const pair = `${mz},${intensity}`;
    if (row !== '' && row.length + 1 + pair.length > LINE_WIDTH) {
      lines.push(row);
      row = pair;
    } else {
      row = row === '' ? pair : `${row} ${pair}`;
    }
  }
  lines.push(row, '##END=');
  return `${lines.join('\n')}\n`;
}
