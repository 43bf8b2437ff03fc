import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';

export const outboxMessageSchema = z.object({
  id: z.string(),
  createdAt: z.string(),
  toAddress: z.string(),
  subject: z.string(),
  status: z.string(),
  attempts: z.number().int(),
  lastError: z.string().nullable(),
  sentAt: z.string().nullable(),
});

export type OutboxMessage = z.infer<typeof outboxMessageSchema>;

const outboxResponseSchema = z.object({ messages: z.array(outboxMessageSchema) });

export function useOutbox() {
  return useQuery({
    queryKey: ['admin', 'outbox'],
    queryFn: async ({ signal }) => (await apiClient.get('/api/v1/admin/outbox', outboxResponseSchema, { signal })).messages,
  });
}
