import { z } from 'zod';
import { AccessionSchema } from '@ionfolio/contracts';

export const AccessionParams = z.object({ accession: AccessionSchema });
export const RevisionIdParams = z.object({ id: z.uuid('must be a revision id (uuid)') });

export const ListEntriesQuery = z.object({
  q: z.string().trim().max(200).optional(),
  formula: z.string().trim().max(100).optional(),
  minMass: z.coerce.number().int().min(0).max(5000).optional(),
  maxMass: z.coerce.number().int().min(0).max(5000).optional(),
  status: z.enum(['published', 'withdrawn', 'any']).default('published'),
  limit: z.coerce.number().int().min(1).max(500).default(100),
  cursor: z.string().regex(/^IF-\d{6}$/).optional(),
});
