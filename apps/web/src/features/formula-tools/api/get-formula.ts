import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';

const formulaResponseSchema = z.object({
  formula: z.string(),
  nominalMass: z.number(),
  monoisotopicMass: z.number(),
  cluster: z.array(z.object({ mz: z.number(), relativeIntensity: z.number() })),
  rdbe: z.number(),
});

export type ServerFormula = z.infer<typeof formulaResponseSchema>;

/** The server's answer for the same formula (`GET /api/v1/formulas/:formula`), asked only on request. */
export function useServerFormula(formula: string | null) {
  return useQuery({
    queryKey: ['formulas', formula],
    queryFn: ({ signal }) => apiClient.get(`/api/v1/formulas/${encodeURIComponent(formula ?? '')}`, formulaResponseSchema, { signal }),
    enabled: formula !== null,
    staleTime: Number.POSITIVE_INFINITY,
  });
}
