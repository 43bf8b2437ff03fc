import { ChemError, parsePeakList, readJcamp, type JcampSpectrum } from '@ionfolio/chem';
import { AppError } from '../../shared/app-error';

export interface UploadedBlock {
  index: number;
  title: string;
  peaks: [number, number][];
  formula?: string | undefined;
  casRn?: string | undefined;
  ionizationEnergyEv?: number | undefined;
  retentionIndex?: number | undefined;
  inlet?: string | undefined;
  spectrometerType?: string | undefined;
}

export const MAX_UPLOAD_BYTES = 20 * 1024 * 1024;
const TEXT_EXTENSIONS = /\.(jdx|dx|jcamp|jcm|csv|tsv|txt)$/i;

/** A file that is not text (NUL bytes, or mostly control bytes) is refused before any parsing. */
function looksBinary(buf: Buffer): boolean {
  const sample = buf.subarray(0, Math.min(buf.length, 8192));
  let control = 0;
  for (const b of sample) {
    if (b === 0) return true;
    if (b < 9 || (b > 13 && b < 32)) control++;
  }
  return sample.length > 0 && control / sample.length > 0.05;
}

function fromJcamp(s: JcampSpectrum, index: number): UploadedBlock {
  return {
    index,
    title: s.title,
    peaks: s.peaks.map(([mz, i]) => [mz, i]),
    formula: s.formula,
    casRn: s.casRn,
    ionizationEnergyEv: s.ionizationEnergyEv,
    retentionIndex: s.retentionIndex,
    inlet: s.inlet,
    spectrometerType: s.spectrometerType,
  };
}

/**
 * Reads an uploaded spectrum file — JCAMP-DX (one or many blocks) or a peak table (CSV, TSV,
 * TXT) — without executing or storing anything. Errors name the block and line.
 */
export function readSpectrumFile(fileName: string, buf: Buffer): { format: 'jcamp' | 'table'; blocks: UploadedBlock[] } {
  if (!TEXT_EXTENSIONS.test(fileName)) {
    throw new AppError('UNSUPPORTED_FILE', 415, `${fileName}: expected a .jdx/.dx/.jcamp, .csv, .tsv or .txt file`);
  }
  if (looksBinary(buf)) throw new AppError('BINARY_FILE', 400, `${fileName} is not a text file`);
  // Old Mac files end lines with a lone CR; one LF for each keeps every offset the readers report.
  const text = buf.toString('utf8').replace(/\r(?!\n)/g, '\n');
  const isJcamp = /^\s*##/m.test(text.slice(0, 4096)) || /\.(jdx|dx|jcamp|jcm)$/i.test(fileName);
  try {
    if (isJcamp) {
      const spectra = readJcamp(text);
      if (spectra.length === 0) throw new AppError('UNREADABLE_FILE', 400, `${fileName}: no spectrum blocks found`);
      return { format: 'jcamp', blocks: spectra.map((s, i) => fromJcamp(s, i + 1)) };
    }
    const peaks = parsePeakList(text);
    return { format: 'table', blocks: [{ index: 1, title: fileName.replace(/\.[^.]+$/, ''), peaks: peaks.map(([mz, i]) => [mz, i]) }] };
  } catch (err) {
    if (err instanceof ChemError) {
      throw new AppError('UNREADABLE_FILE', 400, `${fileName}: ${err.message}`, {
        details: [{ path: err.field ?? 'file', message: err.message, position: err.position }],
      });
    }
    throw err;
  }
}
