import { z } from 'zod';

const personSchema = z.object({ login: z.string(), displayName: z.string() }).loose();

export const editionSchema = z.object({
  label: z.string(),
  notes: z.string().default(''),
  revisionCount: z.number().int(),
  createdAt: z.string(),
  // The contract leaves the shape open: a display name or a user reference.
  createdBy: z.union([z.string(), personSchema]).nullable().optional(),
});

export type Edition = z.infer<typeof editionSchema>;

/** Who froze an edition, as text. */
export function editionAuthorName(createdBy: Edition['createdBy']): string {
  if (createdBy === null || createdBy === undefined) return '—';
  return typeof createdBy === 'string' ? createdBy : createdBy.displayName;
}

export const editionsQueryKey = ['editions'] as const;
