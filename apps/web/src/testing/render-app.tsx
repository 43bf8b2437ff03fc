import { render } from '@testing-library/react';
import { RouterProvider, createMemoryRouter } from 'react-router-dom';
import { onTestFinished } from 'vitest';
import { AppProvider } from '../app/provider';
import { redirectToSignInOn401, routes } from '../app/router';
import { createQueryClient } from '../lib/query-client';

/** Renders the whole app at `url` with the real routes and providers, in memory. */
export function renderApp(url: string) {
  const queryClient = createQueryClient({ retryDelayMs: 0 });
  const router = createMemoryRouter(routes, { initialEntries: [url] });
  const disconnect = redirectToSignInOn401(router);
  onTestFinished(() => {
    disconnect();
    router.dispose();
    queryClient.clear();
  });
  const view = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...view, router, queryClient };
}
