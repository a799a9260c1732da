import { useEffect, useState } from 'react';
import { createBrowserRouter } from 'react-router';
import { RouterProvider } from 'react-router/dom';
import { createQueryClient } from '@/lib/query-client';
import { AppProvider } from './provider';
import { createAppRoutes } from './router';
import { handleSessionExpiry } from './session-expiry';

export function App() {
  const [queryClient] = useState(createQueryClient);
  const [router] = useState(() => createBrowserRouter(createAppRoutes(queryClient)));
  useEffect(() => handleSessionExpiry(router, queryClient), [router, queryClient]);
  return (
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>
  );
}
