import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { roleSchema } from '../../../lib/roles';

export const currentUserSchema = z.object({
  id: z.string(),
  login: z.string(),
  displayName: z.string(),
  email: z.string().nullable(),
  role: roleSchema,
});

export type CurrentUser = z.infer<typeof currentUserSchema>;

const meResponseSchema = z.object({ user: currentUserSchema });

export async function getMe(signal?: AbortSignal): Promise<CurrentUser> {
  const { user } = await apiClient.get('/api/v1/me', meResponseSchema, { signal });
  return user;
}

export const meQueryKey = ['me'] as const;

export function meQueryOptions() {
  return queryOptions({
    queryKey: meQueryKey,
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });
}

/**
 * The signed-in person, or an error (401 when nobody is signed in). `enabled: false` keeps what is
 * known without asking again (while signing out).
 */
export function useMe({ enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...meQueryOptions(), enabled });
}
