import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { userRefSchema } from './revision-view';

export const commentViewSchema = z.object({
  id: z.string(),
  parentId: z.string().nullable(),
  // The contract leaves the author's shape open: a display name or a user reference.
  author: z.union([z.string(), userRefSchema]).nullable(),
  body: z.string(),
  kind: z.enum(['comment', 'decision']),
  createdAt: z.string(),
});

export type CommentView = z.infer<typeof commentViewSchema>;

const commentsResponseSchema = z.object({ comments: z.array(commentViewSchema) });

export function commentsQueryKey(revisionId: string) {
  return ['revisions', revisionId, 'comments'] as const;
}

export function useComments(revisionId: string) {
  return useQuery(
    queryOptions({
      queryKey: commentsQueryKey(revisionId),
      queryFn: async ({ signal }) =>
        (await apiClient.get(`/api/v1/revisions/${encodeURIComponent(revisionId)}/comments`, commentsResponseSchema, { signal }))
          .comments,
    }),
  );
}

/** Who wrote a comment, as text. */
export function commentAuthorName(author: CommentView['author']): string {
  if (author === null) return 'someone no longer listed';
  return typeof author === 'string' ? author : author.displayName;
}
