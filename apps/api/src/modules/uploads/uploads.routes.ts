import { Router } from 'express';
import multer from 'multer';
import { AppError } from '../../shared/app-error';
import { requireRole } from '../../shared/require-role';
import { MAX_UPLOAD_BYTES, readSpectrumFile } from './spectrum-file';

/** Files are held in memory only for the request and never written to disk or the web root. */
export const spectrumUpload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_UPLOAD_BYTES, files: 1 } });

export function uploadsRoutes(): Router {
  const r = Router();
  r.post('/uploads/spectra', requireRole('contributor'), spectrumUpload.single('file'), (req, res) => {
    if (!req.file) throw new AppError('VALIDATION', 400, 'Send the file in the multipart field "file"', { details: [{ path: 'file', message: 'missing' }] });
    const parsed = readSpectrumFile(req.file.originalname, req.file.buffer);
    res.json({ fileName: req.file.originalname, ...parsed });
  });
  return r;
}
