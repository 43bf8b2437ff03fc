import type { SessionUser } from '../modules/users/users.schemas';

declare global {
  namespace Express {
    // Passport puts the signed-in user on req.user.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SessionUser {}
  }
}
export {};
