import { Outlet } from 'react-router-dom';
import { SectionNav } from '../../../components/layouts/section-nav';
import { adminNavigation } from '../../../config/paths';
import { useMe } from '../../../features/auth/api/get-me';
import { hasRole } from '../../../lib/roles';

export function AdminSection() {
  const me = useMe();
  // Curators reach the audit log here too; they see only the tabs their role opens.
  const screens = adminNavigation.filter((screen) => me.data && hasRole(me.data.role, screen.minRole));
  return (
    <>
      <SectionNav label="Admin" screens={screens} />
      <Outlet />
    </>
  );
}
