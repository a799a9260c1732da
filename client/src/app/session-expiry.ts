import type { QueryClient } from '@tanstack/react-query';
import type { createBrowserRouter } from 'react-router';
import { setUnauthorizedHandler } from '@/lib/api-client';
import { SIGN_IN_PATH, signInPath } from '@/lib/sign-in';

export type AppRouter = ReturnType<typeof createBrowserRouter>;

// A 401 on any call but sign-in: go to sign-in, remembering where the user was, then drop the data.
export function handleSessionExpiry(router: AppRouter, queryClient: QueryClient): () => void {
  setUnauthorizedHandler(() => {
    const { pathname, search } = router.state.navigation.location ?? router.state.location;
    if (pathname === SIGN_IN_PATH) return;
    void router.navigate(signInPath(`${pathname}${search}`), { replace: true }).then(() => queryClient.clear());
  });
  return () => setUnauthorizedHandler(null);
}
