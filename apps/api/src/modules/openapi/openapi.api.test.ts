import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { searchServiceOf } from '../../app';
import { createTestContext, type TestContext } from '../../testing/test-app';
import { mountedRoutes } from './mounted-routes';
import { ROUTES } from './route-registry';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  await searchServiceOf(ctx.app).stop();
  await ctx.close();
});

type Doc = {
  openapi: string;
  info: { title: string; version: string };
  paths: Record<string, Record<string, { operationId: string; responses: Record<string, unknown>; parameters?: { name: string; in: string }[]; security?: Record<string, string[]>[] }>>;
  components: { securitySchemes: Record<string, { type: string; scheme?: string; in?: string }> };
};

const HTTP_METHODS = new Set(['get', 'put', 'post', 'delete', 'options', 'head', 'patch', 'trace']);

/** Every `$ref` in the document, to check that each resolves. */
function refs(value: unknown, out: string[] = []): string[] {
  if (Array.isArray(value)) value.forEach((v) => refs(v, out));
  else if (value && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) {
      if (k === '$ref' && typeof v === 'string') out.push(v);
      else refs(v, out);
    }
  }
  return out;
}

describe('GET /api/v1/openapi.json', () => {
  it('is a public, structurally valid OpenAPI 3.1 document (OpenAPI Specification 3.1.0 §4.8)', async () => {
    const res = await request(ctx.app).get('/api/v1/openapi.json').expect(200);
    const doc = res.body as Doc;
    expect(doc.openapi).toMatch(/^3\.1\.\d+$/);
    expect(doc.info.title).toBeTruthy();
    expect(doc.info.version).toBeTruthy();
    const operationIds = new Set<string>();
    for (const [path, item] of Object.entries(doc.paths)) {
      expect(path.startsWith('/')).toBe(true);
      const templated = [...path.matchAll(/\{([^}]+)\}/g)].map((m) => m[1]);
      for (const [method, op] of Object.entries(item)) {
        expect(HTTP_METHODS.has(method), `${method} ${path}`).toBe(true);
        expect(operationIds.has(op.operationId), `duplicate operationId ${op.operationId}`).toBe(false);
        operationIds.add(op.operationId);
        expect(Object.keys(op.responses).length).toBeGreaterThan(0);
        for (const code of Object.keys(op.responses)) expect(code).toMatch(/^[1-5]\d\d$/);
        // Every templated segment is declared as a required path parameter, and nothing else is.
        const declared = (op.parameters ?? []).filter((p) => p.in === 'path').map((p) => p.name);
        expect(declared.sort()).toEqual([...templated].sort());
        for (const requirement of op.security ?? []) {
          for (const scheme of Object.keys(requirement)) expect(doc.components.securitySchemes[scheme], scheme).toBeDefined();
        }
      }
    }
    expect(doc.components.securitySchemes.accessKey).toMatchObject({ type: 'http', scheme: 'bearer' });
    expect(doc.components.securitySchemes.session).toMatchObject({ type: 'apiKey', in: 'cookie' });
    for (const ref of refs(doc)) {
      const target = ref.replace(/^#\//, '').split('/').reduce<unknown>((node, key) => (node as Record<string, unknown> | undefined)?.[key], doc);
      expect(target, ref).toBeDefined();
    }
    // Generated from the zod schemas: the identify body names its fields and the method enum.
    const identify = (doc.paths['/api/v1/identify']!.post as unknown as { requestBody: { content: Record<string, { schema: { properties: Record<string, { enum?: string[] }>; required: string[] } }> } }).requestBody;
    const schema = identify.content['application/json']!.schema;
    expect(schema.required).toContain('peaks');
    expect(schema.properties.method!.enum).toEqual(['composite', 'cosine', 'weighted', 'entropy']);
  });

  it('lists every route mounted in the app, with the role and scope the route itself enforces', async () => {
    const mounted = mountedRoutes(ctx.app);
    expect(mounted.length).toBeGreaterThan(30);
    const registered = new Map(ROUTES.map((r) => [`${r.method} ${r.path}`, r]));
    const missing = mounted.filter((m) => !registered.has(`${m.method} ${m.path}`)).map((m) => `${m.method} ${m.path}`);
    expect(missing, 'routes missing from modules/openapi/route-registry.ts').toEqual([]);
    const stale = ROUTES.filter((r) => !mounted.some((m) => m.method === r.method && m.path === r.path)).map((r) => `${r.method} ${r.path}`);
    expect(stale, 'registry routes the app does not mount').toEqual([]);
    for (const m of mounted) {
      const spec = registered.get(`${m.method} ${m.path}`)!;
      if (m.access) expect(spec.access, `${m.method} ${m.path}`).toEqual(m.access);
      else expect(typeof spec.access, `${m.method} ${m.path}`).toBe('string');
    }
    const doc = (await request(ctx.app).get('/api/v1/openapi.json').expect(200)).body as Doc;
    for (const m of mounted) {
      const path = m.path.replace(/:([A-Za-z0-9_]+)/g, '{$1}');
      expect(doc.paths[path]?.[m.method.toLowerCase()], `${m.method} ${path} in the document`).toBeDefined();
    }
  });
});
