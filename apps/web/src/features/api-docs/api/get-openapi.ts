import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';

const operationSchema = z.looseObject({
  summary: z.string().optional(),
  description: z.string().optional(),
  operationId: z.string().optional(),
  tags: z.array(z.string()).optional(),
  parameters: z.array(z.unknown()).optional(),
  requestBody: z.unknown().optional(),
  responses: z.unknown().optional(),
  security: z.array(z.record(z.string(), z.array(z.string()))).optional(),
});

export type OpenApiOperation = z.infer<typeof operationSchema>;

export const openApiDocumentSchema = z.looseObject({
  openapi: z.string(),
  info: z.looseObject({ title: z.string(), version: z.string(), description: z.string().optional() }),
  paths: z.record(z.string(), z.record(z.string(), z.unknown())),
  components: z.looseObject({}).optional(),
  security: z.array(z.record(z.string(), z.array(z.string()))).optional(),
});

export type OpenApiDocument = z.infer<typeof openApiDocumentSchema>;

export { operationSchema };

/** The OpenAPI 3.1 document the API serves for tool authors. */
export function useOpenApiDocument() {
  return useQuery({
    queryKey: ['openapi'],
    queryFn: ({ signal }) => apiClient.get('/api/v1/openapi.json', openApiDocumentSchema, { signal }),
    staleTime: 10 * 60_000,
  });
}
