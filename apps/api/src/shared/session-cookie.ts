import type { CookieOptions } from 'express-session';

/** Twelve hours; `rolling` sessions renew it on every request. */
export const SESSION_MAX_AGE_MS = 12 * 60 * 60 * 1000;

/**
 * The session cookie's flags: never readable from scripts (httpOnly), not sent on cross-site
 * sub-requests or form posts (SameSite=Lax), and Secure whenever the app is served over https.
 */
export function sessionCookieOptions(publicUrl: string): CookieOptions {
  return {
    httpOnly: true,
    sameSite: 'lax',
    secure: new URL(publicUrl).protocol === 'https:',
    maxAge: SESSION_MAX_AGE_MS,
  };
}
