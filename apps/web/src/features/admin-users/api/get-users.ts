import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { roleSchema } from '../../../lib/roles';

export const managedUserSchema = z.object({
  id: z.string(),
  login: z.string(),
  displayName: z.string(),
  email: z.string().nullable(),
  role: roleSchema,
  createdAt: z.iso.datetime({ offset: true }),
  lastSignInAt: z.iso.datetime({ offset: true }).nullable(),
});

export type ManagedUser = z.infer<typeof managedUserSchema>;

const usersResponseSchema = z.object({ users: z.array(managedUserSchema) });

export async function getUsers(signal?: AbortSignal): Promise<ManagedUser[]> {
  const { users } = await apiClient.get('/api/v1/admin/users', usersResponseSchema, { signal });
  return users;
}

export const usersQueryKey = ['admin', 'users'] as const;

export function usersQueryOptions() {
  return queryOptions({
    queryKey: usersQueryKey,
    queryFn: ({ signal }) => getUsers(signal),
  });
}

export function useUsers() {
  return useQuery(usersQueryOptions());
}
