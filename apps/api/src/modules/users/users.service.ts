import type { DataSource } from 'typeorm';
import { AppError, notFound } from '../../shared/app-error';
import { recordAudit } from '../audit/audit.service';
import { queueMail } from '../mail/mail.service';
import type { Role, UserRow } from './user.entity';
import { usersRepository } from './users.repository';
import type { SessionUser, UserView } from './users.schemas';

export const toSessionUser = (u: UserRow): SessionUser => ({
  id: u.id,
  login: u.login,
  displayName: u.displayName,
  email: u.email,
  role: u.role,
});

const toView = (u: UserRow): UserView => ({
  ...toSessionUser(u),
  createdAt: u.createdAt.toISOString(),
  lastSignInAt: u.lastSignInAt ? u.lastSignInAt.toISOString() : null,
});

export interface ProviderProfile {
  providerId: string;
  login: string;
  displayName: string | null;
  email: string | null;
}

/**
 * Finds or creates the user behind a provider profile and records the sign-in. A new user is a
 * reader, except the configured first admin.
 */
export async function signInFromProfile(
  ds: DataSource,
  profile: ProviderProfile,
  firstAdminLogin: string | undefined,
): Promise<SessionUser> {
  return ds.transaction(async (m) => {
    const repo = usersRepository(m);
    const now = new Date();
    const existing = await repo.findOne({ where: { githubId: profile.providerId }, lock: { mode: 'pessimistic_write' } });
    if (existing) {
      existing.lastSignInAt = now;
      existing.displayName = profile.displayName || existing.displayName;
      existing.email = profile.email ?? existing.email;
      await repo.save(existing);
      return toSessionUser(existing);
    }
    const role: Role = firstAdminLogin && profile.login === firstAdminLogin ? 'admin' : 'reader';
    const created = await repo.save(
      repo.create({
        githubId: profile.providerId,
        login: profile.login,
        displayName: profile.displayName || profile.login,
        email: profile.email,
        role,
        lastSignInAt: now,
      }),
    );
    await recordAudit(m, { actorId: created.id, action: 'user.created', subjectType: 'user', subjectId: created.id, data: { login: created.login, role } });
    return toSessionUser(created);
  });
}

export async function findSessionUser(ds: DataSource, id: string): Promise<SessionUser | null> {
  const u = await usersRepository(ds.manager).findOneBy({ id });
  return u ? toSessionUser(u) : null;
}

export async function listUsers(ds: DataSource): Promise<UserView[]> {
  const rows = await usersRepository(ds.manager).find({ order: { createdAt: 'ASC', login: 'ASC' } });
  return rows.map(toView);
}

/**
 * Changes a user's role, refusing to demote the last admin. The audit line and the notification
 * mail are written in the same transaction as the change.
 */
export async function changeRole(ds: DataSource, actor: SessionUser, userId: string, role: Role): Promise<UserView> {
  return ds.transaction(async (m) => {
    const repo = usersRepository(m);
    // Lock the admins too, so two admins demoting each other at once cannot leave none.
    await m.query(`SELECT id FROM users WHERE role = 'admin' FOR UPDATE`);
    const user = await repo.findOne({ where: { id: userId }, lock: { mode: 'pessimistic_write' } });
    if (!user) throw notFound(`User ${userId}`);
    if (user.role === role) return toView(user);
    if (user.role === 'admin') {
      const admins = await repo.countBy({ role: 'admin' });
      if (admins <= 1) throw new AppError('LAST_ADMIN', 409, `${user.login} is the last admin; make someone else admin first`);
    }
    const before = user.role;
    user.role = role;
    await repo.save(user);
    await recordAudit(m, { actorId: actor.id, action: 'user.role_changed', subjectType: 'user', subjectId: user.id, data: { login: user.login, from: before, to: role } });
    if (user.email) {
      await queueMail(m, {
        to: user.email,
        subject: `Ionfolio: your role is now ${role}`,
        text: `Hello ${user.displayName},\n\n${actor.displayName} changed your Ionfolio role from ${before} to ${role}.\n`,
      });
    }
    return toView(user);
  });
}
