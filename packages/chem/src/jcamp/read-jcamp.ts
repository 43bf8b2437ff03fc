import type { Peak } from '../types';
import { decodeXyData } from './decode-xydata';
import type { JcampSpectrum } from './jcamp-spectrum';
import type { JcampBlock, JcampLine, JcampRecord } from './jcamp-records';
import { groupBlocks, jcampError, jcampLabelKey, recordText, splitRecords } from './jcamp-records';

const AFFN = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const LEADING_NUMBER = /^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)/;
const DATA_KEYS = new Set(['PEAKTABLE', 'XYPOINTS', 'XYDATA']);

/** Finds a record by key, accepting the key with or without a leading `.` or `$`. */
function find(block: JcampBlock, ...keys: string[]): JcampRecord | undefined {
  return block.records.find((record) => keys.includes(record.key.replace(/^[.$]/, '')));
}

function text(block: JcampBlock, ...keys: string[]): string | undefined {
  const record = find(block, ...keys);
  const value = record ? recordText(record) : '';
  return value === '' ? undefined : value;
}

function number(block: JcampBlock, keys: string[], unit?: RegExp): number | undefined {
  const record = find(block, ...keys);
  if (!record || recordText(record) === '') return undefined;
  const match = LEADING_NUMBER.exec(record.value.text);
  const rest = match ? record.value.text.slice(match[0].length).trim() : '';
  if (!match || !Number.isFinite(Number(match[1])) || (rest !== '' && !(unit && unit.test(rest)))) {
    throw jcampError(`##${record.label}=${record.value.text.trim()} is not a number`, record.value.position, record.lineNumber, block);
  }
  return Number(match[1]);
}

function factor(block: JcampBlock, key: string): number {
  const value = number(block, [key]);
  if (value === undefined) return 1;
  if (value === 0) {
    const record = find(block, key) as JcampRecord;
    throw jcampError(`##${record.label}= must not be zero`, record.value.position, record.lineNumber, block);
  }
  return value;
}

function addPeak(peaks: Peak[], x: number, y: number, at: { position: number; lineNumber: number }, block: JcampBlock): void {
  if (!(x > 0)) throw jcampError(`m/z ${x} must be positive`, at.position, at.lineNumber, block);
  if (y < 0) throw jcampError(`intensity ${y} must not be negative`, at.position, at.lineNumber, block);
  if (y > 0) peaks.push([x, y]);
}

function dataLines(record: JcampRecord): JcampLine[] {
  const afterList = record.value.text.replace(/^\s*\([^)]*\)+/, (list) => ' '.repeat(list.length));
  return [{ ...record.value, text: afterList }, ...record.more];
}

function readGroups(record: JcampRecord, size: number, block: JcampBlock, xFactor: number, yFactor: number): Peak[] {
  const peaks: Peak[] = [];
  let group: { value: number; position: number; lineNumber: number }[] = [];
  for (const line of dataLines(record)) {
    for (const match of line.text.matchAll(/[^\s,;]+/g)) {
      const position = line.position + (match.index ?? 0);
      if (!AFFN.test(match[0])) throw jcampError(`"${match[0]}" is not a number`, position, line.lineNumber, block);
      group.push({ value: Number(match[0]), position, lineNumber: line.lineNumber });
      if (group.length === size) {
        const [x, y] = group as [(typeof group)[0], (typeof group)[0]];
        addPeak(peaks, x.value * xFactor, y.value * yFactor, x, block);
        group = [];
      }
    }
  }
  const rest = group[0];
  if (rest) throw jcampError(`incomplete (${'XYW'.slice(0, size)}) group at the end of the table`, rest.position, rest.lineNumber, block);
  return peaks;
}

function readXyData(record: JcampRecord, block: JcampBlock, xFactor: number, yFactor: number): Peak[] {
  const firstX = number(block, ['FIRSTX']);
  const lastX = number(block, ['LASTX']);
  const count = number(block, ['NPOINTS']);
  if (firstX === undefined || lastX === undefined || count === undefined) {
    throw jcampError('XYDATA needs ##FIRSTX=, ##LASTX= and ##NPOINTS=', record.position, record.lineNumber, block);
  }
  const { ordinates, lines } = decodeXyData(dataLines(record).slice(1), block);
  if (ordinates.length !== count) {
    throw jcampError(`##NPOINTS=${count} but XYDATA holds ${ordinates.length} values`, record.position, record.lineNumber, block);
  }
  const deltaX = count > 1 ? (lastX - firstX) / (count - 1) : 0;
  for (const line of lines) {
    const expected = firstX + line.firstIndex * deltaX;
    if (Math.abs(line.x * xFactor - expected) > Math.abs(deltaX) / 2 + 1e-9 * Math.abs(expected)) {
      throw jcampError(`X value ${line.x} does not match point ${line.firstIndex + 1} (X ${expected / xFactor})`, line.xPosition, line.lineNumber, block);
    }
  }
  const peaks: Peak[] = [];
  ordinates.forEach((ordinate, index) => {
    const x = Number((firstX + index * deltaX).toPrecision(12));
    addPeak(peaks, x, ordinate * yFactor, record, block);
  });
  return peaks;
}

