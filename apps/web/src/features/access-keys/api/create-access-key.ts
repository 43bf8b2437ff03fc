import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { accessKeySchema, accessKeysQueryKey, type AccessKeyScope } from './access-key-schema';

const createdResponseSchema = z.object({ key: accessKeySchema, secret: z.string() });

export type CreatedAccessKey = z.infer<typeof createdResponseSchema>;

/** Creates a key; the answer carries its secret, the only time the server ever sends it. */
export function useCreateAccessKey() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { name: string; scopes: AccessKeyScope[] }) =>
      apiClient.post('/api/v1/access-keys', createdResponseSchema, { body: input }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: accessKeysQueryKey }),
  });
}
