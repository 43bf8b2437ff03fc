import { ChemError, parsePeakList, readJcamp, type PeakList } from '@ionfolio/chem';

/** One unknown read from a file or a paste: a name to show, its peaks, and what the file said besides. */
export type NamedSpectrum = {
  name: string;
  peaks: PeakList;
  formula?: string | undefined;
  retentionIndex?: number | undefined;
};

/** A file that could not be read, with the place in it (line numbers count from the file's first line). */
export class SpectrumFileError extends Error {
  override readonly name = 'SpectrumFileError';
}

const JCAMP_NAME = /\.(jdx|dx|jcamp|jcm)$/i;

/** True when the text is JCAMP-DX: by the file name, or by a first line that opens a labelled record. */
export function looksLikeJcamp(text: string, fileName = ''): boolean {
  if (JCAMP_NAME.test(fileName)) return true;
  const first = text.split(/\r?\n/).find((line) => line.trim() !== '');
  return first !== undefined && first.trimStart().startsWith('##');
}

type TextBlock = { firstLine: number; lines: string[] };

function splitBlocks(text: string): TextBlock[] {
  const blocks: TextBlock[] = [];
  let current: TextBlock | null = null;
  text.split(/\n/).forEach((raw, index) => {
    const line = raw.replace(/\r$/, '');
    if (line.trim() === '') {
      current = null;
      return;
    }
    if (current === null) {
      current = { firstLine: index + 1, lines: [] };
      blocks.push(current);
    }
    current.lines.push(line);
  });
  return blocks;
}

const isComment = (line: string) => line.trimStart().startsWith('#');
/** A header row starts with a name, a data row with a number. */
const isHeader = (line: string) => !/^\s*[+-]?(\d|\.\d)/.test(line);

/** "line 3, column 5: …" from a block becomes the same place counted from the top of the file. */
function shiftLines(message: string, offset: number): string {
  return message.replace(/^line (\d+)/, (_, n: string) => `line ${Number(n) + offset}`);
}

/**
 * Peak-list text with one or more spectra separated by blank lines (CSV, TSV or plain pairs). A block
 * may start with a `# name` comment that names it; a header row in the first block is reused by later
 * blocks that have none.
 */
function readTextBlocks(text: string, fileName: string): NamedSpectrum[] {
  const blocks = splitBlocks(text).filter((block) => block.lines.some((line) => !isComment(line)));
  let header: string | null = null;
  return blocks.map((block, index) => {
    const nameLine = block.lines.find(isComment);
    const firstData = block.lines.find((line) => !isComment(line)) ?? '';
    let body = block.lines.join('\n');
    let offset = block.firstLine - 1;
    if (index === 0 && isHeader(firstData)) header = firstData;
    else if (header !== null && !isHeader(firstData)) {
      body = `${header}\n${body}`;
      offset -= 1;
    }
    let peaks: PeakList;
    try {
      peaks = parsePeakList(body);
    } catch (error) {
      if (error instanceof ChemError) throw new SpectrumFileError(`${fileName || 'The text'}: ${shiftLines(error.message, offset)}`);
      throw error;
    }
    const named = nameLine?.replace(/^\s*#+\s*/, '').trim();
    const fallback = blocks.length === 1 ? fileName.replace(/\.[^.]+$/, '') || 'Unknown' : `Spectrum ${index + 1}`;
    return { name: named || fallback, peaks };
  });
}

/**
 * Every spectrum in an uploaded file, read in the browser: JCAMP-DX (one block, concatenated blocks
 * or a LINK block) through packages/chem `readJcamp`, anything else as peak-list text.
 *
 * @throws {SpectrumFileError} naming the file and the line of the first problem.
 */
export function readSpectraText(text: string, fileName = ''): NamedSpectrum[] {
  if (text.includes('\u0000')) throw new SpectrumFileError(`${fileName || 'The file'} is not a text file.`);
  if (looksLikeJcamp(text, fileName)) {
    try {
      return readJcamp(text).map((block, index) => ({
        name: block.title.trim() || `Block ${index + 1}`,
        peaks: block.peaks,
        formula: block.formula,
        retentionIndex: block.retentionIndex,
      }));
    } catch (error) {
      if (error instanceof ChemError) throw new SpectrumFileError(`${fileName || 'The file'}: ${error.message}`);
      throw error;
    }
  }
  return readTextBlocks(text, fileName);
}
