import { useMutation, useQueryClient } from '@tanstack/react-query';
import { getOfflineRuntime, type OutboxKind } from '@/lib/offline';
import { walkaroundKeys } from './walkaround-keys';

// The driver has dealt with a refusal (signed a review, say): send the walk-around's refused records again.
export async function retryRefused(inspectionClientId: string): Promise<void> {
  const { engine, store } = getOfflineRuntime();
  await store.clearRefusals(inspectionClientId);
  await engine.syncNow();
}

// The driver leaves a refused record out, so the rest of the walk-around (and its report) can go.
export async function leaveOutRefused(kind: OutboxKind, clientId: string): Promise<void> {
  const { engine, store } = getOfflineRuntime();
  await store.discardRefused(kind, clientId);
  await engine.syncNow();
}

export function useRefusalActions() {
  const queryClient = useQueryClient();
  const refresh = () => queryClient.invalidateQueries({ queryKey: walkaroundKeys.locals() });
  return {
    retry: useMutation({ mutationFn: retryRefused, networkMode: 'always', onSettled: refresh }),
    leaveOut: useMutation({
      mutationFn: ({ kind, clientId }: { kind: OutboxKind; clientId: string }) => leaveOutRefused(kind, clientId),
      networkMode: 'always',
      onSettled: refresh,
    }),
  };
}
