import type { RequestHandler } from 'express';
import { AppError } from './app-error';
import type { Role } from '../modules/users/user.entity';
import type { AccessKeyScope } from '../modules/access-keys/access-key-scopes';

const RANK: Record<Role, number> = { reader: 0, contributor: 1, curator: 2, admin: 3 };

/** True when `role` includes everything `needed` may do (roles are nested: admin ⊃ curator ⊃ …). */
export const roleAtLeast = (role: Role, needed: Role) => RANK[role] >= RANK[needed];

/** What a route asks of its caller; requireRole attaches it to its handler so that tools can read it. */
export interface RouteAccess {
  role: Role;
  /** The access-key scope that opens this route to tools; without one, access keys get 403. */
  scope?: AccessKeyScope | undefined;
}

/**
 * The one place where routes say who may call them: 401 without a signed-in user, 403 when the
 * user's role is below `needed`. A request authenticated with an access key acts as the key's owner
 * and passes only routes that declare a scope the key has (403 `SCOPE` otherwise).
 */
export function requireRole(needed: Role, options: { scope?: AccessKeyScope } = {}): RequestHandler & { access: RouteAccess } {
  const handler: RequestHandler = (req, _res, next) => {
    if (!req.user) {
      next(new AppError('UNAUTHENTICATED', 401, 'Sign in first'));
      return;
    }
    if (req.accessKey && (options.scope === undefined || !req.accessKey.scopes.includes(options.scope))) {
      const message =
        options.scope === undefined
          ? 'This route is not open to access keys; use the web app'
          : `This route needs an access key with the ${options.scope} scope`;
      next(new AppError('SCOPE', 403, message));
      return;
    }
    if (!roleAtLeast(req.user.role, needed)) {
      next(new AppError('FORBIDDEN', 403, `This needs the ${needed} role; you are ${req.user.role}`));
      return;
    }
    next();
  };
  return Object.assign(handler, { access: { role: needed, scope: options.scope } });
}
