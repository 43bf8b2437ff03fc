import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { requireRole } from '../../shared/require-role';
import { StructureSearchBody } from './structure-search.schemas';
import { searchStructures } from './structure-search.service';

export function structureSearchRoutes(ds: DataSource): Router {
  const r = Router();
  r.post('/structure-search', requireRole('reader'), async (req, res) => {
    res.json(await searchStructures(ds, StructureSearchBody.parse(req.body)));
  });
  return r;
}
