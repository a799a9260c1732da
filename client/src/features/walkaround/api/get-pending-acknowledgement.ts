import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PendingAcknowledgement } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { walkaroundKeys } from './walkaround-keys';

// 204 (nothing to review) comes back as undefined: null here.
export async function getPendingAcknowledgement(
  vehicleId: string,
  signal?: AbortSignal,
): Promise<PendingAcknowledgement | null> {
  const pending = await api.get<PendingAcknowledgement | undefined>(
    `/vehicles/${encodeURIComponent(vehicleId)}/pending-acknowledgement`,
    { signal },
  );
  return pending ?? null;
}

export function pendingAcknowledgementQueryOptions(vehicleId: string) {
  return queryOptions({
    queryKey: walkaroundKeys.pendingAcknowledgement(vehicleId),
    queryFn: ({ signal }) => getPendingAcknowledgement(vehicleId, signal),
    staleTime: 0,
  });
}

export function usePendingAcknowledgement(vehicleId: string | null) {
  return useQuery({ ...pendingAcknowledgementQueryOptions(vehicleId ?? ''), enabled: vehicleId !== null });
}
