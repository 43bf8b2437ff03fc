import type { Role } from '../lib/roles';

/** An invented person, as `GET /api/v1/me` returns them. */
export function makeCurrentUser(overrides: Partial<{ id: string; login: string; displayName: string; email: string | null; role: Role }> = {}) {
  return {
    id: 'u-curator',
    login: 'dokafor',
    displayName: 'Dana Okafor',
    email: 'dana.okafor@example.test',
    role: 'curator' as Role,
    ...overrides,
  };
}

/** An invented person, as the admin users list returns them. */
export function makeManagedUser(
  overrides: Partial<ReturnType<typeof makeCurrentUser> & { createdAt: string; lastSignInAt: string | null }> = {},
) {
  return {
    ...makeCurrentUser(),
    createdAt: '2026-01-12T08:30:00.000Z',
    lastSignInAt: '2026-02-03T14:05:00.000Z',
    ...overrides,
  };
}

/** The fake route for "who is signed in". */
export function meReply(role: Role, overrides: Parameters<typeof makeCurrentUser>[0] = {}) {
  return { status: 200, body: { user: makeCurrentUser({ role, ...overrides }) } };
}
