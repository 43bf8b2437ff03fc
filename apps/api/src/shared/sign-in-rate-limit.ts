import type { RequestHandler } from 'express';
import { AppError } from './app-error';

interface Window {
  count: number;
  startedMs: number;
}

const WINDOW_MS = 60_000;
/** Past this many tracked addresses, windows that have ended are dropped. */
const MAX_TRACKED = 10_000;

/**
 * At most `perMinute` sign-in requests (the start and the callback both count) per client address
 * in a fixed one-minute window, per API process. Over it: 429 with Retry-After, the seconds left in
 * the window. The address is `req.ip`, which honours X-Forwarded-For only from a trusted proxy.
 */
export function signInRateLimit(options: { perMinute: number; now?: () => number }): RequestHandler {
  const { perMinute } = options;
  const now = options.now ?? Date.now;
  const windows = new Map<string, Window>();

  return (req, res, next) => {
    const at = now();
    if (windows.size >= MAX_TRACKED) {
      for (const [ip, w] of windows) if (at - w.startedMs >= WINDOW_MS) windows.delete(ip);
    }
    const ip = req.ip ?? 'unknown';
    let w = windows.get(ip);
    if (!w || at - w.startedMs >= WINDOW_MS) {
      w = { count: 0, startedMs: at };
      windows.set(ip, w);
    }
    w.count += 1;
    if (w.count > perMinute) {
      const retryAfterS = Math.max(1, Math.ceil((w.startedMs + WINDOW_MS - at) / 1000));
      res.set('Retry-After', String(retryAfterS));
      next(
        new AppError('RATE_LIMITED', 429, `Too many sign-in attempts from this address: at most ${perMinute} a minute; retry in ${retryAfterS} s`, {
          details: { retryAfterSeconds: retryAfterS, perMinute },
        }),
      );
      return;
    }
    next();
  };
}
