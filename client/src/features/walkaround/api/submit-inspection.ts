import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InspectionResponse, SubmitInspectionRequest } from '@yardcall/shared';
import { ApiError, NETWORK_ERROR_STATUS, api } from '@/lib/api-client';
import { getOfflineRuntime } from '@/lib/offline';
import { walkaroundKeys } from './walkaround-keys';

export function submitInspection(inspectionId: string, body: SubmitInspectionRequest): Promise<InspectionResponse> {
  return api.post<InspectionResponse>(`/inspections/${encodeURIComponent(inspectionId)}/submit`, body);
}

export class WaitingToSyncError extends Error {
  constructor(readonly waiting: number) {
    super('Some answers are still waiting to sync.');
    this.name = 'WaitingToSyncError';
  }
}

// Submitting needs the server: everything waiting is sent first, so the signed report holds every
// answer, note and photo. Offline, nothing is lost: it stays on the phone until the driver retries.
export async function syncThenSubmit(clientId: string, body: SubmitInspectionRequest): Promise<InspectionResponse> {
  const { engine, store } = getOfflineRuntime();
  if (globalThis.navigator?.onLine === false) {
    throw new ApiError(NETWORK_ERROR_STATUS, 'offline', 'network');
  }
  await engine.syncNow();
  await engine.idle();
  const waiting = await store.countWaitingFor(clientId);
  const serverId = await store.serverIdOf(clientId);
  if (waiting > 0 || !serverId) throw new WaitingToSyncError(waiting);
  return submitInspection(serverId, body);
}

export function useSubmitInspection(clientId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SubmitInspectionRequest) => syncThenSubmit(clientId, body),
    onSuccess: async (inspection) => {
      queryClient.setQueryData(walkaroundKeys.detail(inspection.id), inspection);
      // The local copy learnt its server id during the sync: read it again so the report shows.
      await queryClient.invalidateQueries({ queryKey: walkaroundKeys.local(clientId) });
    },
  });
}
