import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { DATABASE_RETRY_AFTER_S } from '../../shared/error-middleware';

// A health probe must answer quickly even when the database hangs instead of refusing.
const PROBE_TIMEOUT_MS = 2000;

/** Public: says whether the API and its database answer. */
export function healthRoutes(ds: DataSource): Router {
  const r = Router();
  r.get('/health', async (_req, res) => {
    let timer: NodeJS.Timeout | undefined;
    try {
      await Promise.race([
        ds.query('SELECT 1'),
        new Promise((_resolve, reject) => {
          timer = setTimeout(() => reject(new Error('database probe timed out')), PROBE_TIMEOUT_MS);
        }),
      ]);
      res.json({ status: 'ok', database: 'up' });
    } catch {
      res.status(503).set('Retry-After', String(DATABASE_RETRY_AFTER_S)).json({ status: 'degraded', database: 'down' });
    } finally {
      clearTimeout(timer);
    }
  });
  return r;
}
