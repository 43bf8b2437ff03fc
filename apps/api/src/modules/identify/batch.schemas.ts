import { z } from 'zod';
import { CandidateSchema, IDENTIFY_METHODS, QueryPeaksSchema, searchOptionFields } from './identify.schemas';

/** Candidates kept per unknown in a batch answer (the best one and four runners-up). */
export const BATCH_TOP = 5;

export const BatchSpectrumSchema = z.strictObject({
  name: z.string().trim().max(200).optional(),
  peaks: QueryPeaksSchema,
});

export const BatchOptionsSchema = z.strictObject(searchOptionFields);
export type BatchOptions = z.infer<typeof BatchOptionsSchema>;

export const batchBody = (maxSpectra: number) =>
  z.strictObject({
    spectra: z.array(BatchSpectrumSchema).min(1, 'send at least one spectrum').max(maxSpectra, `at most ${maxSpectra} spectra per batch`),
    ...searchOptionFields,
  });

/** Multipart form fields beside `file` arrive as text. */
export const BatchFormFields = z.strictObject({
  method: z.enum(IDENTIFY_METHODS).default('composite'),
  reverse: z
    .enum(['true', 'false'])
    .default('false')
    .transform((v) => v === 'true'),
  edition: searchOptionFields.edition,
  minMass: z.coerce.number().int().min(0).max(5000).optional(),
  maxMass: z.coerce.number().int().min(0).max(5000).optional(),
});

export const BatchJobIdParams = z.object({ id: z.uuid('must be a batch job id (uuid)') });

export const BatchJobSchema = z.object({
  id: z.uuid(),
  status: z.enum(['queued', 'running', 'done', 'failed']),
  total: z.number().int(),
  done: z.number().int(),
  method: z.enum(IDENTIFY_METHODS),
  edition: z.string(),
  fileName: z.string().nullable(),
  error: z.string().nullable(),
  createdAt: z.string(),
  finishedAt: z.string().nullable(),
});
export type BatchJobView = z.infer<typeof BatchJobSchema>;

export const BatchResultSchema = z.object({
  index: z.number().int().describe('1-based position of the unknown in the batch'),
  name: z.string(),
  best: CandidateSchema.omit({ matchedPeaks: true }).nullable(),
  candidates: z.array(CandidateSchema.omit({ matchedPeaks: true })),
  error: z.string().optional(),
});
export type BatchResult = z.infer<typeof BatchResultSchema>;

export const BatchJobAnswerSchema = z.object({ job: BatchJobSchema, results: z.array(BatchResultSchema) });
