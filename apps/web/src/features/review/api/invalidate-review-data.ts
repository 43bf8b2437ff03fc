import type { QueryClient } from '@tanstack/react-query';
import { reviewQueueKey } from './get-review-queue';

/** After a decision or a withdrawal: the queue, the revisions and their entries have all changed. */
export function invalidateReviewData(queryClient: QueryClient): Promise<unknown> {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: reviewQueueKey }),
    queryClient.invalidateQueries({ queryKey: ['revisions'] }),
    queryClient.invalidateQueries({ queryKey: ['entries'] }),
  ]);
}
