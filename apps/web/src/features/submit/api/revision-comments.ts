import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { revisionCommentSchema } from '../../../components/spectrum/comment-list';
import { apiClient } from '../../../lib/api-client';

function commentsKey(revisionId: string) {
  return ['revisions', revisionId, 'comments', 'submit'] as const;
}

export function useRevisionComments(revisionId: string) {
  return useQuery(
    queryOptions({
      queryKey: commentsKey(revisionId),
      queryFn: async ({ signal }) =>
        (
          await apiClient.get(`/api/v1/revisions/${encodeURIComponent(revisionId)}/comments`, z.object({ comments: z.array(revisionCommentSchema) }), {
            signal,
          })
        ).comments,
    }),
  );
}

/** `POST /revisions/:id/comments`: the author answers the curator. */
export function usePostComment(revisionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: { body: string; parentId: string | null }) =>
      (
        await apiClient.post(`/api/v1/revisions/${encodeURIComponent(revisionId)}/comments`, z.object({ comment: revisionCommentSchema }), {
          body: input,
        })
      ).comment,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: commentsKey(revisionId) }),
  });
}
