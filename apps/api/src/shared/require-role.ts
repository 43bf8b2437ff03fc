import type { RequestHandler } from 'express';
import { AppError } from './app-error';
import type { Role } from '../modules/users/user.entity';

const RANK: Record<Role, number> = { reader: 0, contributor: 1, curator: 2, admin: 3 };

/** True when `role` includes everything `needed` may do (roles are nested: admin ⊃ curator ⊃ …). */
export const roleAtLeast = (role: Role, needed: Role) => RANK[role] >= RANK[needed];

/**
 * The one place where routes say who may call them: 401 without a signed-in user, 403 when the
 * user's role is below `needed`.
 */
export function requireRole(needed: Role): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) {
      next(new AppError('UNAUTHENTICATED', 401, 'Sign in first'));
      return;
    }
    if (!roleAtLeast(req.user.role, needed)) {
      next(new AppError('FORBIDDEN', 403, `This needs the ${needed} role; you are ${req.user.role}`));
      return;
    }
    next();
  };
}
