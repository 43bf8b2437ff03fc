import { ChemError } from '../errors/chem-error';

/** One line of text inside a labelled data record, with its absolute offset and line number. */
export interface JcampLine {
  readonly text: string;
  readonly position: number;
  readonly lineNumber: number;
}

/** One labelled data record (`##LABEL=value`), its value's first line and continuation lines. */
export interface JcampRecord {
  /** The label as written, trimmed and upper-cased, e.g. `.IONIZATION ENERGY`. */
  readonly label: string;
  /** The label normalised for matching: upper case, without spaces, `-`, `/`, `_`. */
  readonly key: string;
  readonly value: JcampLine;
  readonly more: readonly JcampLine[];
  readonly position: number;
  readonly lineNumber: number;
}

/** A block between `##TITLE=` and `##END=`; LINK blocks hold child blocks. */
export interface JcampBlock {
  /** 1-based index of the block in file order (a LINK block and each child count once). */
  readonly index: number;
  readonly records: JcampRecord[];
  readonly children: JcampBlock[];
  readonly position: number;
  readonly lineNumber: number;
  readonly parent: JcampBlock | null;
}

/**
 * Normalises a JCAMP-DX label name for matching: upper case with spaces, `-`, `/` and `_`
 * removed (McDonald & Wilks 1988, Appl. Spectrosc. 42, 151: labels compare this way).
 *
 * @example jcampLabelKey('.Ionization_Energy') // '.IONIZATIONENERGY'
 */
export function jcampLabelKey(label: string): string {
  return label.toUpperCase().replace(/[\s\-/_]/g, '');
}

/** Value of a record: its first line and its continuation lines, joined by newlines and trimmed. */
export function recordText(record: JcampRecord): string {
  return [record.value.text, ...record.more.map((line) => line.text)].join('\n').trim();
}

/** Builds the error every JCAMP-DX problem throws: block and line in the message and field. */
export function jcampError(message: string, position: number, lineNumber: number, block?: JcampBlock): ChemError {
  const where = block ? `block ${block.index}, line ${lineNumber}` : `line ${lineNumber}`;
  return new ChemError('JCAMP_SYNTAX', `${where}: ${message}`, {
    position,
    field: block ? `block ${block.index}` : `line ${lineNumber}`,
  });
}

/** Strips a `$$` comment from a line (the comment runs to the end of the line). */
function stripComment(line: string): string {
  const at = line.indexOf('$$');
  return at >= 0 ? line.slice(0, at) : line;
}

/** Splits JCAMP-DX text into labelled data records, with offsets for error messages. */
export function splitRecords(text: string): JcampRecord[] {
  if (text.includes('\u0000')) {
    throw jcampError('binary content: this is not a JCAMP-DX text file', text.indexOf('\u0000'), 1);
  }
  const records: { label: string; key: string; value: JcampLine; more: JcampLine[]; position: number; lineNumber: number }[] = [];
  let offset = 0;
  const lines = text.split('\n');
  for (let index = 0; index < lines.length; index += 1) {
    const raw = (lines[index] ?? '').replace(/\r$/, '');
    const lineNumber = index + 1;
    const start = offset;
    offset += (lines[index] ?? '').length + 1;
    const line = stripComment(raw);
    const lead = line.length - line.trimStart().length;
    if (line.trimStart().startsWith('##')) {
      const equals = line.indexOf('=', lead);
      if (equals < 0) throw jcampError(`label "${line.trim()}" has no "="`, start + lead, lineNumber);
      const label = line.slice(lead + 2, equals).trim().toUpperCase();
      if (label === '') continue; // "##=" is a comment record
      records.push({
        label,
        key: jcampLabelKey(label),
        value: { text: line.slice(equals + 1), position: start + equals + 1, lineNumber },
        more: [],
        position: start + lead,
        lineNumber,
      });
    } else if (line.trim() !== '') {
      const last = records[records.length - 1];
      if (!last) throw jcampError('text before the first ##TITLE=: not a JCAMP-DX file', start + lead, lineNumber);
      last.more.push({ text: line, position: start, lineNumber });
    }
  }
  return records;
}

function isLink(block: JcampBlock): boolean {
  return block.records.some(
    (record) =>
      record.key === 'BLOCKS' || (record.key === 'DATATYPE' && jcampLabelKey(record.value.text) === 'LINK'),
  );
}

/**
 * Groups records into blocks. A `##TITLE=` inside an open LINK block opens a child; inside any
 * other open block it means that block lacks its `##END=`.
 */
export function groupBlocks(records: readonly JcampRecord[]): JcampBlock[] {
  const roots: JcampBlock[] = [];
  const open: JcampBlock[] = [];
  let count = 0;
  for (const record of records) {
    const top = open[open.length - 1];
    if (record.key === 'TITLE') {
      if (top && !isLink(top)) {
        throw jcampError('##END= missing before the next ##TITLE=', record.position, record.lineNumber, top);
      }
      count += 1;
      const block: JcampBlock = {
        index: count,
        records: [record],
        children: [],
        position: record.position,
        lineNumber: record.lineNumber,
        parent: top ?? null,
      };
      if (top) top.children.push(block);
      else roots.push(block);
      open.push(block);
      continue;
    }
    if (!top) {
      throw jcampError(`##${record.label}= outside a block (a block starts with ##TITLE=)`, record.position, record.lineNumber);
    }
    if (record.key === 'END') {
      if (isLink(top)) checkLinkCount(top, record);
      open.pop();
      continue;
    }
    top.records.push(record);
  }
  const unclosed = open[open.length - 1];
  if (unclosed) {
    const last = records[records.length - 1];
    const end = last ? (last.more[last.more.length - 1] ?? last.value) : undefined;
    const position = end ? end.position + end.text.length : unclosed.position;
    throw jcampError('##END= missing: the file ends inside this block', position, end?.lineNumber ?? unclosed.lineNumber, unclosed);
  }
  return roots;
}

function checkLinkCount(block: JcampBlock, end: JcampRecord): void {
  const declared = block.records.find((record) => record.key === 'BLOCKS');
  if (!declared) return;
  const expected = Number(declared.value.text.trim());
  if (!Number.isInteger(expected) || expected < 0) {
    throw jcampError(`##BLOCKS=${declared.value.text.trim()} is not a count`, declared.value.position, declared.lineNumber, block);
  }
  if (expected !== block.children.length) {
    throw jcampError(
      `LINK block declares ##BLOCKS=${expected} but holds ${block.children.length}`,
      end.position,
      end.lineNumber,
      block,
    );
  }
}
