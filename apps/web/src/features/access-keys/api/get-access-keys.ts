import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { accessKeySchema, accessKeysQueryKey } from './access-key-schema';

const accessKeysResponseSchema = z.object({ keys: z.array(accessKeySchema) });

/** One's own keys, or (`all`, admins only) every key with its owner. */
export function useAccessKeys({ all = false }: { all?: boolean } = {}) {
  return useQuery({
    queryKey: [...accessKeysQueryKey, all ? 'all' : 'own'],
    queryFn: async ({ signal }) =>
      (await apiClient.get(`/api/v1/access-keys${all ? '?all=true' : ''}`, accessKeysResponseSchema, { signal })).keys,
  });
}
