import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { revisionViewSchema, type RevisionView } from './revision-view';

const revisionResponseSchema = z.object({ revision: revisionViewSchema });

export async function getRevision(id: string, signal?: AbortSignal): Promise<RevisionView> {
  const { revision } = await apiClient.get(`/api/v1/revisions/${encodeURIComponent(id)}`, revisionResponseSchema, { signal });
  return revision;
}

export function revisionQueryKey(id: string) {
  return ['revisions', id] as const;
}

export function useRevision(id: string) {
  return useQuery(queryOptions({ queryKey: revisionQueryKey(id), queryFn: ({ signal }) => getRevision(id, signal) }));
}
