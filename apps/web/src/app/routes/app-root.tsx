import { Navigate, Outlet, useLocation, useNavigate } from 'react-router-dom';
import { ErrorNotice } from '../../components/errors/error-notice';
import { AppLayout } from '../../components/layouts/app-layout';
import { LoadingState } from '../../components/ui/loading-state';
import { mainNavigation, paths, signInHref } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
import { useSignOut } from '../../features/auth/api/sign-out';
import { isUnauthenticated } from '../../lib/api-error';
import { describeError } from '../../lib/describe-error';
import { hasRole } from '../../lib/roles';

/** The frame of every signed-in page: asks who is signed in, then shows the header and the page. */
export function AppRoot() {
  const location = useLocation();
  const navigate = useNavigate();
  const signOut = useSignOut({ onSignedOut: () => navigate(paths.signIn.path, { replace: true }) });
  // Once sign-out is under way, asking who is signed in would only earn a 401.
  const leaving = signOut.isPending || signOut.isSuccess;
  const me = useMe({ enabled: !leaving });

  if (me.isPending) return <LoadingState fullPage label={leaving ? 'Signing out…' : 'Opening Ionfolio…'} />;
  if (me.isError) {
    // The API client normally redirects on 401 already; this covers a render that comes first.
    if (isUnauthenticated(me.error)) {
      return <Navigate to={signInHref(`${location.pathname}${location.search}`)} replace />;
    }
    return (
      <div className="mx-auto max-w-xl px-6 py-20">
        <ErrorNotice title="Ionfolio could not start" error={me.error} onRetry={() => void me.refetch()} />
      </div>
    );
  }

  const navigation = mainNavigation.filter((screen) => hasRole(me.data.role, screen.minRole));
  return (
    <AppLayout
      person={me.data}
      navigation={navigation}
      onSignOut={() => signOut.mutate()}
      signingOut={signOut.isPending}
      signOutError={signOut.isError ? describeError(signOut.error) : null}
    >
      <Outlet />
    </AppLayout>
  );
}
