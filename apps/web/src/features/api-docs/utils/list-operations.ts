import { operationSchema, type OpenApiDocument } from '../api/get-openapi';
import { exampleFromSchema } from './example-from-schema';
import { lookupRef, resolveSchema } from './resolve-schema';

const METHODS = ['get', 'post', 'put', 'patch', 'delete'] as const;

export type ApiParameter = { name: string; in: string; required: boolean; description: string; example: string };

export type ApiOperation = {
  id: string;
  method: Uppercase<(typeof METHODS)[number]>;
  path: string;
  tag: string;
  summary: string;
  description: string;
  /** Scopes an access key needs; empty with `access` 'key' means any valid key. */
  scopes: string[];
  access: 'key' | 'session' | 'public';
  parameters: ApiParameter[];
  bodyType: 'json' | 'multipart' | null;
  requestSchema: unknown;
  curl: string | null;
};

// A spectrum that is valid for every search route (invented chlorobenzene-like peaks, simulated).
const demoPeaks = [
  [51, 14],
  [77, 60],
  [112, 100],
  [113, 6.6],
  [114, 32.5],
];

/** Bodies that the schema alone cannot make meaningful (a spectrum must have a positive peak). */
const knownBodies: Record<string, unknown> = {
  'POST /api/v1/identify': { peaks: demoPeaks, limit: 5 },
  'POST /api/v1/readings': { peaks: demoPeaks },
  'POST /api/v1/identify/batch': { spectra: [{ name: 'unknown 1', peaks: demoPeaks }] },
  'POST /api/v1/access-keys': { name: 'LIMS export', scopes: ['search'] },
};

/** Path parameters with values that exist in every Ionfolio library; the rest become shell variables. */
const knownPathValues: Record<string, string> = { accession: 'IF-000001', formula: 'C6H5Cl' };

function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function deref(document: OpenApiDocument, value: unknown): unknown {
  return isObject(value) && typeof value.$ref === 'string' ? lookupRef(document, value.$ref) : value;
}

function shellVariable(name: string): string {
  return `$${name.replace(/([a-z])([A-Z])/g, '$1_$2').replace(/[^A-Za-z0-9]/g, '_').toUpperCase()}`;
}

function parameterExample(parameter: Record<string, unknown>, schema: unknown): string {
  const name = String(parameter.name);
  if (parameter.example !== undefined) return String(parameter.example);
  if (isObject(schema) && schema.example !== undefined) return String(schema.example);
  if (knownPathValues[name]) return knownPathValues[name];
  if (parameter.in === 'path') return shellVariable(name);
  const value = exampleFromSchema(schema);
  return value === null ? shellVariable(name) : String(value);
}

function bearerSchemes(document: OpenApiDocument): Set<string> {
  const components = isObject(document.components) ? document.components : {};
  const schemes = isObject(components.securitySchemes) ? components.securitySchemes : {};
  return new Set(
    Object.entries(schemes)
      .filter(([, s]) => isObject(s) && s.type === 'http' && String(s.scheme).toLowerCase() === 'bearer')
      .map(([name]) => name),
  );
}

function accessOf(document: OpenApiDocument, security: Record<string, string[]>[] | undefined, extension: unknown) {
  const requirements = security ?? document.security;
  const extra = Array.isArray(extension) ? extension.map(String) : typeof extension === 'string' ? [extension] : [];
  if (requirements === undefined) return { access: 'key' as const, scopes: extra };
  if (requirements.length === 0 || requirements.some((r) => Object.keys(r).length === 0)) return { access: 'public' as const, scopes: extra };
  const bearer = bearerSchemes(document);
  const byKey = requirements.filter((r) => Object.keys(r).some((name) => bearer.has(name)));
  if (bearer.size > 0 && byKey.length === 0) return { access: 'session' as const, scopes: extra };
  const scopes = [...new Set([...extra, ...(byKey.length > 0 ? byKey : requirements).flatMap((r) => Object.values(r).flat())])];
  return { access: 'key' as const, scopes };
}

