import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { requireRole } from '../../shared/require-role';
import { ChangeRoleBody, UserIdParams } from './users.schemas';
import { changeRole, listUsers } from './users.service';

export function usersRoutes(ds: DataSource): Router {
  const r = Router();

  r.get('/me', requireRole('reader'), (req, res) => {
    res.json({ user: req.user });
  });

  r.get('/admin/users', requireRole('admin'), async (_req, res) => {
    res.json({ users: await listUsers(ds) });
  });

  r.patch('/admin/users/:id', requireRole('admin'), async (req, res) => {
    const { id } = UserIdParams.parse(req.params);
    const { role } = ChangeRoleBody.parse(req.body);
    res.json({ user: await changeRole(ds, req.user!, id, role) });
  });

  return r;
}
