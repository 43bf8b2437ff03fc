import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';

const editionsResponseSchema = z.object({ editions: z.array(z.looseObject({ label: z.string() })) });

/** The labels of the frozen editions, newest first, for the edition picker. */
export function useEditionLabels() {
  return useQuery({
    // Its own key: the editions page caches a richer shape under ['editions'].
    queryKey: ['editions', 'labels'],
    queryFn: async ({ signal }) =>
      (await apiClient.get('/api/v1/editions', editionsResponseSchema, { signal })).editions.map((e) => e.label),
    staleTime: 5 * 60_000,
  });
}
