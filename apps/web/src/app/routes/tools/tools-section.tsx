import { Outlet } from 'react-router-dom';
import { SectionNav } from '../../../components/layouts/section-nav';
import { toolsNavigation } from '../../../config/paths';

/** The Tools pages (access keys, isotope calculator, API for tools), open to every signed-in role. */
export function ToolsSection() {
  return (
    <>
      <SectionNav label="Tools" screens={toolsNavigation} />
      <Outlet />
    </>
  );
}
