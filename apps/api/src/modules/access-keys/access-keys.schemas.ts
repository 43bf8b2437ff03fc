import { z } from 'zod';
import { ACCESS_KEY_SCOPES } from './access-key-scopes';

export const AccessKeyScopeSchema = z.enum(ACCESS_KEY_SCOPES);

export const CreateAccessKeyBody = z.strictObject({
  name: z.string().trim().min(1, 'a name is required').max(100),
  scopes: z
    .array(AccessKeyScopeSchema)
    .min(1, 'name at least one scope')
    .max(ACCESS_KEY_SCOPES.length)
    .transform((scopes) => ACCESS_KEY_SCOPES.filter((s) => scopes.includes(s))),
});
export type CreateAccessKeyInput = z.infer<typeof CreateAccessKeyBody>;

export const AccessKeyIdParams = z.object({ id: z.uuid('must be an access key id (uuid)') });

export const ListAccessKeysQuery = z.object({
  all: z
    .enum(['true', 'false'])
    .default('false')
    .transform((v) => v === 'true'),
});

export const AccessKeyViewSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  prefix: z.string().describe('The first characters of the key, to recognise it; the key itself is shown only once'),
  scopes: z.array(AccessKeyScopeSchema),
  owner: z.object({ id: z.string(), login: z.string(), displayName: z.string() }),
  createdAt: z.string(),
  lastUsedAt: z.string().nullable(),
  revokedAt: z.string().nullable(),
});
export type AccessKeyView = z.infer<typeof AccessKeyViewSchema>;

export const CreatedAccessKeySchema = z.object({
  key: AccessKeyViewSchema,
  secret: z.string().describe('The access key (ifk_…). Shown once: store it now; Ionfolio keeps only its hash'),
});
