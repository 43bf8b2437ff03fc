import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { searchServiceOf } from '../../app';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';
import { W } from '../identify/identify-test-helpers';
import { chlorobenzeneContent } from '../../testing/fixtures';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext({ IDENTIFY_RATE_PER_MINUTE: '2', IDENTIFY_RATE_BURST: '2' });
});
afterAll(async () => {
  await searchServiceOf(ctx.app).stop();
  await ctx.close();
});

const PEAKS = [[43, 100], [58, 25], [71, 8]];

async function newKey(agent: Awaited<ReturnType<typeof signInAs>>['agent'], scopes: string[], name = 'instrument PC') {
  const res = await agent.post('/api/v1/access-keys').set(W).send({ name, scopes }).expect(201);
  return res.body as { key: { id: string; prefix: string; scopes: string[]; lastUsedAt: string | null }; secret: string };
}

describe('access keys', () => {
  it('a search key gets candidates; no key 401; a revoked key 401; a library:read key 403 on identify', async () => {
    const reader = await signInAs(ctx, 'reader');
    const { key, secret } = await newKey(reader.agent, ['search']);
    expect(secret).toMatch(/^ifk_[A-Za-z0-9_-]{32}$/);
    expect(secret.startsWith(key.prefix)).toBe(true);
    // Stored hashed: the secret itself is nowhere in the table.
    const stored = await ctx.ds.query(`SELECT * FROM access_keys WHERE id = $1`, [key.id]);
    expect(JSON.stringify(stored)).not.toContain(secret);

    const tool = request(ctx.app);
    // No cookie and no CSRF header: a key-authenticated write needs neither.
    const found = await tool.post('/api/v1/identify').set('Authorization', `Bearer ${secret}`).send({ peaks: PEAKS }).expect(200);
    expect(found.body).toHaveProperty('candidates');
    const used = await ctx.ds.query(`SELECT last_used_at FROM access_keys WHERE id = $1`, [key.id]);
    expect(used[0].last_used_at).not.toBeNull();

    await tool.post('/api/v1/identify').send({ peaks: PEAKS }).set(W).expect(401);
    const unknown = await tool.post('/api/v1/identify').set('Authorization', `Bearer ifk_${'x'.repeat(32)}`).send({ peaks: PEAKS }).expect(401);
    expect(unknown.body.error.code).toBe('INVALID_ACCESS_KEY');
    await tool.post('/api/v1/identify').set('Authorization', 'Basic abc').send({ peaks: PEAKS }).expect(401);

    const readKey = await newKey(reader.agent, ['library:read']);
    const scoped = await tool.post('/api/v1/identify').set('Authorization', `Bearer ${readKey.secret}`).send({ peaks: PEAKS }).expect(403);
    expect(scoped.body.error.code).toBe('SCOPE');

    const revoked = await reader.agent.delete(`/api/v1/access-keys/${key.id}`).set(W).expect(200);
    expect(revoked.body.key.revokedAt).not.toBeNull();
    const after = await tool.post('/api/v1/identify').set('Authorization', `Bearer ${secret}`).send({ peaks: PEAKS }).expect(401);
    expect(after.body.error.code).toBe('INVALID_ACCESS_KEY');

    const audit = await ctx.ds.query(`SELECT action FROM audit_events WHERE subject_id = $1 ORDER BY id`, [key.id]);
    expect(audit.map((a: { action: string }) => a.action)).toEqual(['access_key.created', 'access_key.revoked']);
  });

  it('a key may not manage keys nor reach routes that declare no scope', async () => {
    const reader = await signInAs(ctx, 'reader');
    const { secret } = await newKey(reader.agent, ['search', 'library:read']);
    const tool = request(ctx.app);
    const made = await tool.post('/api/v1/access-keys').set('Authorization', `Bearer ${secret}`).send({ name: 'x', scopes: ['search'] }).expect(403);
    expect(made.body.error.code).toBe('SCOPE');
    await tool.get('/api/v1/me').set('Authorization', `Bearer ${secret}`).expect(403);
  });

  it('readers may create read scopes only; submit needs a contributor', async () => {
    const reader = await signInAs(ctx, 'reader');
    const refused = await reader.agent.post('/api/v1/access-keys').set(W).send({ name: 'lims', scopes: ['search', 'submit'] }).expect(403);
    expect(refused.body.error.code).toBe('SCOPE_NOT_ALLOWED');
    const contributor = await signInAs(ctx, 'contributor');
    const { key } = await newKey(contributor.agent, ['submit', 'search']);
    expect(key.scopes).toEqual(['search', 'submit']);
    const bad = await reader.agent.post('/api/v1/access-keys').set(W).send({ name: '', scopes: ['everything'] }).expect(400);
    expect(bad.body.error.message).toMatch(/name|scopes/);
  });

  it('each lists their own keys; admins list all with ?all=true; only owner or admin revokes', async () => {
    const a = await signInAs(ctx, 'reader');
    const b = await signInAs(ctx, 'reader');
    const admin = await signInAs(ctx, 'admin');
    const ka = await newKey(a.agent, ['search'], 'a key');
    const kb = await newKey(b.agent, ['search'], 'b key');
    const mine = (await a.agent.get('/api/v1/access-keys').expect(200)).body.keys.map((k: { id: string }) => k.id);
    expect(mine).toEqual([ka.key.id]);
    await a.agent.get('/api/v1/access-keys?all=true').expect(403);
    const all = (await admin.agent.get('/api/v1/access-keys?all=true').expect(200)).body.keys.map((k: { id: string }) => k.id);
    expect(all).toEqual(expect.arrayContaining([ka.key.id, kb.key.id]));
    await a.agent.delete(`/api/v1/access-keys/${kb.key.id}`).set(W).expect(404);
    await admin.agent.delete(`/api/v1/access-keys/${kb.key.id}`).set(W).expect(200);
  });

  it('a library:read key reads entries; a submit key creates and submits a draft without a CSRF header', async () => {
    const contributor = await signInAs(ctx, 'contributor');
    const read = await newKey(contributor.agent, ['library:read']);
    const submit = await newKey(contributor.agent, ['submit']);
    const tool = request(ctx.app);
    await tool.get('/api/v1/entries').set('Authorization', `Bearer ${read.secret}`).expect(200);
    await tool.get('/api/v1/entries').set('Authorization', `Bearer ${submit.secret}`).expect(403);
    const created = await tool.post('/api/v1/entries').set('Authorization', `Bearer ${submit.secret}`).send(chlorobenzeneContent()).expect(201);
    const r1 = created.body.revision;
    await tool.post(`/api/v1/revisions/${r1.id}/submit`).set('Authorization', `Bearer ${submit.secret}`).send({ lockVersion: r1.lockVersion }).expect(200);
    await tool.post('/api/v1/entries').set('Authorization', `Bearer ${read.secret}`).send(chlorobenzeneContent()).expect(403);
    // A key acts as its owner: when the owner is a reader again, submit is refused by role.
    await ctx.ds.query(`UPDATE users SET role = 'reader' WHERE id = $1`, [contributor.id]);
    const demoted = await tool.post('/api/v1/entries').set('Authorization', `Bearer ${submit.secret}`).send(chlorobenzeneContent()).expect(403);
    expect(demoted.body.error.code).toBe('FORBIDDEN');
  });

  it('the rate limit counts per key: over it 429 with Retry-After', async () => {
    const reader = await signInAs(ctx, 'reader');
    const k1 = await newKey(reader.agent, ['search']);
    const k2 = await newKey(reader.agent, ['search']);
    const call = (secret: string) => request(ctx.app).post('/api/v1/identify').set('Authorization', `Bearer ${secret}`).send({ peaks: PEAKS });
    expect([(await call(k1.secret)).status, (await call(k1.secret)).status]).toEqual([200, 200]);
    const over = await call(k1.secret);
    expect(over.status).toBe(429);
    expect(Number(over.headers['retry-after'])).toBeGreaterThanOrEqual(1);
    expect(over.body.error).toMatchObject({ code: 'RATE_LIMITED' });
    expect((await call(k2.secret)).status).toBe(200);
  });
});
