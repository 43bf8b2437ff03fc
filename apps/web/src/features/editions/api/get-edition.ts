import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { editionSchema, editionsQueryKey } from './edition-schema';

const diffItemSchema = z.object({
  accession: z.string(),
  name: z.string(),
  formula: z.string(),
  revision: z.number().int(),
  previousRevision: z.number().int().nullable().optional(),
});

export type EditionDiffItem = z.infer<typeof diffItemSchema>;

const editionResponseSchema = z.object({
  edition: editionSchema,
  previous: z.string().nullable(),
  diff: z.object({ added: z.array(diffItemSchema), changed: z.array(diffItemSchema), withdrawn: z.array(diffItemSchema) }),
});

export type EditionDetail = z.infer<typeof editionResponseSchema>;

export function editionFileHref(label: string, format: 'jcamp' | 'csv'): string {
  return `/api/v1/editions/${encodeURIComponent(label)}/${format}`;
}

/** One edition with how it differs from the edition before it. */
export function useEdition(label: string) {
  return useQuery({
    queryKey: [...editionsQueryKey, label],
    queryFn: ({ signal }) => apiClient.get(`/api/v1/editions/${encodeURIComponent(label)}`, editionResponseSchema, { signal }),
  });
}
