import { z } from 'zod';
import { ROUTES, type RouteSpec } from './route-registry';

type JsonSchema = Record<string, unknown>;

/** Request schemas describe what a caller sends (zod input); unrepresentable refinements are left open. */
const toSchema = (schema: z.ZodType, io: 'input' | 'output'): JsonSchema => {
  const { $schema: _drop, ...rest } = z.toJSONSchema(schema, { io, unrepresentable: 'any', target: 'draft-2020-12' }) as JsonSchema;
  return rest;
};

const ErrorSchema = z.object({
  error: z.object({ code: z.string(), message: z.string(), details: z.unknown().optional() }),
});

const openApiPath = (path: string) => path.replace(/:([A-Za-z0-9_]+)/g, '{$1}');

function parameters(route: RouteSpec): JsonSchema[] {
  const path = [...route.path.matchAll(/:([A-Za-z0-9_]+)/g)].map((m) => ({ name: m[1], in: 'path', required: true, schema: { type: 'string' } }));
  if (!route.query) return path;
  const query = toSchema(route.query, 'input') as { properties?: Record<string, JsonSchema>; required?: string[] };
  return [
    ...path,
    ...Object.entries(query.properties ?? {}).map(([name, schema]) => ({ name, in: 'query', required: query.required?.includes(name) ?? false, schema })),
  ];
}

function security(route: RouteSpec): Record<string, string[]>[] {
  if (route.access === 'public' || route.access === 'session') return [];
  return route.access.scope ? [{ accessKey: [route.access.scope] }, { session: [] }] : [{ session: [] }];
}

function operation(route: RouteSpec): JsonSchema {
  const { response } = route;
  const ok: JsonSchema = { description: response.description };
  if (response.contentType) ok.content = { [response.contentType]: { schema: { type: 'string' } } };
  else if (response.status !== 204 && response.status !== 302) ok.content = { 'application/json': { schema: response.schema ? toSchema(response.schema, 'output') : { type: 'object' } } };
  const responses: Record<string, JsonSchema> = { [String(response.status)]: ok };
  if (route.body || route.query || route.path.includes(':')) responses['400'] = { $ref: '#/components/responses/Error' };
  if (typeof route.access === 'object') {
    responses['401'] = { $ref: '#/components/responses/Error' };
    responses['403'] = { $ref: '#/components/responses/Error' };
    if (route.access.scope === 'search') responses['429'] = { $ref: '#/components/responses/RateLimited' };
  }
  const op: JsonSchema = {
    operationId: `${route.method.toLowerCase()}${route.path.replace(/[^A-Za-z0-9]+(.)?/g, (_m, c: string | undefined) => (c ?? '').toUpperCase())}`,
    summary: route.summary,
    tags: [route.tag],
    security: security(route),
    responses,
  };
  if (typeof route.access === 'object') {
    op['x-ionfolio-role'] = route.access.role;
    if (route.access.scope) op['x-ionfolio-scope'] = route.access.scope;
  }
  const params = parameters(route);
  if (params.length > 0) op.parameters = params;
  if (route.bodyType === 'multipart') {
    const fields = route.body ? (toSchema(route.body, 'input').properties as JsonSchema | undefined) : undefined;
    op.requestBody = {
      required: true,
      content: { 'multipart/form-data': { schema: { type: 'object', properties: { file: { type: 'string', format: 'binary' }, ...fields }, required: ['file'] } } },
    };
  } else if (route.body) {
    const content: JsonSchema = { 'application/json': { schema: toSchema(route.body, 'input') } };
    // Batch identify also takes an uploaded file.
    if (route.path === '/api/v1/identify/batch') {
      content['multipart/form-data'] = { schema: { type: 'object', properties: { file: { type: 'string', format: 'binary' }, method: { type: 'string' }, reverse: { type: 'string', enum: ['true', 'false'] }, edition: { type: 'string' } }, required: ['file'] } };
    }
    op.requestBody = { required: true, content };
  }
  return op;
}

/** The OpenAPI 3.1 document of the API, generated from {@link ROUTES} and their zod schemas. */
export function buildOpenApiDocument(version: string): JsonSchema {
  const paths: Record<string, Record<string, JsonSchema>> = {};
  for (const route of ROUTES) {
    (paths[openApiPath(route.path)] ??= {})[route.method.toLowerCase()] = operation(route);
  }
  return {
    openapi: '3.1.0',
    info: {
      title: 'Ionfolio API',
      version,
      description:
        'A reviewed, versioned, searchable in-house library of 70 eV EI mass spectra. Tools authenticate with ' +
        '`Authorization: Bearer <access key>` (scopes: search, library:read, submit); the browser with its session ' +
        'cookie (writes send `X-Requested-With: ionfolio`). Errors are `{ error: { code, message, details? } }`.',
    },
    servers: [{ url: '/' }],
    tags: [...new Set(ROUTES.map((r) => r.tag))].map((name) => ({ name })),
    paths,
    components: {
      securitySchemes: {
        accessKey: { type: 'http', scheme: 'bearer', bearerFormat: 'ifk_…', description: 'An access key created under Tools → Access keys' },
        session: { type: 'apiKey', in: 'cookie', name: 'ionfolio.sid', description: 'The browser session after sign-in' },
      },
      schemas: { Error: toSchema(ErrorSchema, 'output') },
      responses: {
        Error: { description: 'What went wrong', content: { 'application/json': { schema: { $ref: '#/components/schemas/Error' } } } },
        RateLimited: {
          description: 'Too many identify calls; wait for Retry-After seconds',
          headers: { 'Retry-After': { schema: { type: 'integer' }, description: 'Seconds to wait' } },
          content: { 'application/json': { schema: { $ref: '#/components/schemas/Error' } } },
        },
      },
    },
  };
}
