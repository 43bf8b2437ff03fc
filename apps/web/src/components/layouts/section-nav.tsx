import { NavLink } from 'react-router-dom';
import type { Screen } from '../../config/paths';

type SectionNavProps = {
  label: string;
  screens: readonly Screen[];
};

/** The tabs between the pages of one section (the admin pages). */
export function SectionNav({ label, screens }: SectionNavProps) {
  return (
    <nav aria-label={label} className="mb-6 overflow-x-auto border-b border-rule-faint">
      <ul className="flex gap-1 px-1 pt-1">
        {screens.map((screen) => (
          <li key={screen.path}>
            <NavLink
              to={screen.path}
              className={({ isActive }) =>
                `-mb-px inline-block whitespace-nowrap border-b-2 px-3 py-2 text-sm ${
                  isActive ? 'border-copper font-bold text-ink' : 'border-transparent text-ink-soft hover:text-ink'
                }`
              }
            >
              {screen.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
