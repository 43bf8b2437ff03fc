import { z } from 'zod';

/** One consistency check as the API sends it (packages/chem CheckResult). */
export const checkResultSchema = z.object({
  id: z.string(),
  title: z.string(),
  status: z.enum(['pass', 'warn', 'fail']),
  reason: z.string(),
  numbers: z.record(z.string(), z.union([z.number(), z.string()])),
});