function readPeaks(block: JcampBlock, record: JcampRecord): Peak[] {
  const variables = jcampLabelKey(record.value.text).replace(/\).*$/, ')');
  const xFactor = factor(block, 'XFACTOR');
  const yFactor = factor(block, 'YFACTOR');
  if (variables.startsWith('(XY..XY)')) return readGroups(record, 2, block, xFactor, yFactor);
  if (variables.startsWith('(XYW..XYW)') || variables.startsWith('(XYM..XYM)')) return readGroups(record, 3, block, xFactor, yFactor);
  if (record.key === 'XYDATA' && jcampLabelKey(record.value.text).startsWith('(X++(Y..Y))')) {
    return readXyData(record, block, xFactor, yFactor);
  }
  throw jcampError(`##${record.label}=${record.value.text.trim()}: unsupported variable list`, record.value.position, record.lineNumber, block);
}

function readSpectrum(block: JcampBlock, data: JcampRecord): JcampSpectrum {
  const peaks = readPeaks(block, data);
  if (peaks.length === 0) throw jcampError('the data table holds no peak', data.position, data.lineNumber, block);
  const labels: Record<string, string> = {};
  for (const record of block.records) {
    if (!DATA_KEYS.has(record.key)) labels[record.label] = recordText(record);
  }
  const spectrum: JcampSpectrum = { title: (text(block, 'TITLE') ?? '').split('\n')[0]?.trim() ?? '', peaks, labels };
  const optional = {
    formula: text(block, 'MOLFORM'),
    casRn: text(block, 'CASREGISTRYNO', 'CASRN', 'CASNUMBER'),
    molecularWeight: number(block, ['MW', 'MOLECULARWEIGHT']),
    ionizationEnergyEv: number(block, ['IONIZATIONENERGY'], /^e?v$/i),
    ionizationMode: text(block, 'IONIZATIONMODE'),
    spectrometerType: text(block, 'SPECTROMETERTYPE'),
    inlet: text(block, 'INLET'),
    retentionIndex: number(block, ['RETENTIONINDEX', 'RI']),
  };
  for (const [key, value] of Object.entries(optional)) {
    if (value !== undefined) Object.assign(spectrum, { [key]: value });
  }
  return spectrum;
}

function collect(block: JcampBlock, out: JcampSpectrum[]): void {
  for (const child of block.children) collect(child, out);
  const data = block.records.filter((record) => DATA_KEYS.has(record.key));
  const dataType = find(block, 'DATATYPE');
  const type = dataType ? jcampLabelKey(dataType.value.text) : '';
  const ntuples = find(block, 'NTUPLES');
  if (ntuples) throw jcampError('##NTUPLES= (GC–MS runs) is not supported: export single spectra', ntuples.position, ntuples.lineNumber, block);
  if (type === 'LINK' || (data.length === 0 && block.children.length > 0)) return;
  if (data.length === 0) {
    if (type === '' || type.includes('MASS')) {
      throw jcampError('no ##PEAK TABLE=, ##XYPOINTS= or ##XYDATA= in this block', block.position, block.lineNumber, block);
    }
    return; // a structure or other non-spectral block inside a LINK
  }
  if (type !== '' && !type.includes('MASSSPECTRUM')) {
    const record = dataType as JcampRecord;
    throw jcampError(`##DATA TYPE=${record.value.text.trim()} is not a mass spectrum`, record.value.position, record.lineNumber, block);
  }
  if (data.length > 1) {
    const second = data[1] as JcampRecord;
    throw jcampError('more than one data table in one block', second.position, second.lineNumber, block);
  }
  out.push(readSpectrum(block, data[0] as JcampRecord));
}

/**
 * Reads every mass spectrum in a JCAMP-DX file (McDonald & Wilks 1988, Appl. Spectrosc. 42, 151;
 * MS labels per Lampen et al. 1994, Appl. Spectrosc. 48, 1545).
 *
 * Accepts one block, plain concatenated blocks, and LINK blocks (`##DATA TYPE=LINK`,
 * `##BLOCKS=n`) whose children are returned in file order (non-spectral children such as
 * structures are skipped). Data: `##PEAK TABLE=` or `##XYPOINTS=` as `(XY..XY)` (or `(XYW..XYW)`),
 * and `##XYDATA=(X++(Y..Y))` in AFFN or ASDF compressed form (SQZ, DIF, DUP, PAC), with XFACTOR
 * and YFACTOR applied. Labels match case-insensitively ignoring spaces, `-`, `/`, `_`; `$$` starts
 * a comment. m/z in Th; intensities as in the file, zero intensities dropped, order kept.
 *
 * @param text - the whole file as text.
 * @returns the spectra in file order.
 * @throws {ChemError} `JCAMP_SYNTAX` with `position` (0-based offset), `field` (`block N`) and
 *   the block and line in the message: missing `##END=`, bad numbers, a Y check value mismatch,
 *   NPOINTS disagreeing with the data, a LINK count mismatch, a data type other than a mass
 *   spectrum, binary content, or no spectrum at all.
 * @throws {TypeError} when `text` is not a string.
 * @example
 * readJcamp('##TITLE=test\n##JCAMP-DX=5.01\n##DATA TYPE=MASS SPECTRUM\n##PEAK TABLE=(XY..XY)\n43,100 58,25\n##END=')
 * // [{ title: 'test', peaks: [[43, 100], [58, 25]], labels: { ... } }]
 */
export function readJcamp(text: string): JcampSpectrum[] {
  if (typeof text !== 'string') throw new TypeError('readJcamp expects a string');
  const blocks = groupBlocks(splitRecords(text));
  const spectra: JcampSpectrum[] = [];
  for (const block of blocks) collect(block, spectra);
  if (spectra.length === 0) throw jcampError('no mass spectrum in the file', 0, 1);
  return spectra;
}
