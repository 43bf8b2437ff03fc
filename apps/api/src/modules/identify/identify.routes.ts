import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { AppError } from '../../shared/app-error';
import { requireRole } from '../../shared/require-role';
import { MAX_UPLOAD_BYTES } from '../uploads/spectrum-file';
import { readBatchFile } from './batch-file';
import { batchBody, BatchFormFields, BatchJobIdParams, BatchSpectrumSchema } from './batch.schemas';
import { batchCsv } from './batch.service';
import { IdentifyBody } from './identify.schemas';
import { identify } from './identify.service';
import type { SearchService } from './search-service';

export function identifyRoutes(search: SearchService, options: { limit: RequestHandler; maxBatchSpectra: number }): Router {
  const r = Router();
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_UPLOAD_BYTES, files: 1, fields: 10 } });
  const BatchBody = batchBody(options.maxBatchSpectra);
  const access = requireRole('reader', { scope: 'search' });

  r.post('/identify', access, options.limit, async (req, res) => {
    res.json(await identify(search.library, IdentifyBody.parse(req.body), search.pool));
  });

  r.post('/identify/batch', access, options.limit, upload.single('file'), async (req, res) => {
    if (req.file) {
      const { method, reverse, edition, minMass, maxMass } = BatchFormFields.parse(req.body ?? {});
      const unknowns = readBatchFile(req.file.originalname, req.file.buffer);
      if (unknowns.length > options.maxBatchSpectra) {
        throw new AppError('VALIDATION', 400, `Invalid request at file: at most ${options.maxBatchSpectra} spectra per batch, the file holds ${unknowns.length}`);
      }
      const spectra = z.array(BatchSpectrumSchema).parse(unknowns.map((u) => ({ name: u.name?.slice(0, 200), peaks: u.peaks })));
      const job = await search.batch.submit(req.user!, spectra, { method, reverse, edition, minMass, maxMass }, req.file.originalname);
      res.status(202).json({ job });
      return;
    }
    if (req.is('multipart/form-data')) throw new AppError('VALIDATION', 400, 'Invalid request at file: attach the spectra as the form field "file"');
    const { spectra, ...batchOptions } = BatchBody.parse(req.body);
    res.status(202).json({ job: await search.batch.submit(req.user!, spectra, batchOptions) });
  });

  r.get('/identify/batch', access, async (req, res) => {
    res.json({ jobs: await search.batch.list(req.user!) });
  });

  r.get('/identify/batch/:id', access, async (req, res) => {
    const { id } = BatchJobIdParams.parse(req.params);
    res.json(await search.batch.get(req.user!, id));
  });

  r.get('/identify/batch/:id/csv', access, async (req, res) => {
    const { id } = BatchJobIdParams.parse(req.params);
    const { job, results } = await search.batch.get(req.user!, id);
    res.type('text/csv').attachment(`identify-batch-${id.slice(0, 8)}.csv`).send(batchCsv(job, results));
  });

  return r;
}
