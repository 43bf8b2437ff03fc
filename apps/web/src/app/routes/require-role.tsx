import { Outlet } from 'react-router-dom';
import { NotAllowed } from '../../components/errors/not-allowed';
import { useMe } from '../../features/auth/api/get-me';
import { hasRole, type Role } from '../../lib/roles';

/** A layout route: its child pages open only for `role` and above; everyone else sees why not. */
export function RequireRole({ role }: { role: Role }) {
  const me = useMe();
  // AppRoot renders its outlet only once the person is known.
  if (!me.data) return null;
  if (!hasRole(me.data.role, role)) return <NotAllowed required={role} role={me.data.role} />;
  return <Outlet />;
}