function shellQuote(text: string): string {
  return `'${text.replace(/'/g, `'\\''`)}'`;
}

/** A curl line that runs as written with the access key in `$IONFOLIO_KEY`, against `origin`. */
export function curlFor(op: Pick<ApiOperation, 'method' | 'bodyType'>, url: string, body: unknown): string {
  const lines = [`curl -sS${op.method === 'GET' ? '' : ` -X ${op.method}`} "${url}"`, `  -H "Authorization: Bearer $IONFOLIO_KEY"`];
  if (op.bodyType === 'json') {
    lines.push(`  -H "Content-Type: application/json"`, `  -d ${shellQuote(JSON.stringify(body))}`);
  } else if (op.bodyType === 'multipart') {
    lines.push(`  -F "file=@unknowns.jdx"`);
  }
  return lines.join(' \\\n');
}

/** Every operation of the document, in path order, with its scope, body schema and a curl example. */
export function listOperations(document: OpenApiDocument, origin: string): ApiOperation[] {
  const operations: ApiOperation[] = [];
  for (const [path, item] of Object.entries(document.paths)) {
    const shared = Array.isArray(item.parameters) ? item.parameters : [];
    for (const method of METHODS) {
      const parsed = operationSchema.safeParse(item[method]);
      if (!parsed.success) continue;
      const op = parsed.data;
      const upper = method.toUpperCase() as ApiOperation['method'];
      const parameters = [...shared, ...(op.parameters ?? [])]
        .map((p) => deref(document, p))
        .filter(isObject)
        .map((p) => {
          const schema = resolveSchema(document, p.schema);
          return {
            name: String(p.name),
            in: String(p.in),
            required: p.required === true || p.in === 'path',
            description: typeof p.description === 'string' ? p.description : isObject(schema) && typeof schema.description === 'string' ? schema.description : '',
            example: parameterExample(p, schema),
          };
        });
      const requestBody = deref(document, op.requestBody);
      const content = isObject(requestBody) && isObject(requestBody.content) ? requestBody.content : {};
      const jsonSchema = isObject(content['application/json']) ? content['application/json'].schema : undefined;
      const formSchema = isObject(content['multipart/form-data']) ? content['multipart/form-data'].schema : undefined;
      const bodyType = jsonSchema !== undefined ? 'json' : formSchema !== undefined ? 'multipart' : null;
      const requestSchema = resolveSchema(document, jsonSchema ?? formSchema ?? null);
      const { access, scopes } = accessOf(document, op.security, (op as Record<string, unknown>)['x-scopes'] ?? (op as Record<string, unknown>)['x-scope']);
      let filled = path;
      for (const p of parameters.filter((x) => x.in === 'path')) filled = filled.replace(`{${p.name}}`, encodeURI(p.example));
      // A template segment the document forgot to declare still needs a value.
      filled = filled.replace(/\{([^}]+)\}/g, (_, name: string) => knownPathValues[name] ?? shellVariable(name));
      const query = parameters.filter((p) => p.in === 'query' && p.required).map((p) => `${encodeURIComponent(p.name)}=${encodeURIComponent(p.example)}`);
      const url = `${origin}${filled}${query.length > 0 ? `?${query.join('&')}` : ''}`;
      const body = knownBodies[`${upper} ${path}`] ?? exampleFromSchema(requestSchema);
      operations.push({
        id: op.operationId ?? `${method}-${path}`,
        method: upper,
        path,
        tag: op.tags?.[0] ?? (path.split('/')[3] ?? 'other'),
        summary: op.summary ?? '',
        description: op.description ?? '',
        scopes,
        access,
        parameters,
        bodyType,
        requestSchema,
        curl: access === 'session' ? null : curlFor({ method: upper, bodyType }, url, body),
      });
    }
  }
  return operations.sort((a, b) => a.path.localeCompare(b.path) || METHODS.indexOf(a.method.toLowerCase() as never) - METHODS.indexOf(b.method.toLowerCase() as never));
}
