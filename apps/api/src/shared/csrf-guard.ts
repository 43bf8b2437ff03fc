import type { RequestHandler } from 'express';
import { AppError } from './app-error';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Cookie-authenticated writes must carry `X-Requested-With: ionfolio`. A cross-site form cannot set
 * that header, and a cross-site fetch that sets it needs a CORS preflight this API never grants.
 * Requests authenticated with an access key (set by the access-key middleware, which runs first)
 * carry no cookie to abuse, so they need no such header.
 */
export const csrfGuard: RequestHandler = (req, _res, next) => {
  if (req.accessKey || SAFE.has(req.method) || req.get('x-requested-with') === 'ionfolio') {
    next();
    return;
  }
  next(new AppError('CSRF', 403, 'Writes from the browser need the header X-Requested-With: ionfolio'));
};
