import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';

export function signOut(): Promise<void> {
  return apiClient.send('POST', '/auth/sign-out');
}

/**
 * Ends the session; then leaves the signed-in pages (`onSignedOut`) and only afterwards forgets every
 * cached answer, so no page still on screen asks the API again as nobody.
 */
export function useSignOut({ onSignedOut }: { onSignedOut: () => void | Promise<void> }) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: async () => {
      await onSignedOut();
      queryClient.clear();
    },
  });
}
