import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';

const newRevisionResponseSchema = z.object({ revision: z.object({ id: z.string(), number: z.number().int() }) });

/** `POST /entries/:accession/revisions`: a new draft from the current revision, or (curators) from an old one. */
export function useStartRevision(accession: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: { fromRevision?: number; changeNote?: string }) =>
      (await apiClient.post(`/api/v1/entries/${encodeURIComponent(accession)}/revisions`, newRevisionResponseSchema, { body })).revision,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['entries', accession] }),
  });
}

/** `POST /entries/:accession/withdraw` with the reason every reader will see. */
export function useWithdrawEntry(accession: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (reason: string) =>
      apiClient.post(`/api/v1/entries/${encodeURIComponent(accession)}/withdraw`, z.object({ entry: z.object({ accession: z.string() }) }), {
        body: { reason },
      }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['entries', accession] }),
  });
}
