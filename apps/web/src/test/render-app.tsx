import { render } from '@testing-library/react';
import { RouterProvider, createMemoryRouter } from 'react-router-dom';
import { AppProviders } from '../app/AppProviders';
import { createQueryClient } from '../app/create-query-client';
import { appRoutes } from '../app/routes';
import { createApiClient } from '../lib/api-client';
import type { Me } from '../lib/contract/me-schema';
import { sessionBody } from './demo-users';
import { createFetchMock, errorResponse, jsonResponse, type FetchMock } from './fetch-mock';

export interface RenderAppOptions {
  path: string;
  /** Signed in through the refresh cookie on load; null means no session. */
  user: Me | null;
  fetchMock?: FetchMock;
}

/** The whole app (providers, routes, guards) at `path`, talking to a mocked API. */
export function renderApp({ path, user, fetchMock = createFetchMock() }: RenderAppOptions) {
  fetchMock.fallback('POST', '/api/auth/refresh', () =>
    user ? jsonResponse(200, sessionBody(user)) : errorResponse(401, 'unauthorized', 'No session.'),
  );
  const apiClient = createApiClient({ fetchFn: fetchMock.fetchFn });
  const queryClient = createQueryClient();
  queryClient.setDefaultOptions({ queries: { ...queryClient.getDefaultOptions().queries, retry: false } });
  const router = createMemoryRouter(appRoutes, { initialEntries: [path] });
  const utils = render(
    <AppProviders apiClient={apiClient} queryClient={queryClient} initialScheme="light">
      <RouterProvider router={router} />
    </AppProviders>,
  );
  return { ...utils, router, apiClient, fetchMock, queryClient };
}
