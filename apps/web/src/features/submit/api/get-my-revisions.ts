import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { REVISION_STATES } from '@ionfolio/contracts';
import { apiClient } from '../../../lib/api-client';

/** One line of `GET /my/revisions` (a `QueueItem` of docs/api-curation.md). */
export const myRevisionSchema = z.object({
  revisionId: z.string(),
  accession: z.string(),
  number: z.number().int(),
  label: z.string(),
  state: z.enum(REVISION_STATES),
  name: z.string(),
  formula: z.string(),
  checksWorst: z.enum(['pass', 'warn', 'fail']).nullish(),
  updatedAt: z.string(),
  submittedAt: z.string().nullish(),
  simulated: z.boolean().optional(),
});

export type MyRevision = z.infer<typeof myRevisionSchema>;

const myRevisionsResponseSchema = z.object({ items: z.array(myRevisionSchema) });

export const myRevisionsQueryKey = ['my', 'revisions'] as const;

export function useMyRevisions() {
  return useQuery(
    queryOptions({
      queryKey: myRevisionsQueryKey,
      queryFn: async ({ signal }) => (await apiClient.get('/api/v1/my/revisions', myRevisionsResponseSchema, { signal })).items,
    }),
  );
}
