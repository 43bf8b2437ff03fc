import { z } from 'zod';

/** The scopes of PRODUCT.md: `search` (identify, batch, readings, formulas), `library:read`, `submit`. */
export const accessKeyScopes = ['search', 'library:read', 'submit'] as const;
export type AccessKeyScope = (typeof accessKeyScopes)[number];

/** Scopes a reader may give a key; `submit` needs the contributor role. */
export const readerScopes: readonly AccessKeyScope[] = ['search', 'library:read'];

export const accessKeySchema = z.object({
  id: z.string(),
  name: z.string(),
  prefix: z.string(),
  scopes: z.array(z.string()),
  owner: z.looseObject({ id: z.string(), login: z.string(), displayName: z.string() }).optional(),
  createdAt: z.string(),
  lastUsedAt: z.string().nullable(),
  revokedAt: z.string().nullable(),
});

export type AccessKey = z.infer<typeof accessKeySchema>;

export const accessKeysQueryKey = ['access-keys'] as const;
