import { readFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { searchServiceOf } from '../../app';
import { loadEnv, SIGN_IN_RATE_DEFAULT } from '../../config/env';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';
import { chlorobenzeneContent } from '../../testing/fixtures';
import { sessionCookieOptions } from '../../shared/session-cookie';
import { signInRateLimit } from '../../shared/sign-in-rate-limit';
import { hashAccessKey, sameDigest } from '../access-keys/access-key-secret';
import { createKey, W } from './security-test-helpers';

const SIGN_IN_LIMIT = 6;
let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  await searchServiceOf(ctx.app).stop();
  await ctx.close();
});

/** The CSP header's directives by name. */
function directives(header: string): Map<string, string[]> {
  return new Map(
    header
      .split(';')
      .map((d) => d.trim().split(/\s+/))
      .filter((parts) => parts[0])
      .map(([name, ...values]) => [name!, values]),
  );
}

describe('CSRF', () => {
  it('a cookie-authenticated write without X-Requested-With is 403 CSRF and writes nothing; with it, it goes through', async () => {
    const author = await signInAs(ctx, 'contributor');
    const before: { n: number }[] = await ctx.ds.query(`SELECT count(*)::int AS n FROM revisions WHERE author_id = $1`, [author.id]);
    const refused = await author.agent.post('/api/v1/entries').send(chlorobenzeneContent()).expect(403);
    expect(refused.body.error.code).toBe('CSRF');
    // A cross-site form could send text/plain or urlencoded bodies; those are refused the same way.
    await author.agent.post('/api/v1/entries').type('form').send({ name: 'x' }).expect(403);
    const after: { n: number }[] = await ctx.ds.query(`SELECT count(*)::int AS n FROM revisions WHERE author_id = $1`, [author.id]);
    expect(after[0]!.n).toBe(before[0]!.n);
    await author.agent.post('/api/v1/entries').set(W).send(chlorobenzeneContent()).expect(201);
  });

  it('a write authenticated with an access key needs no such header (no cookie to abuse)', async () => {
    const author = await signInAs(ctx, 'contributor');
    const key = await createKey(author.agent, ['submit']);
    await request(ctx.app).post('/api/v1/entries').set('Authorization', `Bearer ${key}`).send(chlorobenzeneContent()).expect(201);
  });

  it('grants no CORS: a preflight from another origin gets no Access-Control-Allow-Origin', async () => {
    const res = await request(ctx.app)
      .options('/api/v1/entries')
      .set('Origin', 'https://evil.example')
      .set('Access-Control-Request-Method', 'POST')
      .set('Access-Control-Request-Headers', 'x-requested-with');
    expect(res.headers['access-control-allow-origin']).toBeUndefined();
  });
});

