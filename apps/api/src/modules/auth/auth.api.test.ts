import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestContext, signIn, signInAs, uniqueLogin, type TestContext } from '../../testing/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  await ctx.close();
});

describe('sign-in through the OAuth stand-in', () => {
  it('when a new person signs in, creates them as a reader and /me returns them', async () => {
    const agent = request.agent(ctx.app);
    const login = uniqueLogin('new');
    await signIn(ctx, agent, login);
    const me = await agent.get('/api/v1/me').expect(200);
    expect(me.body.user).toMatchObject({ login, role: 'reader', email: `${login}@users.stand-in.example` });
    const audit = await ctx.ds.query(`SELECT action FROM audit_events WHERE subject_id = $1`, [me.body.user.id]);
    expect(audit).toEqual([{ action: 'user.created' }]);
  });

  it('sets the session cookie httpOnly and SameSite=Lax', async () => {
    const agent = request.agent(ctx.app);
    const res = await agent.get('/auth/github').expect(302);
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/ionfolio\.sid=/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
  });

  it('when the callback carries a forged code, sends the person back to sign-in with an error', async () => {
    const agent = request.agent(ctx.app);
    const start = await agent.get('/auth/github').expect(302);
    const state = new URL(String(start.headers.location)).searchParams.get('state');
    const res = await agent.get(`/auth/github/callback?code=forged&state=${state}`).expect(302);
    expect(res.headers.location).toBe('/sign-in?error=provider');
    await agent.get('/api/v1/me').expect(401);
  });

  it('when returnTo points off-site, lands on / instead', async () => {
    const agent = request.agent(ctx.app);
    const start = await agent.get('/auth/github?returnTo=//evil.example/x').expect(302);
    const form = new URLSearchParams(new URL(String(start.headers.location)).searchParams);
    form.set('login', uniqueLogin('redir'));
    const granted = await fetch(`${ctx.oauth.url}/login/oauth/authorize`, { method: 'POST', body: form, redirect: 'manual' });
    const cb = new URL(granted.headers.get('location')!);
    const back = await agent.get(cb.pathname + cb.search).expect(302);
    expect(back.headers.location).toBe('/');
  });

  it('sign-out ends the session on the server', async () => {
    const { agent } = await signInAs(ctx, 'contributor');
    await agent.get('/api/v1/me').expect(200);
    const before = await ctx.ds.query(`SELECT count(*)::int AS n FROM session`);
    await agent.post('/auth/sign-out').set('X-Requested-With', 'ionfolio').expect(204);
    await agent.get('/api/v1/me').expect(401);
    const after = await ctx.ds.query(`SELECT count(*)::int AS n FROM session`);
    expect(after[0].n).toBe(before[0].n - 1);
  });

  it('sign-out without the CSRF header is refused', async () => {
    const { agent } = await signInAs(ctx, 'reader');
    const res = await agent.post('/auth/sign-out').expect(403);
    expect(res.body.error.code).toBe('CSRF');
    await agent.get('/api/v1/me').expect(200);
  });

  it('the first admin from config becomes admin on first sign-in', async () => {
    const login = uniqueLogin('boss');
    const other = await createTestContext({ FIRST_ADMIN_LOGIN: login });
    try {
      const agent = request.agent(other.app);
      await signIn(other, agent, login);
      const me = await agent.get('/api/v1/me').expect(200);
      expect(me.body.user.role).toBe('admin');
    } finally {
      await other.close();
    }
  });
});

describe('public auth config', () => {
  it('tells the sign-in page that a local stand-in provider is in use', async () => {
    const res = await request(ctx.app).get('/api/auth/config').expect(200);
    expect(res.body).toEqual({ provider: 'github', localStandIn: true });
  });
});
