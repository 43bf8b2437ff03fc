import { Router } from 'express';
import type { DataSource } from 'typeorm';

/** Public: says whether the API and its database answer. */
export function healthRoutes(ds: DataSource): Router {
  const r = Router();
  r.get('/health', async (_req, res) => {
    try {
      await ds.query('SELECT 1');
      res.json({ status: 'ok', database: 'up' });
    } catch {
      res.status(503).set('Retry-After', '5').json({ status: 'degraded', database: 'down' });
    }
  });
  return r;
}
