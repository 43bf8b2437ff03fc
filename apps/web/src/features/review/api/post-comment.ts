import { useMutation, useQueryClient } from '@tanstack/react-query';
import { CommentBody } from '@ionfolio/contracts';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { commentViewSchema, commentsQueryKey } from './get-comments';

const commentResponseSchema = z.object({ comment: commentViewSchema });

export type PostCommentInput = { body: string; parentId: string | null };

/** Adds a comment (or a reply, with `parentId`) to a revision's thread, then reloads the thread. */
export function usePostComment(revisionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PostCommentInput) =>
      apiClient.post(`/api/v1/revisions/${encodeURIComponent(revisionId)}/comments`, commentResponseSchema, {
        body: CommentBody.parse(input),
      }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: commentsQueryKey(revisionId) }),
  });
}
