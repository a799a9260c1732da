import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InspectionResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { walkaroundKeys } from './walkaround-keys';

export function getInspection(inspectionId: string, signal?: AbortSignal): Promise<InspectionResponse> {
  return api.get<InspectionResponse>(`/inspections/${encodeURIComponent(inspectionId)}`, { signal });
}

export function inspectionQueryOptions(inspectionId: string) {
  return queryOptions({
    queryKey: walkaroundKeys.detail(inspectionId),
    queryFn: ({ signal }) => getInspection(inspectionId, signal),
  });
}

// Null until the create has reached the server.
export function useInspection(inspectionId: string | undefined) {
  return useQuery({ ...inspectionQueryOptions(inspectionId ?? ''), enabled: Boolean(inspectionId) });
}
