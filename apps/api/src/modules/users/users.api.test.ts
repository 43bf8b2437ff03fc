import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  await ctx.close();
});

const W = { 'X-Requested-With': 'ionfolio' };

describe('roles on the API', () => {
  it('an anonymous caller gets 401 with a JSON error', async () => {
    const res = await request(ctx.app).get('/api/v1/me').expect(401);
    expect(res.body.error.code).toBe('UNAUTHENTICATED');
    await request(ctx.app).get('/api/v1/admin/users').expect(401);
  });

  it.each(['reader', 'contributor', 'curator'] as const)('a %s gets 403 on an admin route', async (role) => {
    const { agent } = await signInAs(ctx, role);
    const res = await agent.get('/api/v1/admin/users').expect(403);
    expect(res.body.error).toMatchObject({ code: 'FORBIDDEN' });
    expect(res.body.error.message).toContain('admin');
  });

  it('an admin lists users and changes a role; audit line and mail follow', async () => {
    const admin = await signInAs(ctx, 'admin');
    const target = await signInAs(ctx, 'reader');
    const list = await admin.agent.get('/api/v1/admin/users').expect(200);
    expect(list.body.users.map((u: { login: string }) => u.login)).toContain(target.login);

    const res = await admin.agent.patch(`/api/v1/admin/users/${target.id}`).set(W).send({ role: 'curator' }).expect(200);
    expect(res.body.user).toMatchObject({ login: target.login, role: 'curator' });
    const me = await target.agent.get('/api/v1/me').expect(200);
    expect(me.body.user.role).toBe('curator');

    const audit = await ctx.ds.query(
      `SELECT action, data FROM audit_events WHERE subject_id = $1 AND action = 'user.role_changed'`,
      [target.id],
    );
    expect(audit).toEqual([{ action: 'user.role_changed', data: { login: target.login, from: 'reader', to: 'curator' } }]);
    const mails = await ctx.ds.query(`SELECT subject, status FROM mail_messages WHERE to_address = $1`, [`${target.login}@users.stand-in.example`]);
    expect(mails).toEqual([{ subject: 'Ionfolio: your role is now curator', status: 'pending' }]);
  });

  it('a bad role is a 400 that names the field, and nothing changes', async () => {
    const admin = await signInAs(ctx, 'admin');
    const target = await signInAs(ctx, 'reader');
    const res = await admin.agent.patch(`/api/v1/admin/users/${target.id}`).set(W).send({ role: 'overlord' }).expect(400);
    expect(res.body.error.code).toBe('VALIDATION');
    expect(res.body.error.details[0].path).toBe('role');
    const rows = await ctx.ds.query(`SELECT role FROM users WHERE id = $1`, [target.id]);
    expect(rows[0].role).toBe('reader');
  });

  it('an unknown user id is a 404; a malformed one a 400', async () => {
    const admin = await signInAs(ctx, 'admin');
    await admin.agent.patch('/api/v1/admin/users/7b0a5a57-54a4-4cb4-9bdb-6f0a2b0e0c11').set(W).send({ role: 'reader' }).expect(404);
    const bad = await admin.agent.patch('/api/v1/admin/users/not-a-uuid').set(W).send({ role: 'reader' }).expect(400);
    expect(bad.body.error.details[0].path).toBe('id');
  });

  it('refuses to demote the last admin', async () => {
    const admin = await signInAs(ctx, 'admin');
    // Leave exactly one admin in this database for the duration of the check.
    await ctx.ds.transaction(async (m) => {
      await m.query(`UPDATE users SET role = 'curator' WHERE role = 'admin' AND id <> $1`, [admin.id]);
    });
    const res = await admin.agent.patch(`/api/v1/admin/users/${admin.id}`).set(W).send({ role: 'reader' }).expect(409);
    expect(res.body.error.code).toBe('LAST_ADMIN');
    const rows = await ctx.ds.query(`SELECT role FROM users WHERE id = $1`, [admin.id]);
    expect(rows[0].role).toBe('admin');
  });

  it('a write without the CSRF header is refused', async () => {
    const admin = await signInAs(ctx, 'admin');
    const res = await admin.agent.patch(`/api/v1/admin/users/${admin.id}`).send({ role: 'admin' }).expect(403);
    expect(res.body.error.code).toBe('CSRF');
  });
});

describe('bad input and unknown routes', () => {
  it('a malformed JSON body gets a JSON 400, not a 500 or HTML', async () => {
    const admin = await signInAs(ctx, 'admin');
    const res = await admin.agent
      .patch(`/api/v1/admin/users/${admin.id}`)
      .set(W)
      .set('Content-Type', 'application/json')
      .send('{"role": ')
      .expect(400);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body.error.code).toBe('MALFORMED_JSON');
  });

  it('unknown API routes get a JSON 404', async () => {
    const res = await request(ctx.app).get('/api/v1/no-such-thing').expect(404);
    expect(res.body.error.code).toBe('ROUTE_NOT_FOUND');
    await request(ctx.app).post('/api/nothing').expect(404);
  });

  it('every response carries a request id', async () => {
    const res = await request(ctx.app).get('/api/health').expect(200);
    expect(res.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
    expect(res.body).toEqual({ status: 'ok', database: 'up' });
  });
});
