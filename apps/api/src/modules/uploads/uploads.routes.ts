import { Router } from 'express';
import multer from 'multer';
import { AppError } from '../../shared/app-error';
import { requireRole } from '../../shared/require-role';
import { PeakSchema } from '@ionfolio/contracts';
import { MAX_UPLOAD_BYTES, readSpectrumFile, type UploadedBlock } from './spectrum-file';

// The most peaks a revision may hold (RevisionContentSchema): a block above it can never be saved.
const MAX_BLOCK_PEAKS = 5000;

/** Refuses a block that no revision could hold, naming the block and the peak, before the editor shows it. */
function checkBlocks(fileName: string, blocks: UploadedBlock[]): void {
  for (const block of blocks) {
    const where = blocks.length > 1 ? `${fileName}, block ${block.index}` : fileName;
    if (block.peaks.length > MAX_BLOCK_PEAKS) {
      throw new AppError('UNREADABLE_FILE', 400, `${where}: ${block.peaks.length} peaks; a spectrum holds at most ${MAX_BLOCK_PEAKS} (centroid the scan first)`);
    }
    block.peaks.forEach((peak, i) => {
      const checked = PeakSchema.safeParse(peak);
      if (!checked.success) {
        throw new AppError('UNREADABLE_FILE', 400, `${where}: peak ${i + 1} (m/z ${peak[0]}): ${checked.error.issues[0]?.message ?? 'not a valid peak'}`);
      }
    });
  }
}

/** Files are held in memory only for the request and never written to disk or the web root. */
export const spectrumUpload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_UPLOAD_BYTES, files: 1 } });

export function uploadsRoutes(): Router {
  const r = Router();
  r.post('/uploads/spectra', requireRole('contributor'), spectrumUpload.single('file'), (req, res) => {
    if (!req.file) throw new AppError('VALIDATION', 400, 'Send the file in the multipart field "file"', { details: [{ path: 'file', message: 'missing' }] });
    const parsed = readSpectrumFile(req.file.originalname, req.file.buffer);
    checkBlocks(req.file.originalname, parsed.blocks);
    res.json({ fileName: req.file.originalname, ...parsed });
  });
  return r;
}
