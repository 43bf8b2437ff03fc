import { z } from 'zod';

/** The people roles of PRODUCT.md, lowest first: each role can do everything the ones before it can. */
export const roles = ['reader', 'contributor', 'curator', 'admin'] as const;

export const roleSchema = z.enum(roles);

export type Role = z.infer<typeof roleSchema>;

/** True when `role` is `required` or above it. */
export function hasRole(role: Role, required: Role): boolean {
  return roles.indexOf(role) >= roles.indexOf(required);
}
