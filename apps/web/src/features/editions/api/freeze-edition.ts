import { useMutation, useQueryClient } from '@tanstack/react-query';
import { EditionBody } from '@ionfolio/contracts';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { editionSchema, editionsQueryKey } from './edition-schema';

const freezeResponseSchema = z.object({ edition: editionSchema });

export type FreezeEditionInput = { label: string; notes: string };

/** Freezes the current published revisions under a new label (curators). */
export function useFreezeEdition() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: FreezeEditionInput) =>
      apiClient.post('/api/v1/editions', freezeResponseSchema, { body: EditionBody.parse(input) }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: editionsQueryKey }),
  });
}
