import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';

const SECRET_PREFIX = 'ifk_';
/** Characters of the key that are stored in clear and shown in lists, `ifk_` included. */
export const VISIBLE_PREFIX_LENGTH = 12;
const SECRET_SHAPE = /^ifk_[A-Za-z0-9_-]{32}$/;

/** A new access key: `ifk_` + 24 random bytes (192 bits) in base64url. */
export function newAccessKeySecret(): string {
  return SECRET_PREFIX + randomBytes(24).toString('base64url');
}

export const looksLikeAccessKey = (text: string): boolean => SECRET_SHAPE.test(text);

export const visiblePrefix = (secret: string): string => secret.slice(0, VISIBLE_PREFIX_LENGTH);

export function hashAccessKey(secret: string): string {
  return createHash('sha256').update(secret, 'utf8').digest('hex');
}

/** Compares two hex digests without leaking, through timing, how many leading characters agree. */
export function sameDigest(a: string, b: string): boolean {
  const x = Buffer.from(a, 'hex');
  const y = Buffer.from(b, 'hex');
  return x.length === y.length && timingSafeEqual(x, y);
}
