import type { ComponentType } from 'react';
import { Navigate, createBrowserRouter, type RouteObject } from 'react-router-dom';
import { NotFound } from '../components/errors/not-found';
import { RouteError } from '../components/errors/route-error';
import { LoadingState } from '../components/ui/loading-state';
import { paths, signInHref } from '../config/paths';
import { setUnauthenticatedHandler } from '../lib/api-client';
import type { Role } from '../lib/roles';
import { AdminSection } from './routes/admin/admin-section';
import { AppRoot } from './routes/app-root';
import { RequireRole } from './routes/require-role';
import { ToolsSection } from './routes/tools/tools-section';

type PageModule = { default: ComponentType };

/** A lazily loaded page (its own chunk) with its own error element. */
function page(path: string, load: () => Promise<PageModule>): RouteObject {
  return {
    path,
    lazy: async () => ({ Component: (await load()).default }),
    errorElement: <RouteError />,
  };
}

function onlyFor(role: Role, children: RouteObject[]): RouteObject {
  return { element: <RequireRole role={role} />, errorElement: <RouteError />, children };
}

/** Every screen of PRODUCT.md; all but sign-in need a session, some a role. */
export const routes: RouteObject[] = [
  {
    errorElement: <RouteError />,
    hydrateFallbackElement: <LoadingState fullPage />,
    children: [
      page(paths.signIn.path, () => import('./routes/auth/sign-in')),
      {
        element: <AppRoot />,
        errorElement: <RouteError />,
        children: [
          { index: true, element: <Navigate to={paths.identify.path} replace /> },
          page(paths.identify.path, () => import('./routes/identify/identify')),
          page(paths.batchIdentify.path, () => import('./routes/identify/batch-identify')),
          page(paths.library.path, () => import('./routes/library/library')),
          page(paths.entry.path, () => import('./routes/entries/entry')),
          page(paths.editions.path, () => import('./routes/editions/editions')),
          page(paths.edition.path, () => import('./routes/editions/edition')),
          page(paths.overview.path, () => import('./routes/overview/overview')),
          onlyFor(paths.submit.minRole, [
            page(paths.submit.path, () => import('./routes/submit/submit')),
            page(paths.submitRevision.path, () => import('./routes/submit/submit-revision')),
          ]),
          onlyFor(paths.review.minRole, [
            page(paths.review.path, () => import('./routes/review/review-desk')),
            page(paths.reviewImport.path, () => import('./routes/review/bulk-import')),
            page(paths.reviewRevision.path, () => import('./routes/review/review-revision')),
          ]),
          onlyFor('admin', [
            {
              path: '/admin',
              element: <AdminSection />,
              errorElement: <RouteError />,
              children: [
                { index: true, element: <Navigate to={paths.adminUsers.path} replace /> },
                page(paths.adminUsers.path, () => import('./routes/admin/users')),
                page(paths.adminKeys.path, () => import('./routes/admin/keys')),
                page(paths.adminOutbox.path, () => import('./routes/admin/outbox')),
              ],
            },
          ]),
          {
            path: paths.tools.path,
            element: <ToolsSection />,
            errorElement: <RouteError />,
            children: [
              { index: true, element: <Navigate to={paths.toolsKeys.path} replace /> },
              page(paths.toolsKeys.path, () => import('./routes/tools/keys')),
              page(paths.toolsIsotopes.path, () => import('./routes/tools/isotopes')),
              page(paths.toolsApi.path, () => import('./routes/tools/api-docs')),
            ],
          },
          // Curators read the audit log too (PRODUCT.md), so it sits outside the admin-only group.
          onlyFor(paths.adminAudit.minRole, [
            {
              path: '/admin',
              element: <AdminSection />,
              errorElement: <RouteError />,
              children: [page(paths.adminAudit.path, () => import('./routes/admin/audit-log'))],
            },
          ]),
          { path: '*', element: <NotFound />, errorElement: <RouteError /> },
        ],
      },
    ],
  },
];

export type AppRouter = ReturnType<typeof createBrowserRouter>;

/**
 * Makes a 401 from any API call a client-side trip to the sign-in page that remembers where the
 * person was. Returns the function that disconnects it again.
 */
export function redirectToSignInOn401(router: AppRouter): () => void {
  return setUnauthenticatedHandler(() => {
    const { pathname, search } = router.state.location;
    if (pathname === paths.signIn.path) return;
    void router.navigate(signInHref(`${pathname}${search}`), { replace: true });
  });
}

export function createAppRouter(): AppRouter {
  const router = createBrowserRouter(routes);
  redirectToSignInOn401(router);
  return router;
}
