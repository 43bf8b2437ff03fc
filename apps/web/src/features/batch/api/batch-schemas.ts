import { z } from 'zod';

export const batchJobSchema = z.looseObject({
  id: z.string(),
  // A job is `queued` from the moment the API accepts it until a worker picks it up.
  status: z.enum(['queued', 'running', 'done', 'failed']),
  total: z.number().int(),
  done: z.number().int(),
  createdAt: z.string().optional(),
  error: z.string().nullable().optional(),
});

export type BatchJob = z.infer<typeof batchJobSchema>;

const bestSchema = z.looseObject({ accession: z.string(), revision: z.number().int(), name: z.string(), similarity: z.number() });

export const batchResultSchema = z.looseObject({
  index: z.number().int(),
  name: z.string().nullable().optional(),
  best: bestSchema.nullable(),
  candidates: z.array(z.looseObject({ accession: z.string(), revision: z.number().int(), name: z.string(), similarity: z.number() })).default([]),
  error: z.string().nullable().optional(),
});

export type BatchResult = z.infer<typeof batchResultSchema>;

export const batchJobResponseSchema = z.object({ job: batchJobSchema, results: z.array(batchResultSchema).default([]) });
