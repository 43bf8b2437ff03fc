import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { checkStatusSchema } from './revision-view';

export const queueStates = ['in_review', 'needs_changes', 'draft'] as const;

export type QueueState = (typeof queueStates)[number];

export const queueItemSchema = z.object({
  revisionId: z.string(),
  accession: z.string(),
  number: z.number().int(),
  label: z.string(),
  state: z.string(),
  name: z.string(),
  formula: z.string(),
  checksWorst: checkStatusSchema.nullable().optional(),
  author: z.string().nullable(),
  submittedAt: z.string().nullable(),
  updatedAt: z.string(),
  hasPublished: z.boolean(),
  simulated: z.boolean().default(false),
});

export type QueueItem = z.infer<typeof queueItemSchema>;

const queueResponseSchema = z.object({
  items: z.array(queueItemSchema),
  counts: z.object({ draft: z.number(), in_review: z.number(), needs_changes: z.number() }),
});

export type ReviewQueue = z.infer<typeof queueResponseSchema>;

export type QueueFilter = { state: QueueState; author: string; q: string };

/** `GET /review-queue` with only the filters that are set. */
export function reviewQueueUrl({ state, author, q }: QueueFilter): string {
  const params = new URLSearchParams({ state });
  if (author.trim()) params.set('author', author.trim());
  if (q.trim()) params.set('q', q.trim());
  return `/api/v1/review-queue?${params.toString()}`;
}

export const reviewQueueKey = ['review-queue'] as const;

export function useReviewQueue(filter: QueueFilter) {
  return useQuery(
    queryOptions({
      queryKey: [...reviewQueueKey, filter],
      queryFn: ({ signal }) => apiClient.get(reviewQueueUrl(filter), queueResponseSchema, { signal }),
      placeholderData: keepPreviousData,
      staleTime: 5_000,
    }),
  );
}
