import type { ReactNode } from 'react';
import { Link, NavLink } from 'react-router-dom';
import type { Screen } from '../../config/paths';
import { paths } from '../../config/paths';
import type { Role } from '../../lib/roles';
import { Button } from '../ui/button';
import { ThemeToggle } from '../ui/theme-toggle';
import { Wordmark } from '../ui/wordmark';

type AppLayoutProps = {
  person: { displayName: string; role: Role };
  /** The screens this person may open, in header order. */
  navigation: readonly Screen[];
  onSignOut: () => void;
  signingOut: boolean;
  signOutError: string | null;
  children: ReactNode;
};

function navLinkClasses({ isActive }: { isActive: boolean }): string {
  const base = 'inline-block whitespace-nowrap rounded-md px-3 py-1.5 transition-colors hover:bg-paper-sunk';
  return isActive
    ? `${base} text-ink underline decoration-copper decoration-2 underline-offset-[7px]`
    : `${base} text-ink-soft hover:text-ink`;
}

/** The signed-in frame: header with wordmark, navigation, who is signed in, and the page below. */
export function AppLayout({ person, navigation, onSignOut, signingOut, signOutError, children }: AppLayoutProps) {
  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-4 focus:top-3 focus:z-10 focus:rounded-md focus:bg-paper-raised focus:px-3 focus:py-2"
      >
        Skip to content
      </a>
      <header className="border-b border-rule bg-paper-raised">
        <div className="mx-auto flex max-w-page flex-wrap items-center gap-x-6 gap-y-2 px-6 py-3">
          <Link to={paths.identify.path} className="rounded-md" aria-label="Ionfolio, go to Identify">
            <Wordmark />
          </Link>
          <nav aria-label="Main" className="order-last -mx-3 w-full overflow-x-auto lg:order-none lg:mx-0 lg:w-auto lg:flex-1">
            <ul className="flex items-center gap-1 p-1">
              {navigation.map((screen) => (
                <li key={screen.path}>
                  <NavLink
                    to={screen.path}
                    className={navLinkClasses}
                    end={screen.path === paths.identify.path}
                  >
                    {screen.label}
                  </NavLink>
                </li>
              ))}
            </ul>
          </nav>
          <div className="ml-auto flex items-center gap-2 text-sm">
            <p className="text-ink" data-testid="current-person">
              <span className="font-bold">{person.displayName}</span>
              <span className="text-ink-soft" aria-hidden="true">
                {' · '}
              </span>
              <span className="sr-only">, role </span>
              <span
                data-testid="current-role"
                className="rounded border border-rule-faint bg-paper px-1.5 py-0.5 text-xs font-bold tracking-wide text-ink-soft"
              >
                {person.role}
              </span>
            </p>
            <ThemeToggle />
            <Button variant="secondary" onClick={onSignOut} disabled={signingOut}>
              {signingOut ? 'Signing out…' : 'Sign out'}
            </Button>
          </div>
        </div>
        {signOutError ? (
          <p role="alert" className="mx-auto max-w-page px-6 pb-3 text-sm text-copper">
            Sign-out failed: {signOutError}
          </p>
        ) : null}
      </header>
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-page flex-1 px-6 py-8 focus:outline-none">
        {children}
      </main>
      <footer className="border-t border-rule-faint">
        <p className="mx-auto max-w-page px-6 py-3 text-xs text-ink-soft">
          Ionfolio · the laboratory&rsquo;s reviewed library of 70 eV EI mass spectra
        </p>
      </footer>
    </div>
  );
}
