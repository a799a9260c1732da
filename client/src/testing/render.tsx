import type { ReactElement } from 'react';
import { render } from '@testing-library/react';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { I18nextProvider } from 'react-i18next';
import { createMemoryRouter } from 'react-router';
import { RouterProvider } from 'react-router/dom';
import { i18n } from '@/lib/i18n';
import { createQueryClient } from '@/lib/query-client';

// A component with the providers it needs and a router (for links), without the app's routes.
export function renderWithProviders(
  ui: ReactElement,
  { queryClient = createQueryClient(), path = '/' }: { queryClient?: QueryClient; path?: string } = {},
) {
  const router = createMemoryRouter([{ path: '*', element: ui }], { initialEntries: [path] });
  const result = render(
    <QueryClientProvider client={queryClient}>
      <I18nextProvider i18n={i18n}>
        <RouterProvider router={router} />
      </I18nextProvider>
    </QueryClientProvider>,
  );
  return { ...result, queryClient, router };
}
