import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';

export function signOut(): Promise<void> {
  return apiClient.send('POST', '/auth/sign-out');
}

/** Ends the session; on success forgets every cached answer (they belonged to that person). */
export function useSignOut({ onSignedOut }: { onSignedOut: () => void }) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      queryClient.clear();
      onSignedOut();
    },
  });
}
