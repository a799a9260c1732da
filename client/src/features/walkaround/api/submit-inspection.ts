import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SubmitInspectionRequest } from '@yardcall/shared';
import { getOfflineRuntime, type LocalInspection } from '@/lib/offline';
import { walkaroundKeys } from './walkaround-keys';

// Signing needs no signal: the signed report is kept on the phone and the outbox sends it after
// its answers, notes and photos, now or when the phone finds a network. The server keeps the time
// it was signed here and the time it arrived.
export async function signWalkaround(clientId: string, body: SubmitInspectionRequest): Promise<LocalInspection> {
  const { engine, store } = getOfflineRuntime();
  const signed = await store.signInspection(clientId, { ...body, signedAt: body.signedAt ?? new Date().toISOString() });
  // Not awaited: with no signal the run ends at once; with signal the report view follows.
  void engine.syncNow();
  return signed;
}

export function useSignWalkaround(clientId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SubmitInspectionRequest) => signWalkaround(clientId, body),
    networkMode: 'always',
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: walkaroundKeys.local(clientId) });
      await queryClient.invalidateQueries({ queryKey: walkaroundKeys.localLists() });
    },
  });
}
