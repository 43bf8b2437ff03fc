import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';

export type StructureMode = 'substructure' | 'exact';

const hitSchema = z.object({
  accession: z.string(),
  revision: z.number(),
  name: z.string(),
  formula: z.string(),
  nominalMass: z.number(),
  simulated: z.boolean(),
});

const answerSchema = z.object({
  entries: z.array(hitSchema),
  screened: z.number(),
  truncated: z.boolean(),
  tookMs: z.number(),
});

export type StructureHit = z.infer<typeof hitSchema>;

/** Published entries whose structure contains (or is) the SMILES; off while no SMILES is given. */
export function useStructureSearch(smiles: string, mode: StructureMode) {
  return useQuery({
    queryKey: ['structure-search', mode, smiles],
    queryFn: ({ signal }) =>
      apiClient.post('/api/v1/structure-search', answerSchema, { body: { smiles, mode, limit: 200 }, signal }),
    enabled: smiles !== '',
    retry: false,
  });
}
