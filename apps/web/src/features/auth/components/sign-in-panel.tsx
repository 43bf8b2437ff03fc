import { buttonClasses } from '../../../components/ui/button';
import { githubSignInHref } from '../../../config/paths';
import { describeError } from '../../../lib/describe-error';
import { useAuthConfig } from '../api/get-auth-config';
import { signInErrorMessage } from '../utils/sign-in-error-message';

type SignInPanelProps = {
  /** Where to land after signing in (kept only when it is a path on this site). */
  returnTo: string | null;
  /** The `?error=` code a failed sign-in came back with. */
  errorCode: string | null;
};

function ProviderNote() {
  const config = useAuthConfig();
  if (config.isPending) {
    return <p className="text-sm text-ink-soft">Checking how sign-in is set up…</p>;
  }
  if (config.isError) {
    return (
      <p className="text-sm text-ink-soft">
        The sign-in setup could not be read: {describeError(config.error)} The button may still work.
      </p>
    );
  }
  if (!config.data.localStandIn) return null;
  return (
    <p className="rounded-md border border-rule-faint bg-paper-sunk px-3 py-2 text-sm leading-relaxed text-ink">
      This installation signs in through a <strong>local stand-in provider</strong>: it offers demo
      identities (reader, contributor, curator, admin) instead of real GitHub accounts.
    </p>
  );
}

/** The sign-in card: a full-page navigation to the GitHub flow, any error from the last try, and a note on the provider. */
export function SignInPanel({ returnTo, errorCode }: SignInPanelProps) {
  return (
    <div className="flex flex-col gap-5">
      {errorCode ? (
        <p role="alert" className="rounded-md border border-copper/60 bg-copper-soft px-3 py-2 text-sm text-ink">
          {signInErrorMessage(errorCode)}
        </p>
      ) : null}
      <a href={githubSignInHref(returnTo)} className={buttonClasses('primary', 'w-full py-3 text-base')}>
        Sign in with GitHub
      </a>
      <ProviderNote />
    </div>
  );
}
