import { Link } from 'react-router-dom';
import type { Role } from '../../lib/roles';
import { paths } from '../../config/paths';
import { buttonClasses } from '../ui/button';

type NotAllowedProps = {
  /** The lowest role the page needs. */
  required: Role;
  /** The signed-in person's role, when known. */
  role?: Role | undefined;
};

/** Shown instead of a page the signed-in role may not use. */
export function NotAllowed({ required, role }: NotAllowedProps) {
  return (
    <section aria-labelledby="not-allowed-title" className="max-w-2xl py-6">
      <p className="text-sm font-bold uppercase tracking-wider text-copper">Not allowed for your role</p>
      <h1 id="not-allowed-title" className="mt-2 text-2xl font-bold text-ink">
        This page is not available to you
      </h1>
      <p className="mt-2 leading-relaxed text-ink-soft">
        It needs the <strong className="text-ink">{required}</strong> role
        {role ? (
          <>
            ; you are signed in as a <strong className="text-ink">{role}</strong>
          </>
        ) : null}
        . An admin can change roles if your work needs this page.
      </p>
      <Link to={paths.identify.path} className={buttonClasses('secondary', 'mt-5')}>
        Go to Identify
      </Link>
    </section>
  );
}
