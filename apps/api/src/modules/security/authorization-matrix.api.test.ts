import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { searchServiceOf } from '../../app';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';
import { chlorobenzeneContent } from '../../testing/fixtures';
import { mountedRoutes } from '../openapi/mounted-routes';
import { roleAtLeast } from '../../shared/require-role';
import type { Role } from '../users/user.entity';
import { ACCESS_KEY_SCOPES, type AccessKeyScope } from '../access-keys/access-key-scopes';
import { countRows } from '../reliability/table-snapshot';
import { createKey, W } from './security-test-helpers';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  await searchServiceOf(ctx.app).stop();
  await ctx.close();
});

interface Operation {
  method: string;
  /** Express-style path with the OpenAPI `{param}` segments filled in. */
  path: string;
  template: string;
  role?: Role;
  scope?: AccessKeyScope;
  /** `public` and the sign-in flow (`session`) declare no security requirement. */
  open: boolean;
}

type Caller = { kind: 'anonymous' } | { kind: 'session'; role: Role } | { kind: 'key'; scope: AccessKeyScope };
type Outcome = 401 | 403 | 'pass';

const ROLES: Role[] = ['reader', 'contributor', 'curator', 'admin'];
const CALLERS: Caller[] = [
  { kind: 'anonymous' },
  ...ROLES.map((role) => ({ kind: 'session', role }) as const),
  ...ACCESS_KEY_SCOPES.map((scope) => ({ kind: 'key', scope }) as const),
];
const callerName = (c: Caller) => (c.kind === 'anonymous' ? 'anonymous' : c.kind === 'session' ? c.role : `key:${c.scope}`);

// Values for path parameters that name nothing: a caller past authorization gets 400 or 404, never a write.
const PARAM_VALUES: Record<string, string> = {
  id: '00000000-0000-4000-8000-000000000000',
  accession: 'IF-999999',
  label: 'no-such-edition',
  formula: 'C6H6',
};

/**
 * The expectation table. Routes without a declared role (health, the OpenAPI document, sign-in
 * config and flow) are open to everyone. Sign-out is a cookie write on /auth, where access keys
 * are not read: a key caller, who sends no X-Requested-With, is refused by the CSRF guard.
 * Every other route: anonymous 401; a signed-in user passes when their role is at least the
 * declared one; an access key (owned here by an admin, so only its scope can stop it) passes
 * exactly when the route declares that key's scope.
 */
function expected(op: Operation, caller: Caller): Outcome {
  if (op.open) {
    if (op.method === 'POST' && op.template === '/auth/sign-out' && caller.kind === 'key') return 403;
    return 'pass';
  }
  if (caller.kind === 'anonymous') return 401;
  if (caller.kind === 'session') return roleAtLeast(caller.role, op.role!) ? 'pass' : 403;
  return op.scope === caller.scope ? 'pass' : 403;
}

type Doc = { paths: Record<string, Record<string, { security?: Record<string, string[]>[]; 'x-ionfolio-role'?: Role; 'x-ionfolio-scope'?: AccessKeyScope }>> };

function operationsOf(doc: Doc): Operation[] {
  const ops: Operation[] = [];
  for (const [template, item] of Object.entries(doc.paths)) {
    for (const [method, op] of Object.entries(item)) {
      const path = template.replace(/\{([^}]+)\}/g, (_m, name: string) => {
        const value = PARAM_VALUES[name];
        if (!value) throw new Error(`no test value for path parameter ${name} of ${template}`);
        return value;
      });
      ops.push({
        method: method.toUpperCase(),
        path,
        template,
        role: op['x-ionfolio-role'],
        scope: op['x-ionfolio-scope'],
        open: (op.security ?? []).length === 0 && op['x-ionfolio-role'] === undefined,
      });
    }
  }
  // Sign-out ends the caller's session: it goes last.
  return ops.sort((a, b) => Number(a.template === '/auth/sign-out') - Number(b.template === '/auth/sign-out'));
}

function send(agent: TestAgent | ReturnType<typeof request>, op: Operation, headers: Record<string, string>) {
  const m = op.method.toLowerCase() as 'get' | 'post' | 'patch' | 'delete';
  const req = agent[m](op.path).set(headers).redirects(0);
  return m === 'get' ? req : req.send({});
}

