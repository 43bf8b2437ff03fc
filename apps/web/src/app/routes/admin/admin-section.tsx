import { Outlet } from 'react-router-dom';
import { SectionNav } from '../../../components/layouts/section-nav';
import { adminNavigation } from '../../../config/paths';

export function AdminSection() {
  return (
    <>
      <SectionNav label="Admin" screens={adminNavigation} />
      <Outlet />
    </>
  );
}
