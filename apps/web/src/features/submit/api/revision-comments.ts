import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';

const authorSchema = z.union([z.string(), z.object({ displayName: z.string() }).transform((a) => a.displayName)]).nullable();

/** A comment on a revision (`CommentView`): the author's name only, which is all this page shows. */
export const revisionCommentSchema = z.object({
  id: z.string(),
  parentId: z.string().nullable(),
  author: authorSchema,
  body: z.string(),
  kind: z.enum(['comment', 'decision']),
  createdAt: z.string(),
});

export type RevisionComment = z.infer<typeof revisionCommentSchema>;

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
