import { z } from 'zod';

export const REVISION_STATES = ['draft', 'in_review', 'needs_changes', 'published', 'superseded', 'withdrawn'] as const;
export type RevisionState = (typeof REVISION_STATES)[number];

export const AccessionSchema = z.string().regex(/^IF-\d{6}$/, 'an accession looks like IF-000123');

export const LockVersionBody = z.strictObject({ lockVersion: z.number().int().min(1) });

export const DecisionBody = z
  .strictObject({
    decision: z.enum(['publish', 'needs_changes']),
    comment: z.string().trim().max(5000).default(''),
    lockVersion: z.number().int().min(1),
  })
  .refine((d) => d.decision === 'publish' || d.comment.length > 0, {
    message: 'say what needs to change',
    path: ['comment'],
  });
export type Decision = z.infer<typeof DecisionBody>;

export const CommentBody = z.strictObject({
  body: z.string().trim().min(1, 'write something').max(5000),
  parentId: z.uuid().nullable().default(null),
});

export const WithdrawBody = z.strictObject({
  reason: z.string().trim().min(3, 'give a reason').max(2000),
});

export const NewRevisionBody = z.strictObject({
  /** Restore this earlier revision's content instead of copying the current one (curators). */
  fromRevision: z.number().int().min(1).optional(),
  changeNote: z.string().max(2000).optional(),
});

export const EditionBody = z.strictObject({
  label: z.string().trim().regex(/^[0-9A-Za-z][0-9A-Za-z._-]{0,31}$/, 'letters, digits, dot, dash or underscore; e.g. 2026.12'),
  notes: z.string().max(5000).default(''),
});

export const RevisionQuery = z.object({ revision: z.coerce.number().int().min(1).optional() });

export const ReviewQueueQuery = z.object({
  state: z.enum(['in_review', 'needs_changes', 'draft']).default('in_review'),
  author: z.string().optional(),
  q: z.string().max(200).optional(),
});
