import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { requireRole } from '../../shared/require-role';
import { AccessKeyIdParams, CreateAccessKeyBody, ListAccessKeysQuery } from './access-keys.schemas';
import { createAccessKey, listAccessKeys, revokeAccessKey } from './access-keys.service';

/** Keys are managed from a signed-in session only: no route here declares a scope. */
export function accessKeysRoutes(ds: DataSource): Router {
  const r = Router();

  r.post('/access-keys', requireRole('reader'), async (req, res) => {
    const input = CreateAccessKeyBody.parse(req.body);
    res.status(201).json(await createAccessKey(ds, req.user!, input));
  });

  r.get('/access-keys', requireRole('reader'), async (req, res) => {
    const { all } = ListAccessKeysQuery.parse(req.query);
    res.json({ keys: await listAccessKeys(ds, req.user!, all) });
  });

  r.delete('/access-keys/:id', requireRole('reader'), async (req, res) => {
    const { id } = AccessKeyIdParams.parse(req.params);
    res.json({ key: await revokeAccessKey(ds, req.user!, id) });
  });

  return r;
}
