import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';

export const importJobSchema = z.object({
  id: z.string(),
  status: z.enum(['running', 'done', 'failed']),
  total: z.number().int(),
  done: z.number().int(),
  imported: z.number().int(),
  rejected: z.number().int(),
  fileName: z.string(),
  createdAt: z.string(),
});

export type ImportJob = z.infer<typeof importJobSchema>;

const importResultSchema = z.object({
  block: z.number().int(),
  title: z.string(),
  status: z.enum(['imported', 'rejected']),
  accession: z.string().nullable().optional(),
  reason: z.string().nullable().optional(),
});

export type ImportResult = z.infer<typeof importResultSchema>;

const importJobResponseSchema = z.object({ job: importJobSchema, results: z.array(importResultSchema) });

/** How often a running import is asked about. */
export const importPollIntervalMs = 700;

/** One import job and its per-block results, asked again every ~700 ms until it is done or failed. */
export function useImportJob(jobId: string | null) {
  return useQuery({
    queryKey: ['imports', jobId],
    queryFn: ({ signal }) =>
      apiClient.get(`/api/v1/imports/${encodeURIComponent(jobId ?? '')}`, importJobResponseSchema, { signal }),
    enabled: jobId !== null,
    staleTime: 0,
    refetchInterval: (query) => (query.state.data?.job.status === 'running' ? importPollIntervalMs : false),
  });
}
