import { Router, type RequestHandler } from 'express';
import type { PassportStatic } from 'passport';
import { csrfGuard } from '../../shared/csrf-guard';

declare module 'express-session' {
  interface SessionData {
    returnTo?: string;
  }
}

/** Only same-site paths: never an absolute or protocol-relative URL (open redirect). */
export function safeReturnTo(value: unknown): string {
  if (typeof value !== 'string' || !value.startsWith('/') || value.startsWith('//') || value.includes('\\')) {
    return '/';
  }
  return value;
}

/** `signInLimit` guards the start of sign-in and its callback (per client address). */
export function authRoutes(passport: PassportStatic, options: { localStandIn: boolean; signInLimit?: RequestHandler }): Router {
  const r = Router();
  const limit: RequestHandler = options.signInLimit ?? ((_req, _res, next) => next());

  r.get('/api/auth/config', (_req, res) => {
    res.json({ provider: 'github', localStandIn: options.localStandIn });
  });

  r.get('/auth/github', limit, (req, res, next) => {
    req.session.returnTo = safeReturnTo(req.query.returnTo);
    req.session.save((err) => {
      if (err) return next(err);
      passport.authenticate('github')(req, res, next);
    });
  });

  r.get('/auth/github/callback', limit, (req, res, next) => {
    const returnTo = safeReturnTo(req.session.returnTo);
    passport.authenticate('github', (err: unknown, user: Express.User | false) => {
      if (err) {
        req.log.warn({ err }, 'sign-in failed at the provider');
        res.redirect('/sign-in?error=provider');
        return;
      }
      if (!user) {
        res.redirect('/sign-in?error=denied');
        return;
      }
      req.logIn(user, (loginErr) => {
        if (loginErr) return next(loginErr);
        res.redirect(returnTo);
      });
    })(req, res, next);
  });

  r.post('/auth/sign-out', csrfGuard, (req, res, next) => {
    req.logout((err) => {
      if (err) return next(err);
      req.session.destroy((destroyErr) => {
        if (destroyErr) return next(destroyErr);
        res.clearCookie('ionfolio.sid');
        res.status(204).end();
      });
    });
  });

  return r;
}