describe('authorization matrix over every operation of /api/v1/openapi.json', () => {
  it('every mounted route is in the document, and every document operation declares role and scope as the route enforces them', async () => {
    const doc = (await request(ctx.app).get('/api/v1/openapi.json').expect(200)).body as Doc;
    const ops = operationsOf(doc);
    const mounted = mountedRoutes(ctx.app);
    const inDoc = new Set(ops.map((o) => `${o.method} ${o.template}`));
    const missing = mounted.map((m) => `${m.method} ${m.path.replace(/:([A-Za-z0-9_]+)/g, '{$1}')}`).filter((k) => !inDoc.has(k));
    expect(missing).toEqual([]);
    expect(ops.length).toBe(mounted.length);
    for (const m of mounted) {
      const op = ops.find((o) => o.method === m.method && o.template === m.path.replace(/:([A-Za-z0-9_]+)/g, '{$1}'))!;
      expect({ role: op.role, scope: op.scope }, `${m.method} ${m.path}`).toEqual({ role: m.access?.role, scope: m.access?.scope });
    }
  });

  it('answers each caller — anonymous, each role, each access-key scope — as the table expects, and writes nothing', async () => {
    const doc = (await request(ctx.app).get('/api/v1/openapi.json').expect(200)).body as Doc;
    const ops = operationsOf(doc);
    expect(ops.length).toBeGreaterThan(40);

    const sessions = new Map<Role, TestAgent>();
    for (const role of ROLES) sessions.set(role, (await signInAs(ctx, role)).agent);
    const keys = new Map<AccessKeyScope, string>();
    for (const scope of ACCESS_KEY_SCOPES) keys.set(scope, await createKey(sessions.get('admin')!, [scope]));

    const before = await countRows(ctx.ds);
    const wrong: string[] = [];
    const table: string[] = [];
    for (const op of ops) {
      const row: string[] = [];
      for (const caller of CALLERS) {
        const res =
          caller.kind === 'anonymous'
            ? await send(request(ctx.app), op, W)
            : caller.kind === 'session'
              ? await send(sessions.get(caller.role)!, op, W)
              : await send(request(ctx.app), op, { Authorization: `Bearer ${keys.get(caller.scope)}` });
        const want = expected(op, caller);
        const got: Outcome = res.status === 401 ? 401 : res.status === 403 ? 403 : 'pass';
        // A pass is any answer but 401/403 — a 400 for the empty body or a 404 for the made-up id
        // still proves the caller got past authorization. A 5xx is never right.
        if (got !== want || res.status >= 500) wrong.push(`${op.method} ${op.template} as ${callerName(caller)}: ${res.status} ${JSON.stringify(res.body?.error?.code ?? '')}, expected ${want}`);
        row.push(String(res.status));
      }
      table.push(`${op.method} ${op.template}: ${row.join(' ')}`);
    }
    expect(wrong, table.join('\n')).toEqual([]);

    const after = await countRows(ctx.ds);
    // Only sign-out writes (it deletes sessions); audit, entries, keys, users, jobs and editions stay as they were.
    const changed = Object.keys(after).filter((t) => t !== 'session' && after[t] !== before[t]);
    expect(changed).toEqual([]);
  });
});

describe('contributors edit only their own drafts', () => {
  it('another contributor gets 403 NOT_AUTHOR on PATCH, the draft keeps its content; a curator may not edit it either', async () => {
    const author = await signInAs(ctx, 'contributor');
    const other = await signInAs(ctx, 'contributor');
    const curator = await signInAs(ctx, 'curator');
    const r1 = (await author.agent.post('/api/v1/entries').set(W).send(chlorobenzeneContent()).expect(201)).body.revision;

    const notMine = await other.agent.patch(`/api/v1/revisions/${r1.id}`).set(W).send({ lockVersion: r1.lockVersion, name: 'Taken over' }).expect(403);
    expect(notMine.body.error.code).toBe('NOT_AUTHOR');
    const byCurator = await curator.agent.patch(`/api/v1/revisions/${r1.id}`).set(W).send({ lockVersion: r1.lockVersion, name: 'Taken over' });
    expect(byCurator.status).toBe(403);
    expect(byCurator.body.error.code).toBe('NOT_AUTHOR');

    // The same refusal through a submit key of the other contributor.
    const key = await createKey(other.agent, ['submit']);
    const viaKey = await request(ctx.app).patch(`/api/v1/revisions/${r1.id}`).set('Authorization', `Bearer ${key}`).send({ lockVersion: r1.lockVersion, name: 'Taken over' }).expect(403);
    expect(viaKey.body.error.code).toBe('NOT_AUTHOR');

    const row: { name: string; lock_version: number }[] = await ctx.ds.query(`SELECT name, lock_version FROM revisions WHERE id = $1`, [r1.id]);
    expect(row[0]).toEqual({ name: 'Chlorobenzene (test)', lock_version: r1.lockVersion });
    await author.agent.patch(`/api/v1/revisions/${r1.id}`).set(W).send({ lockVersion: r1.lockVersion, name: 'Chlorobenzene (test, edited)' }).expect(200);
  });
});
