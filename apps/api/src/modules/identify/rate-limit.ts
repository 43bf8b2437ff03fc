import type { RequestHandler } from 'express';
import { AppError } from '../../shared/app-error';

interface Bucket {
  tokens: number;
  updatedMs: number;
}

/** Idle callers whose bucket has refilled are forgotten once this many are tracked. */
const MAX_TRACKED = 10_000;

/**
 * A token bucket per caller (per access key, else per session), refilled at `perMinute` tokens a
 * minute up to `burst`. It lives in this process only: with N API processes behind a balancer a caller
 * may get up to N times the rate. Over the limit: 429 with Retry-After (whole seconds).
 */
export function rateLimit(options: { perMinute: number; burst?: number | undefined; now?: () => number }): RequestHandler {
  const { perMinute } = options;
  const burst = options.burst ?? perMinute;
  const now = options.now ?? Date.now;
  const perMs = perMinute / 60_000;
  const buckets = new Map<string, Bucket>();

  function forgetIdle(at: number): void {
    for (const [key, b] of buckets) {
      if (b.tokens + (at - b.updatedMs) * perMs >= burst) buckets.delete(key);
    }
  }

  return (req, res, next) => {
    const caller = req.accessKey ? `key:${req.accessKey.id}` : `session:${req.sessionID ?? req.user?.id ?? req.ip}`;
    const at = now();
    if (buckets.size >= MAX_TRACKED) forgetIdle(at);
    const b = buckets.get(caller) ?? { tokens: burst, updatedMs: at };
    b.tokens = Math.min(burst, b.tokens + (at - b.updatedMs) * perMs);
    b.updatedMs = at;
    buckets.set(caller, b);
    if (b.tokens < 1) {
      const retryAfterS = Math.max(1, Math.ceil((1 - b.tokens) / perMs / 1000));
      res.set('Retry-After', String(retryAfterS));
      next(
        new AppError('RATE_LIMITED', 429, `Too many identify calls: at most ${perMinute} a minute; retry in ${retryAfterS} s`, {
          details: { retryAfterSeconds: retryAfterS, perMinute, burst },
        }),
      );
      return;
    }
    b.tokens -= 1;
    next();
  };
}
