import { QueryClient } from '@tanstack/react-query';
import { render, type RenderResult } from '@testing-library/react';
import type { ReactElement } from 'react';
import { MemoryRouter, useLocation } from 'react-router-dom';
import { AppProvider } from '@/app/provider';

export function createTestQueryClient(): QueryClient {
  return new QueryClient({ defaultOptions: { queries: { retry: false, staleTime: Infinity }, mutations: { retry: false } } });
}

/** Shows the current URL so tests can assert on search params. */
export function LocationProbe() {
  const location = useLocation();
  return <output data-testid="location">{location.pathname + location.search}</output>;
}

export type RenderWithAppOptions = { route?: string; queryClient?: QueryClient };

export function renderWithApp(ui: ReactElement, { route = '/', queryClient = createTestQueryClient() }: RenderWithAppOptions = {}): RenderResult & { queryClient: QueryClient } {
  const result = render(
    <AppProvider queryClient={queryClient}>
      <MemoryRouter initialEntries={[route]}>
        {ui}
        <LocationProbe />
      </MemoryRouter>
    </AppProvider>,
  );
  return { ...result, queryClient };
}
