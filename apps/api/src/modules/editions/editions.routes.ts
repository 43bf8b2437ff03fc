import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { EditionBody } from '@ionfolio/contracts';
import { requireRole } from '../../shared/require-role';
import { editionCsv, editionJcamp, freezeEdition, getEdition, listEditions } from './editions.service';

const LabelParams = z.object({ label: z.string().regex(/^[0-9A-Za-z][0-9A-Za-z._-]{0,31}$/, 'not an edition label') });

export function editionsRoutes(ds: DataSource): Router {
  const r = Router();
  r.get('/editions', requireRole('reader', { scope: 'library:read' }), async (_req, res) => {
    res.json({ editions: await listEditions(ds) });
  });
  r.post('/editions', requireRole('curator'), async (req, res) => {
    const { label, notes } = EditionBody.parse(req.body);
    res.status(201).json({ edition: await freezeEdition(ds, req.user!, label, notes) });
  });
  r.get('/editions/:label', requireRole('reader', { scope: 'library:read' }), async (req, res) => {
    const { label } = LabelParams.parse(req.params);
    res.json(await getEdition(ds, label));
  });
  r.get('/editions/:label/jcamp', requireRole('reader', { scope: 'library:read' }), async (req, res) => {
    const { label } = LabelParams.parse(req.params);
    const text = await editionJcamp(ds, req.user!, label);
    res.type('chemical/x-jcamp-dx').attachment(`ionfolio-edition-${label}.jdx`).send(text);
  });
  r.get('/editions/:label/csv', requireRole('reader', { scope: 'library:read' }), async (req, res) => {
    const { label } = LabelParams.parse(req.params);
    const text = await editionCsv(ds, req.user!, label);
    res.type('text/csv').attachment(`ionfolio-edition-${label}.csv`).send(text);
  });
  return r;
}
