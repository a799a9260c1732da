import { useEffect, type ReactNode } from 'react';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { I18nextProvider } from 'react-i18next';
import { i18n } from '@/lib/i18n';

export function AppProvider({ queryClient, children }: { queryClient: QueryClient; children: ReactNode }) {
  // Once per page: sends what an earlier session left and whatever the walk-around saves next.
  // Loaded apart from the first screen's code: the store and its engine are only needed after sign-in.
  useEffect(() => {
    let stop: (() => void) | null = null;
    let cancelled = false;
    import('@/lib/offline')
      .then(({ getOfflineRuntime }) => {
        if (cancelled) return;
        const { engine } = getOfflineRuntime();
        stop = () => engine.stop();
        // No IndexedDB (a private window in some browsers): the engine has nothing to send.
        engine.start().catch(() => undefined);
      })
      .catch(() => undefined);
    return () => {
      cancelled = true;
      stop?.();
    };
  }, []);
  return (
    <QueryClientProvider client={queryClient}>
      <I18nextProvider i18n={i18n}>{children}</I18nextProvider>
    </QueryClientProvider>
  );
}
