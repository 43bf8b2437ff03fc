import { useInfiniteQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';

export const auditEventSchema = z.object({
  id: z.string(),
  occurredAt: z.string(),
  actor: z.object({ login: z.string(), displayName: z.string() }).loose().nullable(),
  action: z.string(),
  subjectType: z.string(),
  subjectId: z.string().nullable(),
  data: z.unknown(),
});

export type AuditEvent = z.infer<typeof auditEventSchema>;

const auditPageSchema = z.object({ events: z.array(auditEventSchema), nextCursor: z.string().nullable().optional() });

export type AuditFilter = { action: string; subject: string };

/** `GET /audit` with only the filters that are set, and the cursor of the page after the first. */
export function auditUrl({ action, subject }: AuditFilter, cursor: string | null): string {
  const params = new URLSearchParams();
  if (action.trim()) params.set('action', action.trim());
  if (subject.trim()) params.set('subject', subject.trim());
  if (cursor) params.set('cursor', cursor);
  const query = params.toString();
  return query ? `/api/v1/audit?${query}` : '/api/v1/audit';
}

/** The audit log, newest first, a page at a time ("Load more" follows `nextCursor`). */
export function useAuditEvents(filter: AuditFilter) {
  return useInfiniteQuery({
    queryKey: ['audit', filter],
    queryFn: ({ pageParam, signal }) => apiClient.get(auditUrl(filter, pageParam), auditPageSchema, { signal }),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor ?? null,
  });
}
