import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { editionSchema, editionsQueryKey } from './edition-schema';

const editionsResponseSchema = z.object({ editions: z.array(editionSchema) });

/** Every edition, newest first. */
export function useEditions() {
  return useQuery({
    queryKey: editionsQueryKey,
    queryFn: async ({ signal }) => (await apiClient.get('/api/v1/editions', editionsResponseSchema, { signal })).editions,
  });
}
