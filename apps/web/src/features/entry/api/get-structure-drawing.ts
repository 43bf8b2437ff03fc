import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';

const drawingSchema = z.object({ svg: z.string(), formula: z.string() });

/** The SVG drawing of a stored structure (`POST /structures/preview`, which needs a contributor). */
export function useStructureDrawing(structure: string | null, format: 'smiles' | 'molfile' | null, enabled: boolean) {
  return useQuery({
    queryKey: ['structures', 'drawing', format, structure],
    queryFn: ({ signal }) => apiClient.post('/api/v1/structures/preview', drawingSchema, { body: { structure, format }, signal }),
    enabled: enabled && structure !== null && format !== null,
    staleTime: Infinity,
  });
}
