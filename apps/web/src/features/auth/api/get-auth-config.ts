import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';

export const authConfigSchema = z.object({
  provider: z.literal('github'),
  localStandIn: z.boolean(),
});

export type AuthConfig = z.infer<typeof authConfigSchema>;

export function getAuthConfig(signal?: AbortSignal): Promise<AuthConfig> {
  return apiClient.get('/api/auth/config', authConfigSchema, { signal });
}

export function authConfigQueryOptions() {
  return queryOptions({
    queryKey: ['auth-config'],
    queryFn: ({ signal }) => getAuthConfig(signal),
    staleTime: Infinity,
  });
}

export function useAuthConfig() {
  return useQuery(authConfigQueryOptions());
}
