import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { batchJobSchema } from './batch-schemas';

export type BatchSpectrum = { name: string; peaks: [number, number][] };

/** The body of `POST /api/v1/identify/batch`: the unknowns and the search options they share. */
export type StartBatchBody = { spectra: BatchSpectrum[]; method?: string; reverse?: boolean; edition?: string };

const startBatchResponseSchema = z.object({ job: batchJobSchema });

/** Starts a batch run; the API answers 202 at once with a job to follow. */
export function useStartBatch() {
  return useMutation({
    mutationFn: (body: StartBatchBody) => apiClient.post('/api/v1/identify/batch', startBatchResponseSchema, { body }),
  });
}
