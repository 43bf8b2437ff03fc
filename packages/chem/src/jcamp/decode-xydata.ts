import type { JcampBlock, JcampLine } from './jcamp-records';
import { jcampError } from './jcamp-records';

// ASDF forms of McDonald & Wilks 1988 (Appl. Spectrosc. 42, 151), table of pseudo-digits:
// SQZ  @ A–I = 0 +1…+9, a–i = −1…−9 (an absolute value begins);
// DIF  % J–R = 0 +1…+9, j–r = −1…−9 (a difference from the previous value begins);
// DUP  S–Z = 1…8, s = 9 (the previous value, or difference, occurs this many times in all).
const SQZ = '@ABCDEFGHI';
const SQZ_NEGATIVE = 'abcdefghi';
const DIF = '%JKLMNOPQR';
const DIF_NEGATIVE = 'jklmnopqr';
const DUP = 'STUVWXYZs';

type Kind = 'abs' | 'dif' | 'dup';

interface Token {
  kind: Kind;
  text: string;
  position: number;
}

const X_VALUE = /^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]\d+)?)/;

function tokenizeOrdinates(line: JcampLine, from: number, block: JcampBlock): Token[] {
  const tokens: Token[] = [];
  let current: Token | null = null;
  const text = line.text;
  for (let i = from; i < text.length; i += 1) {
    const char = text.charAt(i);
    const position = line.position + i;
    if (char === ' ' || char === '\t' || char === ',' || char === ';') {
      current = null;
    } else if (char >= '0' && char <= '9') {
      if (current) current.text += char;
      else tokens.push((current = { kind: 'abs', text: char, position }));
    } else if (char === '.') {
      if (current && current.kind === 'abs' && !current.text.includes('.')) current.text += char;
      else if (!current) tokens.push((current = { kind: 'abs', text: '.', position }));
      else throw jcampError(`"." cannot appear here in ${current.kind.toUpperCase()} form`, position, line.lineNumber, block);
    } else if ((char === 'E' || char === 'e') && current?.kind === 'abs' && /[+-]/.test(text.charAt(i + 1))) {
      current.text += `e${text.charAt(i + 1)}`;
      i += 1;
    } else if (char === '+' || char === '-') {
      tokens.push((current = { kind: 'abs', text: char, position }));
    } else if (SQZ.includes(char)) {
      tokens.push((current = { kind: 'abs', text: String(SQZ.indexOf(char)), position }));
    } else if (SQZ_NEGATIVE.includes(char)) {
      tokens.push((current = { kind: 'abs', text: `-${SQZ_NEGATIVE.indexOf(char) + 1}`, position }));
    } else if (DIF.includes(char)) {
      tokens.push((current = { kind: 'dif', text: String(DIF.indexOf(char)), position }));
    } else if (DIF_NEGATIVE.includes(char)) {
      tokens.push((current = { kind: 'dif', text: `-${DIF_NEGATIVE.indexOf(char) + 1}`, position }));
    } else if (DUP.includes(char)) {
      tokens.push((current = { kind: 'dup', text: String(DUP.indexOf(char) + 1), position }));
    } else {
      throw jcampError(`unexpected character "${char}" in XYDATA`, position, line.lineNumber, block);
    }
  }
  return tokens;
}

function tokenNumber(token: Token, line: JcampLine, block: JcampBlock): number {
  const value = Number(token.text);
  if (token.text === '+' || token.text === '-' || token.text === '.' || !Number.isFinite(value)) {
    throw jcampError(`"${token.text}" is not a number`, token.position, line.lineNumber, block);
  }
  return value;
}

/** One decoded XYDATA line: its abscissa as written and its ordinates (check value removed). */
export interface XyDataLine {
  readonly x: number;
  readonly xPosition: number;
  readonly lineNumber: number;
  /** Index (in the whole table) of the first ordinate written on the line, check value included. */
  readonly firstIndex: number;
}

/**
 * Decodes the lines of an `(X++(Y..Y))` table in AFFN or ASDF (SQZ, DIF, DUP, PAC) form into raw
 * ordinates, dropping the Y check value that starts a line after a line ending in DIF form.
 *
 * @throws {ChemError} `JCAMP_SYNTAX` at the offending character or value, or when a check value
 *   disagrees with the value that ended the previous line.
 */
export function decodeXyData(
  lines: readonly JcampLine[],
  block: JcampBlock,
): { ordinates: number[]; lines: XyDataLine[] } {
  const ordinates: number[] = [];
  const decoded: XyDataLine[] = [];
  let previousEndedInDif = false;
  for (const line of lines) {
    if (line.text.trim() === '') continue;
    const xMatch = X_VALUE.exec(line.text);
    if (!xMatch || xMatch[1] === undefined) {
      const lead = line.text.length - line.text.trimStart().length;
      throw jcampError('an XYDATA line must start with its X value', line.position + lead, line.lineNumber, block);
    }
    const xPosition = line.position + xMatch[0].length - xMatch[1].length;
    const tokens = tokenizeOrdinates(line, xMatch[0].length, block);
    const values: number[] = [];
    let lastKind: Kind | null = null;
    let lastDelta = 0;
    let endedInDif = false;
    for (const token of tokens) {
      const number = tokenNumber(token, line, block);
      if (token.kind === 'abs') {
        values.push(number);
        endedInDif = false;
      } else if (token.kind === 'dif') {
        const before = values.length > 0 ? values[values.length - 1] : ordinates[ordinates.length - 1];
        if (before === undefined) throw jcampError('DIF value with no value before it', token.position, line.lineNumber, block);
        values.push(before + number);
        lastDelta = number;
        endedInDif = true;
      } else {
        const before = values[values.length - 1];
        if (before === undefined || lastKind === null || lastKind === 'dup') {
          throw jcampError('DUP count with no value before it', token.position, line.lineNumber, block);
        }
        for (let n = 1; n < number; n += 1) {
          const last = values[values.length - 1] as number;
          values.push(lastKind === 'dif' ? last + lastDelta : before);
        }
      }
      lastKind = token.kind;
    }
    if (values.length === 0) {
      throw jcampError('an XYDATA line holds no Y value', xPosition, line.lineNumber, block);
    }
    let firstIndex = ordinates.length;
    if (previousEndedInDif) {
      const check = values.shift() as number;
      const expected = ordinates[ordinates.length - 1];
      if (expected !== check) {
        throw jcampError(
          `Y check value ${check} differs from ${String(expected)}, the last value of the line before`,
          tokens[0]?.position ?? xPosition,
          line.lineNumber,
          block,
        );
      }
      firstIndex -= 1;
    }
    ordinates.push(...values);
    decoded.push({ x: Number(xMatch[1]), xPosition, lineNumber: line.lineNumber, firstIndex });
    previousEndedInDif = endedInDif;
  }
  return { ordinates, lines: decoded };
}
