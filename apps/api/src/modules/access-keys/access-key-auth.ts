import type { RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import { AppError } from '../../shared/app-error';
import { authenticateAccessKey } from './access-keys.service';

const BEARER = /^Bearer\s+(\S+)\s*$/i;

/**
 * `Authorization: Bearer ifk_…` makes the request act as the key's owner, limited to the key's
 * scopes (requireRole enforces them). A present but malformed, unknown or revoked key is a 401:
 * never a silent fall-back to the session cookie. Without the header, nothing happens here.
 */
export function accessKeyAuth(ds: DataSource): RequestHandler {
  return async (req, res, next) => {
    const header = req.get('authorization');
    if (header === undefined) {
      next();
      return;
    }
    res.set('WWW-Authenticate', 'Bearer realm="ionfolio"');
    const match = BEARER.exec(header);
    if (!match) throw new AppError('UNAUTHENTICATED', 401, 'The Authorization header must be "Bearer <access key>"');
    const found = await authenticateAccessKey(ds, match[1]!);
    if (!found) throw new AppError('INVALID_ACCESS_KEY', 401, 'The access key is unknown or was revoked');
    req.user = found.user;
    req.accessKey = found.key;
    next();
  };
}
