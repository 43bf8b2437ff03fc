import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { accessKeysQueryKey } from './access-key-schema';

/** Revokes a key at once: tools using it get 401 from the next call on. */
export function useRevokeAccessKey() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => apiClient.send('DELETE', `/api/v1/access-keys/${encodeURIComponent(id)}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: accessKeysQueryKey }),
  });
}
