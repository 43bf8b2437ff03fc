import { z } from 'zod';

export const StructureSearchBody = z.strictObject({
  smiles: z.string().trim().min(1, 'give a SMILES string').max(2000),
  mode: z.enum(['substructure', 'exact']).default('substructure'),
  limit: z.number().int().min(1).max(500).default(100),
});

export type StructureSearchRequest = z.infer<typeof StructureSearchBody>;
