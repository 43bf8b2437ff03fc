import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { revisionCommentSchema } from '../../../components/spectrum/comment-list';
import { apiClient } from '../../../lib/api-client';

/** The review thread of one revision (read-only on the entry page). */
export function useEntryComments(revisionId: string) {
  return useQuery(
    queryOptions({
      queryKey: ['revisions', revisionId, 'comments', 'entry'],
      queryFn: async ({ signal }) =>
        (
          await apiClient.get(`/api/v1/revisions/${encodeURIComponent(revisionId)}/comments`, z.object({ comments: z.array(revisionCommentSchema) }), {
            signal,
          })
        ).comments,
    }),
  );
}
