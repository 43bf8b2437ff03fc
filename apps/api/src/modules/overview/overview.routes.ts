import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { requireRole } from '../../shared/require-role';
import { getOverview } from './overview.service';

export function overviewRoutes(ds: DataSource): Router {
  const r = Router();
  r.get('/overview', requireRole('reader'), async (_req, res) => {
    res.json(await getOverview(ds));
  });
  return r;
}
