import type { OpenApiDocument } from '../api/get-openapi';

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** The value a local `$ref` (`#/components/...`) points at, or undefined. */
export function lookupRef(document: OpenApiDocument, ref: string): unknown {
  if (!ref.startsWith('#/')) return undefined;
  return ref
    .slice(2)
    .split('/')
    .map((part) => part.replace(/~1/g, '/').replace(/~0/g, '~'))
    .reduce<unknown>((node, part) => (isObject(node) ? node[part] : undefined), document);
}

/**
 * A schema with its local `$ref`s replaced by what they point at, for display; a reference met again
 * inside itself stays a `$ref` (recursive schemas), and nesting stops at `maxDepth`.
 */
export function resolveSchema(document: OpenApiDocument, schema: unknown, seen: readonly string[] = [], maxDepth = 12): Json {
  if (maxDepth <= 0) return '…';
  if (Array.isArray(schema)) return schema.map((item) => resolveSchema(document, item, seen, maxDepth - 1));
  if (!isObject(schema)) return (schema ?? null) as Json;
  const ref = schema.$ref;
  if (typeof ref === 'string') {
    if (seen.includes(ref)) return { $ref: ref };
    return resolveSchema(document, lookupRef(document, ref), [...seen, ref], maxDepth - 1);
  }
  const out: { [key: string]: Json } = {};
  for (const [key, value] of Object.entries(schema)) out[key] = resolveSchema(document, value, seen, maxDepth - 1);
  return out;
}
