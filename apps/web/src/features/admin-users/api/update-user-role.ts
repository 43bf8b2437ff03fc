import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import type { Role } from '../../../lib/roles';
import { managedUserSchema, usersQueryKey, type ManagedUser } from './get-users';

export type UpdateUserRoleInput = { id: string; role: Role };

const updateUserResponseSchema = z.object({ user: managedUserSchema });

export async function updateUserRole({ id, role }: UpdateUserRoleInput): Promise<ManagedUser> {
  const { user } = await apiClient.patch(`/api/v1/admin/users/${encodeURIComponent(id)}`, updateUserResponseSchema, {
    body: { role },
  });
  return user;
}

/**
 * Saves a role change. Not optimistic: the table shows the chosen role as "saving" until the server
 * answers, then the refetched list; the mutation stays pending until that refetch is done.
 */
export function useUpdateUserRole({ onSaved }: { onSaved?: (user: ManagedUser) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUserRole,
    onSuccess: async (user) => {
      await queryClient.invalidateQueries({ queryKey: usersQueryKey });
      onSaved?.(user);
    },
  });
}
