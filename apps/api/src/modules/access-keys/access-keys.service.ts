import type { DataSource } from 'typeorm';
import { AppError, notFound } from '../../shared/app-error';
import { roleAtLeast } from '../../shared/require-role';
import { recordAudit } from '../audit/audit.service';
import type { SessionUser } from '../users/users.schemas';
import type { Role } from '../users/user.entity';
import { READ_SCOPES, type AccessKeyScope, type RequestAccessKey } from './access-key-scopes';
import { hashAccessKey, looksLikeAccessKey, newAccessKeySecret, sameDigest, visiblePrefix } from './access-key-secret';
import type { AccessKeyView, CreateAccessKeyInput } from './access-keys.schemas';

interface KeyRow {
  id: string;
  name: string;
  prefix: string;
  scopes: AccessKeyScope[];
  ownerId: string;
  ownerLogin: string;
  ownerDisplayName: string;
  createdAt: Date;
  lastUsedAt: Date | null;
  revokedAt: Date | null;
}

const SELECT_KEYS = `
  SELECT k.id, k.name, k.prefix, k.scopes, k.owner_id AS "ownerId", u.login AS "ownerLogin",
         u.display_name AS "ownerDisplayName", k.created_at AS "createdAt", k.last_used_at AS "lastUsedAt",
         k.revoked_at AS "revokedAt"
  FROM access_keys k JOIN users u ON u.id = k.owner_id`;

function toView(row: KeyRow): AccessKeyView {
  return {
    id: row.id,
    name: row.name,
    prefix: row.prefix,
    scopes: row.scopes,
    owner: { id: row.ownerId, login: row.ownerLogin, displayName: row.ownerDisplayName },
    createdAt: row.createdAt.toISOString(),
    lastUsedAt: row.lastUsedAt?.toISOString() ?? null,
    revokedAt: row.revokedAt?.toISOString() ?? null,
  };
}

async function keyById(ds: DataSource, id: string): Promise<KeyRow | undefined> {
  const rows: KeyRow[] = await ds.query(`${SELECT_KEYS} WHERE k.id = $1`, [id]);
  return rows[0];
}

/**
 * Creates a key for `user`. The secret is returned once and never stored: only its SHA-256 hash and
 * a short prefix are kept. Readers may create read scopes only; `submit` needs a contributor.
 */
export async function createAccessKey(
  ds: DataSource,
  user: SessionUser,
  input: CreateAccessKeyInput,
): Promise<{ key: AccessKeyView; secret: string }> {
  const beyondRole = input.scopes.filter((s) => !READ_SCOPES.includes(s));
  if (beyondRole.length > 0 && !roleAtLeast(user.role, 'contributor')) {
    throw new AppError('SCOPE_NOT_ALLOWED', 403, `The ${beyondRole.join(', ')} scope needs the contributor role; you are ${user.role}`, {
      details: [{ path: 'scopes', message: `not allowed for a ${user.role}: ${beyondRole.join(', ')}` }],
    });
  }
  const secret = newAccessKeySecret();
  const id = await ds.transaction(async (m) => {
    const rows: { id: string }[] = await m.query(
      `INSERT INTO access_keys (owner_id, name, prefix, secret_sha256, scopes) VALUES ($1, $2, $3, $4, $5) RETURNING id`,
      [user.id, input.name, visiblePrefix(secret), hashAccessKey(secret), JSON.stringify(input.scopes)],
    );
    const keyId = rows[0]!.id;
    await recordAudit(m, {
      actorId: user.id,
      action: 'access_key.created',
      subjectType: 'access_key',
      subjectId: keyId,
      data: { name: input.name, scopes: input.scopes, prefix: visiblePrefix(secret) },
    });
    return keyId;
  });
  return { key: toView((await keyById(ds, id))!), secret };
}

/** The caller's keys, newest first; with `all`, every user's keys (admins only). */
export async function listAccessKeys(ds: DataSource, user: SessionUser, all: boolean): Promise<AccessKeyView[]> {
  if (all && !roleAtLeast(user.role, 'admin')) {
    throw new AppError('FORBIDDEN', 403, 'Only admins may list every access key');
  }
  const rows: KeyRow[] = all
    ? await ds.query(`${SELECT_KEYS} ORDER BY k.created_at DESC`)
    : await ds.query(`${SELECT_KEYS} WHERE k.owner_id = $1 ORDER BY k.created_at DESC`, [user.id]);
  return rows.map(toView);
}

/** Revokes a key (its owner or an admin). Revoking a revoked key changes nothing and answers the key. */
export async function revokeAccessKey(ds: DataSource, user: SessionUser, id: string): Promise<AccessKeyView> {
  const row = await keyById(ds, id);
  if (!row || (row.ownerId !== user.id && !roleAtLeast(user.role, 'admin'))) throw notFound(`Access key ${id}`);
  if (!row.revokedAt) {
    await ds.transaction(async (m) => {
      await m.query(`UPDATE access_keys SET revoked_at = now() WHERE id = $1 AND revoked_at IS NULL`, [id]);
      await recordAudit(m, {
        actorId: user.id,
        action: 'access_key.revoked',
        subjectType: 'access_key',
        subjectId: id,
        data: { name: row.name, prefix: row.prefix, ownerId: row.ownerId },
      });
    });
  }
  return toView((await keyById(ds, id))!);
}

/**
 * The key and its owner for a presented secret, or null when it is malformed, unknown or revoked.
 * The row is found by its visible prefix and the hashes compared in constant time. Last use is
 * recorded at most once a minute per key, so that busy tools do not write on every call.
 */
/** When this process last recorded each key's use (ms since the epoch). */
const lastRecorded = new Map<string, number>();

export async function authenticateAccessKey(
  ds: DataSource,
  secret: string,
): Promise<{ key: RequestAccessKey; user: SessionUser } | null> {
  if (!looksLikeAccessKey(secret)) return null;
  const rows: {
    id: string;
    secretSha256: string;
    scopes: AccessKeyScope[];
    userId: string;
    login: string;
    displayName: string;
    email: string | null;
    role: Role;
  }[] = await ds.query(
    `SELECT k.id, k.secret_sha256 AS "secretSha256", k.scopes, u.id AS "userId", u.login,
            u.display_name AS "displayName", u.email, u.role
     FROM access_keys k JOIN users u ON u.id = k.owner_id
     WHERE k.prefix = $1 AND k.revoked_at IS NULL`,
    [visiblePrefix(secret)],
  );
  const digest = hashAccessKey(secret);
  const row = rows.find((r) => sameDigest(r.secretSha256, digest));
  if (!row) return null;
  // The database keeps the once-a-minute rule; this process also skips the statement for a key it
  // recorded less than a minute ago, so a busy tool costs one query per call instead of two.
  const now = Date.now();
  if (now - (lastRecorded.get(row.id) ?? -Infinity) >= 60_000) {
    await ds.query(
      `UPDATE access_keys SET last_used_at = now() WHERE id = $1 AND (last_used_at IS NULL OR last_used_at < now() - interval '1 minute')`,
      [row.id],
    );
    if (lastRecorded.size > 10_000) lastRecorded.clear();
    lastRecorded.set(row.id, now);
  }
  return {
    key: { id: row.id, scopes: row.scopes },
    user: { id: row.userId, login: row.login, displayName: row.displayName, email: row.email, role: row.role },
  };
}
