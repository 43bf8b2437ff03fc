import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { revisionDraftResponseSchema, type RevisionDraft } from './revision-draft';

export async function getRevision(id: string, signal?: AbortSignal): Promise<RevisionDraft> {
  const { revision } = await apiClient.get(`/api/v1/revisions/${encodeURIComponent(id)}`, revisionDraftResponseSchema, { signal });
  return revision;
}

export function revisionQueryKey(id: string) {
  return ['revisions', id, 'draft'] as const;
}

export function revisionQueryOptions(id: string) {
  return queryOptions({ queryKey: revisionQueryKey(id), queryFn: ({ signal }) => getRevision(id, signal), staleTime: 0 });
}

export function useRevision(id: string) {
  return useQuery(revisionQueryOptions(id));
}
