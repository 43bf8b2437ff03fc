import { ChemError } from '../errors/chem-error';
import { isElementSymbol, type ElementCounts, type ElementSymbol } from '../elements/elements';

/** Largest atom count of one element that a formula may hold (guards against absurd input). */
export const MAX_ATOM_COUNT = 1_000_000;

const OPENERS: Readonly<Record<string, string>> = { '(': ')', '[': ']', '{': '}' };
const CLOSERS = new Set([')', ']', '}']);
const SEPARATORS = new Set(['.', '·', '*', '•']);

type MutableCounts = Partial<Record<ElementSymbol, number>>;

interface Frame {
  counts: MutableCounts;
  opener: string;
  position: number;
  atomsBefore: number;
}

function isDigit(ch: string | undefined): boolean {
  return ch !== undefined && ch >= '0' && ch <= '9';
}
function isUpper(ch: string | undefined): boolean {
  return ch !== undefined && ch >= 'A' && ch <= 'Z';
}
function isLower(ch: string | undefined): boolean {
  return ch !== undefined && ch >= 'a' && ch <= 'z';
}
function isSpace(ch: string | undefined): boolean {
  return ch === ' ' || ch === '\t' || ch === '\n' || ch === '\r';
}

function addInto(target: MutableCounts, source: MutableCounts, factor: number, position: number): void {
  for (const symbol of Object.keys(source) as ElementSymbol[]) {
    const total = (target[symbol] ?? 0) + (source[symbol] ?? 0) * factor;
    if (total > MAX_ATOM_COUNT) {
      throw new ChemError('FORMULA_SYNTAX', `More than ${MAX_ATOM_COUNT} atoms of ${symbol}`, { position });
    }
    target[symbol] = total;
  }
}

/**
 * Parses a molecular formula into atom counts per element.
 *
 * Accepts element symbols (case-sensitive, `Cl` not `CL`) each followed by an optional count,
 * nested groups in `()`, `[]` or `{}` with an optional multiplier (`CH3(CH2)4OH`), blanks between
 * tokens as JCAMP-DX `##MOLFORM` writes them (`C 8 H 8 O`), and adduct separators `.`, `·`, `*`
 * with an optional leading multiplier (`C2H6O.2H2O`). A count of 0 is allowed and drops the element.
 *
 * @param text - the formula
 * @returns frozen counts, only elements with a count above 0
 * @throws {TypeError} when `text` is not a string
 * @throws {ChemError} `FORMULA_SYNTAX` (empty text, unbalanced bracket, stray character or count,
 *   count above {@link MAX_ATOM_COUNT}) or `UNKNOWN_ELEMENT`, with the 0-based `position` of the problem
 * @example
 * parseFormula('CH3(CH2)4OH') // { C: 5, H: 12, O: 1 }
 * parseFormula('C 8 H 8 O')   // { C: 8, H: 8, O: 1 }
 */
export function parseFormula(text: string): ElementCounts {
  if (typeof text !== 'string') throw new TypeError('parseFormula expects a string');
  const stack: Frame[] = [];
  let current: MutableCounts = {};
  const parts: MutableCounts[] = [];
  let partMultiplier = 1;
  let partStart = true;
  let atomTokens = 0;
  let atomTokensAtPartStart = 0;
  let separatorPosition = -1;
  let i = 0;

  const readCount = (): { value: number; found: boolean; start: number } => {
    let j = i;
    while (isSpace(text[j])) j++;
    if (!isDigit(text[j])) return { value: 1, found: false, start: j };
    const start = j;
    while (isDigit(text[j])) j++;
    const value = Number(text.slice(start, j));
    if (value > MAX_ATOM_COUNT) {
      throw new ChemError('FORMULA_SYNTAX', `Count ${text.slice(start, j)} is too large`, {
        position: start,
      });
    }
    i = j;
    return { value, found: true, start };
  };

  const closePart = () => {
    if (atomTokens === atomTokensAtPartStart) {
      const position = separatorPosition >= 0 ? separatorPosition : Math.min(i, text.length);
      throw new ChemError('FORMULA_SYNTAX', `Formula part without any element at position ${position}`, {
        position,
      });
    }
    const part: MutableCounts = {};
    addInto(part, current, partMultiplier, i);
    parts.push(part);
    current = {};
    atomTokensAtPartStart = atomTokens;
  };

  while (i < text.length) {
    const ch = text[i] as string;
    if (isSpace(ch)) {
      i++;
      continue;
    }
    if (partStart && isDigit(ch) && parts.length > 0) {
      const { value } = readCount();
      partMultiplier = value;
      partStart = false;
      continue;
    }
    partStart = false;
    if (isUpper(ch)) {
      const start = i;
      let symbol = ch;
      if (isLower(text[i + 1])) symbol += text[i + 1];
      if (!isElementSymbol(symbol)) {
        throw new ChemError('UNKNOWN_ELEMENT', `Unknown element "${symbol}" at position ${start}`, {
          position: start,
        });
      }
      i += symbol.length;
      const { value } = readCount();
      addInto(current, { [symbol]: 1 }, value, start);
      atomTokens++;
      continue;
    }
    if (ch in OPENERS) {
      stack.push({ counts: current, opener: ch, position: i, atomsBefore: atomTokens });
      current = {};
      i++;
      continue;
    }
    if (CLOSERS.has(ch)) {
      const frame = stack.pop();
      if (frame === undefined || OPENERS[frame.opener] !== ch) {
        throw new ChemError('FORMULA_SYNTAX', `Unbalanced "${ch}" at position ${i}`, { position: i });
      }
      if (atomTokens === frame.atomsBefore) {
        throw new ChemError('FORMULA_SYNTAX', `Empty group at position ${frame.position}`, {
          position: frame.position,
        });
      }
      const closerPosition = i;
      i++;
      const { value } = readCount();
      addInto(frame.counts, current, value, closerPosition);
      current = frame.counts;
      continue;
    }
    if (SEPARATORS.has(ch)) {
      if (stack.length > 0) {
        const open = stack[stack.length - 1] as Frame;
        throw new ChemError('FORMULA_SYNTAX', `Unbalanced "${open.opener}" at position ${open.position}`, {
          position: open.position,
        });
      }
      closePart();
      separatorPosition = i;
      partMultiplier = 1;
      partStart = true;
      i++;
      continue;
    }
    const what = isDigit(ch) ? 'a count without an element' : `unexpected character "${ch}"`;
    throw new ChemError('FORMULA_SYNTAX', `Formula has ${what} at position ${i}`, { position: i });
  }

  if (stack.length > 0) {
    const open = stack[stack.length - 1] as Frame;
    throw new ChemError('FORMULA_SYNTAX', `Unbalanced "${open.opener}" at position ${open.position}`, {
      position: open.position,
    });
  }
  if (atomTokens === 0) {
    throw new ChemError('FORMULA_SYNTAX', 'Formula has no element', { position: 0 });
  }
  closePart();

  const total: MutableCounts = {};
  for (const part of parts) addInto(total, part, 1, text.length);
  const result: MutableCounts = {};
  for (const symbol of Object.keys(total) as ElementSymbol[]) {
    if ((total[symbol] ?? 0) > 0) result[symbol] = total[symbol];
  }
  return Object.freeze(result);
}
