import { ChemError } from '../errors/chem-error';
import type { Peak, PeakList } from '../types';

const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const MZ_HEADER = /^(?:mz|m|mass|x|mzda|massda|mzvalue)$/;
const INTENSITY_HEADER = /^(?:int|intensity|relint|relintensity|relativeintensity|abundance|abund|relabundance|relativeabundance|y|height|counts|signal|ion|ions)$/;

interface Token {
  text: string;
  position: number;
}

interface Header {
  mzColumn: number;
  intensityColumn: number;
  delimiter: RegExp;
}

/** Splits one line into tokens with their absolute offsets, on the given delimiter pattern. */
function tokenize(line: string, lineStart: number, delimiter: RegExp): Token[] {
  const tokens: Token[] = [];
  const pattern = new RegExp(`[^${delimiter.source}]+`, 'g');
  for (const match of line.matchAll(pattern)) {
    const text = match[0].trim();
    if (text === '') continue;
    const lead = match[0].length - match[0].trimStart().length;
    tokens.push({ text, position: lineStart + (match.index ?? 0) + lead });
  }
  return tokens;
}

function headerDelimiter(line: string): RegExp {
  if (line.includes('\t')) return /\t/;
  if (line.includes(',')) return /,/;
  if (line.includes(';')) return /;/;
  return /\s/;
}

function headerKey(name: string): string {
  return name.toLowerCase().replace(/\(.*?\)|\[.*?\]/g, '').replace(/[^a-z]/g, '');
}

function where(lineNumber: number, position: number, lineStart: number): string {
  return `line ${lineNumber}, column ${position - lineStart + 1}`;
}

function fail(message: string, lineNumber: number, position: number, lineStart: number): never {
  throw new ChemError('PEAK_LIST_SYNTAX', `${where(lineNumber, position, lineStart)}: ${message}`, {
    position,
    field: `line ${lineNumber}`,
  });
}

function toNumber(token: Token, what: string, lineNumber: number, lineStart: number): number {
  if (!NUMBER.test(token.text)) {
    fail(`"${token.text}" is not a number (expected ${what})`, lineNumber, token.position, lineStart);
  }
  return Number(token.text);
}

function makePeak(mz: Token, intensity: Token, lineNumber: number, lineStart: number): Peak {
  const mzValue = toNumber(mz, 'an m/z', lineNumber, lineStart);
  const intensityValue = toNumber(intensity, 'an intensity', lineNumber, lineStart);
  if (!Number.isFinite(mzValue) || mzValue <= 0) {
    fail(`m/z ${mz.text} must be a positive number`, lineNumber, mz.position, lineStart);
  }
  if (!Number.isFinite(intensityValue) || intensityValue < 0) {
    fail(`intensity ${intensity.text} must not be negative`, lineNumber, intensity.position, lineStart);
  }
  return [mzValue, intensityValue];
}

function parseHeader(line: string, lineStart: number, lineNumber: number): Header {
  const delimiter = headerDelimiter(line);
  const names = tokenize(line, lineStart, delimiter);
  const keys = names.map((token) => headerKey(token.text));
  const mzColumn = keys.findIndex((key) => MZ_HEADER.test(key));
  const intensityColumn = keys.findIndex((key, index) => index !== mzColumn && INTENSITY_HEADER.test(key));
  if (mzColumn < 0 || intensityColumn < 0) {
    const position = names[0]?.position ?? lineStart;
    fail(
      `header "${line.trim()}" needs an m/z column (m/z, mz, mass) and an intensity column (intensity, abundance)`,
      lineNumber,
      position,
      lineStart,
    );
  }
  return { mzColumn, intensityColumn, delimiter };
}

/**
 * Parses a peak list pasted or uploaded as text.
 *
 * Accepted layouts (mixing them across lines is allowed, except after a header):
 * - `mz intensity` one peak a line, separated by spaces, a tab, a comma or a semicolon;
 * - several pairs on one line: `41:12 43:100; 58:25` or `41,12 43,100` (pairs in sequence);
 * - CSV/TSV with a header row naming an m/z column (`m/z`, `mz`, `mass`) and an intensity column
 *   (`intensity`, `abundance`, `rel. intensity` …); other columns are ignored.
 * `#` starts a comment to the end of the line; blank lines are skipped. Decimal commas are not
 * accepted (a comma always separates values). Peaks are returned in the order written, with m/z
 * and intensity as written (no sorting, merging or scaling: pass the result to the spectrum
 * functions for that); m/z in Th (m/z units), intensity on any non-negative scale.
 *
 * @param text - the peak list as text.
 * @returns the peaks, in the order written.
 * @throws {ChemError} `PEAK_LIST_SYNTAX` with `position` (0-based offset in `text`) and `field`
 *   (`line N`) for a non-number, an unpaired value, a non-positive m/z, a negative intensity or an
 *   unrecognised header; `EMPTY_SPECTRUM` when the text holds no peak.
 * @throws {TypeError} when `text` is not a string.
 * @example
 * parsePeakList('m/z,intensity\n43,100\n58,25') // [[43, 100], [58, 25]]
 * parsePeakList('41:12 43:100; 58:25')          // [[41, 12], [43, 100], [58, 25]]
 */
export function parsePeakList(text: string): PeakList {
  if (typeof text !== 'string') throw new TypeError('parsePeakList expects a string');
  const peaks: Peak[] = [];
  let header: Header | null = null;
  let sawData = false;
  let lineStart = 0;
  const lines = text.split(/\n/);
  for (let index = 0; index < lines.length; index += 1) {
    const raw = lines[index] ?? '';
    const lineNumber = index + 1;
    const start = lineStart;
    lineStart += raw.length + 1;
    const commentAt = raw.indexOf('#');
    const line = (commentAt >= 0 ? raw.slice(0, commentAt) : raw).replace(/\r$/, '');
    if (line.trim() === '') continue;

    if (header) {
      const cells = tokenize(line, start, header.delimiter);
      const mz = cells[header.mzColumn];
      const intensity = cells[header.intensityColumn];
      if (!mz || !intensity) {
        const column = Math.max(header.mzColumn, header.intensityColumn) + 1;
        fail(`expected at least ${column} columns as the header says`, lineNumber, start + line.length, start);
      }
      peaks.push(makePeak(mz, intensity, lineNumber, start));
      continue;
    }

    const tokens = tokenize(line.replace(/[()]/g, ' '), start, /\s,;:/);
    if (!sawData && tokens.some((token) => /[a-zA-Z]/.test(token.text) && !NUMBER.test(token.text))) {
      header = parseHeader(line, start, lineNumber);
      sawData = true;
      continue;
    }
    sawData = true;
    if (tokens.length % 2 !== 0) {
      const last = tokens[tokens.length - 1];
      fail('value without a partner: expected m/z and intensity in pairs', lineNumber, last?.position ?? start, start);
    }
    for (let t = 0; t < tokens.length; t += 2) {
      peaks.push(makePeak(tokens[t] as Token, tokens[t + 1] as Token, lineNumber, start));
    }
  }
  if (peaks.length === 0) {
    throw new ChemError('EMPTY_SPECTRUM', 'the peak list holds no peak', { position: 0 });
  }
  return peaks;
}
