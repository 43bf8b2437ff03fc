import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { entryViewSchema, type EntryView } from './entry-view';

const entryResponseSchema = z.object({ entry: entryViewSchema });

/** `GET /entries/:accession` (`?revision=N` for a past one; without it, the current revision). */
export async function getEntryView(accession: string, revision: number | undefined, signal?: AbortSignal): Promise<EntryView> {
  const query = revision === undefined ? '' : `?revision=${revision}`;
  return (await apiClient.get(`/api/v1/entries/${encodeURIComponent(accession)}${query}`, entryResponseSchema, { signal })).entry;
}

/** Under `['entries', accession]`, so whatever invalidates an entry refreshes this page too. */
export function entryViewQueryKey(accession: string, revision?: number) {
  return ['entries', accession, 'page', revision ?? 'current'] as const;
}

/** `enabled: false` holds the request back, e.g. when the revision asked for is already on the page. */
export function useEntryView(accession: string, revision: number | undefined, options: { enabled?: boolean } = {}) {
  return useQuery(
    queryOptions({
      queryKey: entryViewQueryKey(accession, revision),
      queryFn: ({ signal }) => getEntryView(accession, revision, signal),
      enabled: options.enabled ?? true,
    }),
  );
}
