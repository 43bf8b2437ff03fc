import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { isApiError } from '../../lib/api-error';
import { ErrorNotice } from './error-notice';
import { NotFound } from './not-found';

/** The error element of every route: what failed on this page, and a reload to try again. */
export function RouteError() {
  const error = useRouteError();
  if ((isRouteErrorResponse(error) && error.status === 404) || (isApiError(error) && error.status === 404)) {
    return <NotFound />;
  }
  return (
    <section className="mx-auto max-w-2xl px-6 py-10">
      <ErrorNotice
        title="This page could not be shown"
        error={isRouteErrorResponse(error) ? new Error(`${error.status} ${error.statusText}`) : error}
        onRetry={() => window.location.reload()}
      />
    </section>
  );
}
