import { Router } from 'express';
import type { DataSource } from 'typeorm';
import type { Logger } from 'pino';
import { z } from 'zod';
import { AppError } from '../../shared/app-error';
import { requireRole } from '../../shared/require-role';
import { readSpectrumFile } from '../uploads/spectrum-file';
import { spectrumUpload } from '../uploads/uploads.routes';
import { getImport, startImport } from './imports.service';

const ImportQuery = z.object({ target: z.enum(['draft', 'in_review']).default('draft') });
const JobParams = z.object({ id: z.uuid('must be an import id') });

export function importsRoutes(ds: DataSource, log: Logger): Router {
  const r = Router();
  r.post('/imports', requireRole('curator'), spectrumUpload.single('file'), async (req, res) => {
    const { target } = ImportQuery.parse(req.query);
    if (!req.file) throw new AppError('VALIDATION', 400, 'Send the file in the multipart field "file"', { details: [{ path: 'file', message: 'missing' }] });
    const { blocks } = readSpectrumFile(req.file.originalname, req.file.buffer);
    res.status(202).json(await startImport(ds, log, req.user!, req.file.originalname, blocks, target));
  });
  r.get('/imports/:id', requireRole('curator'), async (req, res) => {
    const { id } = JobParams.parse(req.params);
    res.json(await getImport(ds, req.user!, id));
  });
  return r;
}
