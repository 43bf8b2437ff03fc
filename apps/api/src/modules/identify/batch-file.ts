import { ChemError, parsePeakList } from '@ionfolio/chem';
import { AppError } from '../../shared/app-error';
import { readSpectrumFile } from '../uploads/spectrum-file';

export interface UnknownSpectrum {
  name?: string | undefined;
  peaks: [number, number][];
}

/**
 * A CSV/TXT batch holds one spectrum per block; blocks are separated by blank lines, and a block may
 * start with `# name` (also a comment for the peak-list reader).
 */
function readTableBlocks(text: string): UnknownSpectrum[] {
  const blocks = text.replace(/\r\n?/g, '\n').split(/\n\s*\n/).filter((b) => b.trim() !== '');
  return blocks.map((block, i) => {
    const title = /^\s*#\s*(.+)$/m.exec(block.split('\n').find((l) => l.trim() !== '') ?? '');
    try {
      const peaks = parsePeakList(block);
      return { name: title?.[1]?.trim() ?? `block ${i + 1}`, peaks: peaks.map(([mz, y]) => [mz, y] as [number, number]) };
    } catch (err) {
      if (err instanceof ChemError) {
        throw new AppError('UNREADABLE_FILE', 400, `block ${i + 1}: ${err.message}`, {
          details: [{ path: `file.block ${i + 1}${err.field ? `.${err.field}` : ''}`, message: err.message }],
        });
      }
      throw err;
    }
  });
}

/**
 * The unknowns of an uploaded batch file: multi-block JCAMP-DX, or CSV/TSV/TXT with one spectrum per
 * block. The upload reader checks the name, refuses binary content and reads JCAMP-DX; a table is then
 * cut into its blocks here.
 */
export function readBatchFile(fileName: string, buf: Buffer): UnknownSpectrum[] {
  const read = readSpectrumFile(fileName, buf);
  if (read.format === 'jcamp') return read.blocks.map((b) => ({ name: b.title, peaks: b.peaks }));
  return readTableBlocks(buf.toString('utf8'));
}
