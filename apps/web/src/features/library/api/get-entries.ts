import { useInfiniteQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { filterToParams, type LibraryFilter } from '../utils/library-filter';

export const libraryRowSchema = z.object({
  accession: z.string(),
  revision: z.number(),
  state: z.enum(['draft', 'in_review', 'needs_changes', 'published', 'superseded', 'withdrawn']),
  name: z.string(),
  synonyms: z.array(z.string()).default([]),
  formula: z.string(),
  nominalMass: z.number(),
  basePeakMz: z.number(),
  peakCount: z.number(),
  retentionIndex: z.number().nullable(),
  author: z.string(),
  authorLogin: z.string().optional(),
  updatedAt: z.string(),
  simulated: z.boolean(),
});

export type LibraryRow = z.infer<typeof libraryRowSchema>;

const pageSchema = z.object({ entries: z.array(libraryRowSchema), nextCursor: z.string().nullable() });

/** Rows per request: a few screens' worth, so scrolling rarely waits. */
export const LIBRARY_PAGE_SIZE = 200;

/** `GET /entries` with the filters that are set, a page size and the cursor of the page wanted. */
export function entriesUrl(filter: LibraryFilter, cursor: string | null, limit = LIBRARY_PAGE_SIZE): string {
  const params = filterToParams(filter);
  params.set('limit', String(limit));
  if (cursor) params.set('cursor', cursor);
  return `/api/v1/entries?${params.toString()}`;
}

/** The CSV export of every row these filters select (a plain download link). */
export function entriesCsvHref(filter: LibraryFilter): string {
  const query = filterToParams(filter).toString();
  return query ? `/api/v1/entries.csv?${query}` : '/api/v1/entries.csv';
}

/** The library list, a page at a time as the person scrolls (`nextCursor` of the API). */
export function useLibraryEntries(filter: LibraryFilter) {
  return useInfiniteQuery({
    queryKey: ['library', filterToParams(filter).toString()],
    queryFn: ({ pageParam, signal }) => apiClient.get(entriesUrl(filter, pageParam), pageSchema, { signal }),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor ?? null,
  });
}
