import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';

const overviewSchema = z.object({
  entriesByState: z.array(z.object({ state: z.string(), entries: z.number() })),
  publishedEntries: z.number(),
  growthByMonth: z.array(z.object({ month: z.string(), newEntries: z.number(), revisionsPublished: z.number(), cumulativeEntries: z.number() })),
  massHistogram: z.object({ binDa: z.number(), bins: z.array(z.object({ fromDa: z.number(), entries: z.number() })) }),
  elementCoverage: z.array(z.object({ element: z.string(), entries: z.number() })),
  checkProblems: z.array(z.object({ checkId: z.string(), title: z.string().nullable(), warn: z.number(), fail: z.number() })),
  reviewTurnaround: z.array(z.object({ month: z.string(), decisions: z.number(), medianHours: z.number(), p90Hours: z.number() })),
});

export type LibraryOverview = z.infer<typeof overviewSchema>;

/** `GET /overview`: the whole library in aggregates, one request for the page. */
export function useOverview() {
  return useQuery({
    queryKey: ['overview'],
    queryFn: ({ signal }) => apiClient.get('/api/v1/overview', overviewSchema, { signal }),
  });
}