describe('helmet headers and the content-security policy', () => {
  it('sends a CSP whose scripts come only from the app itself (no unsafe-inline, no unsafe-eval), and the usual helmet headers', async () => {
    const res = await request(ctx.app).get('/api/v1/openapi.json').expect(200);
    const csp = directives(String(res.headers['content-security-policy']));
    expect(csp.get('script-src')).toEqual(["'self'"]);
    expect(csp.get('default-src')).toEqual(["'self'"]);
    expect(csp.get('object-src')).toEqual(["'none'"]);
    expect(csp.get('frame-ancestors')).toEqual(["'self'"]);
    expect(csp.get('base-uri')).toEqual(["'self'"]);
    expect(csp.get('script-src-attr')).toEqual(["'none'"]);
    expect(csp.get('form-action')).toEqual(["'self'", ctx.oauth.url]);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-frame-options']).toBe('SAMEORIGIN');
    expect(res.headers['referrer-policy']).toBe('no-referrer');
    expect(res.headers['strict-transport-security']).toMatch(/max-age=\d+/);
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('the web app shell holds no inline script the CSP would block', () => {
    // The source index.html; the built one is checked in the browser journey (tests/e2e/xss.e2e.test.ts).
    const html = readFileSync(path.resolve(import.meta.dirname, '../../../../../index.html'), 'utf8');
    const scripts = [...html.matchAll(/<script\b([^>]*)>([\s\S]*?)<\/script>/gi)];
    expect(scripts.length).toBeGreaterThan(0);
    for (const [, attrs, body] of scripts) {
      expect(attrs).toMatch(/\bsrc=/);
      expect(body!.trim()).toBe('');
    }
    expect(html).not.toMatch(/\son[a-z]+\s*=/i);
  });
});

describe('the session cookie', () => {
  it('is httpOnly and SameSite=Lax, and Secure exactly when PUBLIC_URL is https', () => {
    expect(sessionCookieOptions('http://127.0.0.1:8080')).toMatchObject({ httpOnly: true, sameSite: 'lax', secure: false });
    expect(sessionCookieOptions('https://ionfolio.lab.example')).toMatchObject({ httpOnly: true, sameSite: 'lax', secure: true });
    expect(sessionCookieOptions('HTTPS://ionfolio.lab.example/')).toMatchObject({ secure: true });
  });

  it('behind a TLS proxy on an https PUBLIC_URL the app sets it with Secure', async () => {
    const tls = await createTestContext({ PUBLIC_URL: 'https://ionfolio.lab.example' });
    try {
      // The proxy on loopback says the client came over https (trust proxy: loopback).
      const res = await request(tls.app).get('/auth/github').set('X-Forwarded-Proto', 'https').expect(302);
      const cookie = String(res.headers['set-cookie']);
      expect(cookie).toMatch(/ionfolio\.sid=/);
      expect(cookie).toMatch(/; Secure/);
      expect(cookie).toMatch(/HttpOnly/);
      expect(cookie).toMatch(/SameSite=Lax/);
    } finally {
      await searchServiceOf(tls.app).stop();
      await tls.close();
    }
  });

  it('sign-out deletes the session row: the old cookie no longer signs anyone in', async () => {
    const reader = await signInAs(ctx, 'reader');
    const sessions = async () =>
      ((await ctx.ds.query(`SELECT count(*)::int AS n FROM session WHERE sess->'passport'->>'user' = $1`, [reader.id])) as { n: number }[])[0]!.n;
    await reader.agent.get('/api/v1/me').expect(200);
    expect(await sessions()).toBe(1);
    await reader.agent.post('/auth/sign-out').set(W).expect(204);
    expect(await sessions()).toBe(0);
    await reader.agent.get('/api/v1/me').expect(401);
  });
});

describe('rate limits', () => {
  it(`sign-in: the start and the callback together at most SIGN_IN_RATE_PER_MINUTE per address (${SIGN_IN_LIMIT} here), then 429 with Retry-After`, async () => {
    // A fresh app, so that the sign-ins of other tests in this file do not count.
    const limited = await createTestContext({ SIGN_IN_RATE_PER_MINUTE: String(SIGN_IN_LIMIT) });
    try {
      for (let i = 0; i < SIGN_IN_LIMIT / 2; i++) {
        await request(limited.app).get('/auth/github').expect(302);
        await request(limited.app).get('/auth/github/callback?code=forged&state=x').expect(302);
      }
      const over = await request(limited.app).get('/auth/github').expect(429);
      expect(over.body.error.code).toBe('RATE_LIMITED');
      const retryAfterS = Number(over.headers['retry-after']);
      expect(retryAfterS).toBeGreaterThanOrEqual(1);
      expect(retryAfterS).toBeLessThanOrEqual(60);
      await request(limited.app).get('/auth/github/callback?code=forged&state=x').expect(429);
      // Another address (through the trusted loopback proxy) still signs in.
      await request(limited.app).get('/auth/github').set('X-Forwarded-For', '203.0.113.7').expect(302);
    } finally {
      await searchServiceOf(limited.app).stop();
      await limited.close();
    }
  });

  it('sign-in limit: the window resets after a minute', () => {
    let nowMs = 1_000_000;
    const limit = signInRateLimit({ perMinute: 2, now: () => nowMs });
    const statuses: number[] = [];
    const call = () => {
      const headers: Record<string, string> = {};
      let status = 200;
      limit({ ip: '198.51.100.1' } as never, { set: (k: string, v: string) => (headers[k] = v) } as never, (err?: unknown) => {
        if (err) status = (err as { status: number }).status;
      });
      statuses.push(status);
      return headers;
    };
    call();
    call();
    nowMs += 20_000;
    expect(call()['Retry-After']).toBe('40');
    nowMs += 40_000;
    call();
    expect(statuses).toEqual([200, 200, 429, 200]);
  });

  it('defaults to 30 sign-ins a minute outside tests', () => {
    const base = { DATABASE_URL: 'postgres://x@127.0.0.1/x', SESSION_SECRET: 'a-secret-of-enough-length', GITHUB_CLIENT_ID: 'c', GITHUB_CLIENT_SECRET: 's' };
    expect(SIGN_IN_RATE_DEFAULT).toBe(30);
    expect(loadEnv({ ...base, NODE_ENV: 'development' }).SIGN_IN_RATE_PER_MINUTE).toBe(30);
    expect(loadEnv({ ...base, NODE_ENV: 'production' }).SIGN_IN_RATE_PER_MINUTE).toBe(30);
    expect(loadEnv({ ...base, SIGN_IN_RATE_PER_MINUTE: '5' }).SIGN_IN_RATE_PER_MINUTE).toBe(5);
    expect(() => loadEnv({ ...base, SIGN_IN_RATE_PER_MINUTE: '0' })).toThrow(/SIGN_IN_RATE_PER_MINUTE/);
  });
  // Identify's limit (429 with Retry-After per key or session): access-keys.api.test.ts
  // "the rate limit counts per key: over it 429 with Retry-After".
});

describe('access keys at rest', () => {
  it('stores only the SHA-256 of the secret and a short prefix; no column holds the secret', async () => {
    const reader = await signInAs(ctx, 'reader');
    const secret = await createKey(reader.agent, ['search']);
    const rows: Record<string, unknown>[] = await ctx.ds.query(`SELECT * FROM access_keys WHERE owner_id = $1`, [reader.id]);
    expect(rows).toHaveLength(1);
    const text = JSON.stringify(rows[0]);
    expect(text).not.toContain(secret);
    expect(text).not.toContain(secret.slice(12));
    expect(Object.values(rows[0]!)).toContain(hashAccessKey(secret));
  });

  it('compares digests with crypto.timingSafeEqual, and any difference — first or last byte, or length — fails', () => {
    const source = readFileSync(path.resolve(import.meta.dirname, '../access-keys/access-key-secret.ts'), 'utf8');
    expect(source).toMatch(/timingSafeEqual\(/);
    const service = readFileSync(path.resolve(import.meta.dirname, '../access-keys/access-keys.service.ts'), 'utf8');
    expect(service).toMatch(/sameDigest\(/);
    const d = hashAccessKey('ifk_example');
    expect(sameDigest(d, d)).toBe(true);
    const flip = (hex: string, at: number) => hex.slice(0, at) + (hex[at] === '0' ? '1' : '0') + hex.slice(at + 1);
    expect(sameDigest(d, flip(d, 0))).toBe(false);
    expect(sameDigest(d, flip(d, d.length - 1))).toBe(false);
    expect(sameDigest(d, d.slice(0, -2))).toBe(false);
  });
});
