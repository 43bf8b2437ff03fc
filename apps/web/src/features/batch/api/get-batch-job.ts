import { useQuery } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { batchJobResponseSchema } from './batch-schemas';

/** How often a running batch is asked about. */
export const batchPollIntervalMs = 700;

export function batchJobPath(jobId: string): string {
  return `/api/v1/identify/batch/${encodeURIComponent(jobId)}`;
}

/** One batch job and the results so far, asked again every ~700 ms until it is done or failed (queued counts as not yet done). */
export function useBatchJob(jobId: string | null) {
  return useQuery({
    queryKey: ['identify-batch', jobId],
    queryFn: ({ signal }) => apiClient.get(batchJobPath(jobId ?? ''), batchJobResponseSchema, { signal }),
    enabled: jobId !== null,
    staleTime: 0,
    refetchInterval: (query) => {
      const status = query.state.data?.job.status;
      return status === 'queued' || status === 'running' ? batchPollIntervalMs : false;
    },
  });
}
