import { render, screen, type RenderOptions } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactElement } from 'react';
import { createMemoryRouter, MemoryRouter, Route, RouterProvider, Routes } from 'react-router-dom';
import { AppProvider } from '@/app/provider';
import { createAppRoutes } from '@/app/router';
import { createQueryClient } from '@/lib/query-client';

function createTestQueryClient() {
  const client = createQueryClient();
  client.setDefaultOptions({
    queries: { ...client.getDefaultOptions().queries, retry: false, staleTime: Infinity },
    mutations: { retry: false },
  });
  return client;
}

type ProviderOptions = {
  /** The URL the memory router starts at. */
  route?: string;
  /** A route pattern for `ui`, so it can read params such as `:token`. */
  path?: string;
} & Omit<RenderOptions, 'wrapper'>;

/** Renders one component inside Mantine, a fresh QueryClient and a MemoryRouter. */
export function renderWithProviders(
  ui: ReactElement,
  { route = '/', path, ...options }: ProviderOptions = {},
) {
  const queryClient = createTestQueryClient();
  const user = userEvent.setup();
  const result = render(
    <AppProvider queryClient={queryClient} env="test">
      <MemoryRouter initialEntries={[route]}>
        {path ? (
          <Routes>
            <Route path={path} element={ui} />
            <Route path="*" element={<div data-testid="elsewhere" />} />
          </Routes>
        ) : (
          ui
        )}
      </MemoryRouter>
    </AppProvider>,
    options,
  );
  return { ...result, user, queryClient };
}

/** Renders the real route tree at `route`, as the browser would after a page load. */
export function renderApp(route: string) {
  const queryClient = createTestQueryClient();
  const router = createMemoryRouter(createAppRoutes(), { initialEntries: [route] });
  const user = userEvent.setup();
  const result = render(
    <AppProvider queryClient={queryClient} env="test">
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...result, user, router, queryClient };
}

export { screen };
