import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { entryViewSchema, type EntryView, type RevisionView } from './revision-view';

const entryResponseSchema = z.object({ entry: entryViewSchema });

function entryUrl(accession: string, revision?: number): string {
  const base = `/api/v1/entries/${encodeURIComponent(accession)}`;
  return revision === undefined ? base : `${base}?revision=${revision}`;
}

export type PublishedSide = { entry: EntryView; published: RevisionView | null };

/**
 * The entry of a revision and its published revision, if it has one: the entry's current revision when
 * that is the published one, else the published revision its history names, fetched by number.
 */
export async function getPublishedSide(accession: string, signal?: AbortSignal): Promise<PublishedSide> {
  const { entry } = await apiClient.get(entryUrl(accession), entryResponseSchema, { signal });
  if (entry.revision.state === 'published') return { entry, published: entry.revision };
  const summary = entry.revisions.find((revision) => revision.state === 'published');
  if (!summary) return { entry, published: null };
  const { entry: atPublished } = await apiClient.get(entryUrl(accession, summary.number), entryResponseSchema, { signal });
  return { entry, published: atPublished.revision };
}

export function useEntryWithPublished(accession: string | undefined) {
  return useQuery({
    queryKey: ['entries', accession, 'published'],
    queryFn: ({ signal }) => getPublishedSide(accession ?? '', signal),
    enabled: accession !== undefined,
  });
}
