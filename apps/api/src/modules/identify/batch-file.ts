import { AppError } from '../../shared/app-error';
import { readSpectrumFile } from '../uploads/spectrum-file';

export interface UnknownSpectrum {
  name?: string | undefined;
  peaks: [number, number][];
}

/**
 * A CSV/TXT batch holds one spectrum per block; blocks are separated by blank lines, and a block may
 * start with `# name` (a comment for the peak-list reader). Each block is read as one uploaded table
 * (name, binary and syntax checks of the upload reader), its errors prefixed with the block number.
 */
function readTableBlocks(fileName: string, text: string): UnknownSpectrum[] {
  const blocks = text.replace(/\r\n?/g, '\n').split(/\n[ \t]*\n/).filter((b) => b.trim() !== '');
  if (blocks.length === 0) throw new AppError('UNREADABLE_FILE', 400, `${fileName}: the file holds no spectrum`);
  return blocks.map((block, i) => {
    const title = /^\s*#\s*(.+)$/.exec(block.split('\n').find((l) => l.trim() !== '') ?? '');
    try {
      const [only] = readSpectrumFile(fileName, Buffer.from(block, 'utf8')).blocks;
      return { name: title?.[1]?.trim() ?? `block ${i + 1}`, peaks: only!.peaks };
    } catch (err) {
      if (err instanceof AppError && err.status === 400) {
        throw new AppError(err.code, 400, `block ${i + 1}: ${err.message}`, { cause: err, details: err.details });
      }
      throw err;
    }
  });
}

/**
 * The unknowns of an uploaded batch file: multi-block JCAMP-DX (read by the upload reader, which also
 * checks the name and refuses binary content), or CSV/TSV/TXT with one spectrum per block.
 */
export function readBatchFile(fileName: string, buf: Buffer): UnknownSpectrum[] {
  const head = buf.subarray(0, 4096).toString('utf8');
  if (/^\s*##/m.test(head) || /\.(jdx|dx|jcamp|jcm)$/i.test(fileName)) {
    return readSpectrumFile(fileName, buf).blocks.map((b) => ({ name: b.title, peaks: b.peaks }));
  }
  return readTableBlocks(fileName, buf.toString('utf8'));
}
