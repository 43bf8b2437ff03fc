import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';

export const structurePreviewSchema = z.object({ svg: z.string(), formula: z.string(), nominalMass: z.number() });

export type StructurePreview = z.infer<typeof structurePreviewSchema>;

/** `POST /structures/preview`: the drawing and formula of a SMILES or molfile (asked again only when it changes). */
export function useStructurePreview(structure: string, format: 'smiles' | 'molfile') {
  return useQuery({
    queryKey: ['structures', 'preview', format, structure],
    queryFn: ({ signal }) => apiClient.post('/api/v1/structures/preview', structurePreviewSchema, { body: { structure, format }, signal }),
    enabled: structure.trim() !== '',
    staleTime: Infinity,
  });
}
