import { useMutation, useQueryClient } from '@tanstack/react-query';
import { DecisionBody } from '@ionfolio/contracts';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { invalidateReviewData } from './invalidate-review-data';
import { revisionViewSchema } from './revision-view';

const decisionResponseSchema = z.object({ revision: revisionViewSchema });

export type DecisionInput = { decision: 'publish' | 'needs_changes'; comment: string; lockVersion: number };

/**
 * Publishes a revision or returns it to its author. The lock version is the one the curator was looking
 * at: if anyone changed or decided it since, the API answers 409 STALE_REVISION.
 */
export function useDecideRevision(revisionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: DecisionInput) =>
      apiClient.post(`/api/v1/revisions/${encodeURIComponent(revisionId)}/decision`, decisionResponseSchema, {
        body: DecisionBody.parse(input),
      }),
    onSuccess: () => invalidateReviewData(queryClient),
  });
}
