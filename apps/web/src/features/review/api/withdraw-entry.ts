import { useMutation, useQueryClient } from '@tanstack/react-query';
import { WithdrawBody } from '@ionfolio/contracts';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { reviewQueueKey } from './get-review-queue';

const withdrawResponseSchema = z.object({ entry: z.object({ accession: z.string() }).loose() });

/** Retires a published entry; the reason is kept with it and in the audit log. */
export function useWithdrawEntry(accession: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (reason: string) =>
      apiClient.post(`/api/v1/entries/${encodeURIComponent(accession)}/withdraw`, withdrawResponseSchema, {
        body: WithdrawBody.parse({ reason }),
      }),
    onSuccess: async () => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: reviewQueueKey }),
        queryClient.invalidateQueries({ queryKey: ['revisions'] }),
        queryClient.invalidateQueries({ queryKey: ['entries'] }),
      ]);
    },
  });
}
