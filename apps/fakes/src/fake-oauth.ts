import { createHash, randomBytes } from 'node:crypto';
import type { Server } from 'node:http';
import express from 'express';
import { z } from 'zod';
import { DEMO_IDENTITIES } from './demo-identities';
import type { CapturedMail } from './fake-smtp';

interface Identity {
  id: number;
  login: string;
  name: string;
  email: string;
}

export interface FakeOAuth {
  url: string;
  port: number;
  close(): Promise<void>;
}

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);

/** A stable numeric id for a typed login, as the hosted service gives every account one. */
const idForLogin = (login: string) => 800000 + (parseInt(createHash('sha256').update(login).digest('hex').slice(0, 6), 16) % 100000);

const AuthorizeQuery = z.object({
  client_id: z.string().min(1),
  redirect_uri: z.url(),
  state: z.string().optional(),
  scope: z.string().optional(),
});

const AuthorizeForm = AuthorizeQuery.extend({
  login: z.string().trim().regex(/^[a-z0-9][a-z0-9.-]{1,38}$/i, 'letters, digits, dots and dashes'),
  name: z.string().trim().max(100).optional(),
  email: z.string().trim().max(200).optional(),
});

const TokenForm = z.object({
  client_id: z.string().min(1),
  client_secret: z.string().min(1),
  code: z.string().min(1),
  redirect_uri: z.string().optional(),
});

function page(query: z.infer<typeof AuthorizeQuery>): string {
  const hidden = Object.entries(query)
    .filter(([, v]) => v !== undefined)
    .map(([k, v]) => `<input type="hidden" name="${k}" value="${escapeHtml(String(v))}">`)
    .join('');
  const buttons = DEMO_IDENTITIES.map(
    (p) => `<form method="post" action="/login/oauth/authorize">${hidden}
      <input type="hidden" name="login" value="${p.login}"><input type="hidden" name="name" value="${escapeHtml(p.name)}">
      <input type="hidden" name="email" value="${p.email}">
      <button type="submit" data-login="${p.login}">${escapeHtml(p.name)} <small>${p.login} · demo ${p.demoRole}</small></button></form>`,
  ).join('\n');
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Local stand-in sign-in</title>
<style>body{font:16px/1.5 system-ui,sans-serif;max-width:34rem;margin:3rem auto;padding:0 1rem;color:#222}
button{display:block;width:100%;text-align:left;margin:.4rem 0;padding:.6rem .8rem;border:1px solid #888;background:#fafafa;cursor:pointer}
small{color:#666;margin-left:.5rem}label{display:block;margin:.4rem 0}input[type=text],input[type=email]{width:100%;padding:.3rem}</style></head>
<body><h1>Local stand-in sign-in provider</h1>
<p>This page stands in for the hosted OAuth provider during development and tests. Nothing leaves this machine.
Application <code>${escapeHtml(query.client_id)}</code> asks who you are.</p>
<h2>Demo identities</h2>${buttons}
<h2>Or type one</h2>
<form method="post" action="/login/oauth/authorize">${hidden}
<label>Login <input type="text" name="login" required></label>
<label>Name <input type="text" name="name"></label>
<label>E-mail <input type="email" name="email"></label>
<button type="submit">Continue</button></form></body></html>`;
}

/**
 * A local OAuth 2 provider speaking the same authorization-code flow as the hosted service that
 * passport-github2 expects: an authorize page that redirects back with a code, a token endpoint,
 * and profile and e-mail endpoints. It also exposes the fake SMTP inbox at /_mail.
 */
export async function startFakeOAuth(
  options: { port?: number; host?: string; mailbox?: CapturedMail[] } = {},
): Promise<FakeOAuth> {
  const codes = new Map<string, { identity: Identity; clientId: string; redirectUri: string }>();
  const tokens = new Map<string, Identity>();
  const app = express();
  app.disable('x-powered-by');
  app.use(express.urlencoded({ extended: false }));
  app.use(express.json());

  app.get('/login/oauth/authorize', (req, res) => {
    const q = AuthorizeQuery.safeParse(req.query);
    if (!q.success) {
      res.status(400).type('text').send(`Bad authorize request: ${q.error.issues.map((i) => i.path.join('.')).join(', ')}`);
      return;
    }
    res.type('html').send(page(q.data));
  });

  app.post('/login/oauth/authorize', (req, res) => {
    const f = AuthorizeForm.safeParse(req.body);
    if (!f.success) {
      res.status(400).type('text').send(`Bad sign-in form: ${f.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ')}`);
      return;
    }
    const demo = DEMO_IDENTITIES.find((p) => p.login === f.data.login);
    const identity: Identity = {
      id: demo?.id ?? idForLogin(f.data.login),
      login: f.data.login,
      name: f.data.name || demo?.name || f.data.login,
      email: f.data.email || demo?.email || `${f.data.login}@users.stand-in.example`,
    };
    const code = randomBytes(16).toString('hex');
    codes.set(code, { identity, clientId: f.data.client_id, redirectUri: f.data.redirect_uri });
    const back = new URL(f.data.redirect_uri);
    back.searchParams.set('code', code);
    if (f.data.state) back.searchParams.set('state', f.data.state);
    res.redirect(302, back.toString());
  });

  app.post('/login/oauth/access_token', (req, res) => {
    const f = TokenForm.safeParse(req.body);
    const grant = f.success ? codes.get(f.data.code) : undefined;
    if (!f.success || !grant || grant.clientId !== f.data.client_id) {
      res.status(400).json({ error: 'bad_verification_code', error_description: 'The code passed is incorrect or expired.' });
      return;
    }
    codes.delete(f.data.code);
    const token = randomBytes(20).toString('hex');
    tokens.set(token, grant.identity);
    res.json({ access_token: token, token_type: 'bearer', scope: 'user:email' });
  });

  const bearer = (header: string | undefined) => header?.replace(/^(token|bearer)\s+/i, '') ?? '';

  app.get('/api/user', (req, res) => {
    const identity = tokens.get(bearer(req.headers.authorization));
    if (!identity) {
      res.status(401).json({ message: 'Bad credentials' });
      return;
    }
    res.json({
      id: identity.id,
      login: identity.login,
      name: identity.name,
      email: identity.email,
      html_url: `${url}/${identity.login}`,
      avatar_url: null,
    });
  });

  app.get('/api/user/emails', (req, res) => {
    const identity = tokens.get(bearer(req.headers.authorization));
    if (!identity) {
      res.status(401).json({ message: 'Bad credentials' });
      return;
    }
    res.json([{ email: identity.email, primary: true, verified: true, visibility: 'private' }]);
  });

  app.get('/_mail', (_req, res) => {
    res.json({ messages: options.mailbox ?? [] });
  });
  app.delete('/_mail', (_req, res) => {
    options.mailbox?.splice(0);
    res.status(204).end();
  });

  const host = options.host ?? '127.0.0.1';
  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(options.port ?? 0, host, (err?: Error) => (err ? reject(err) : resolve(s)));
  });
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : 0;
  const url = `http://${host}:${port}`;
  return {
    url,
    port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
