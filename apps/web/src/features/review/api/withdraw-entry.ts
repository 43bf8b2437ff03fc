import { useMutation, useQueryClient } from '@tanstack/react-query';
import { WithdrawBody } from '@ionfolio/contracts';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { invalidateReviewData } from './invalidate-review-data';

const withdrawResponseSchema = z.object({ entry: z.object({ accession: z.string() }).loose() });

/** Retires a published entry; the reason is kept with it and in the audit log. */
export function useWithdrawEntry(accession: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (reason: string) =>
      apiClient.post(`/api/v1/entries/${encodeURIComponent(accession)}/withdraw`, withdrawResponseSchema, {
        body: WithdrawBody.parse({ reason }),
      }),
    onSuccess: () => invalidateReviewData(queryClient),
  });
}
