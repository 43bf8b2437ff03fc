import { z } from 'zod';
import { ROLES } from './user.entity';

export const RoleSchema = z.enum(ROLES);

export const UserIdParams = z.object({ id: z.uuid('must be a user id (uuid)') });

export const ChangeRoleBody = z.strictObject({ role: RoleSchema });

export const SessionUserSchema = z.object({
  id: z.string(),
  login: z.string(),
  displayName: z.string(),
  email: z.string().nullable(),
  role: RoleSchema,
});
export type SessionUser = z.infer<typeof SessionUserSchema>;

export interface UserView extends SessionUser {
  createdAt: string;
  lastSignInAt: string | null;
}
