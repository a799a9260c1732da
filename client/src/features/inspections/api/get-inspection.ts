import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InspectionResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { inspectionKeys } from './inspection-keys';

export function getInspection(id: string, signal?: AbortSignal): Promise<InspectionResponse> {
  return api.get<InspectionResponse>(`/inspections/${encodeURIComponent(id)}`, { signal });
}

export function inspectionQueryOptions(id: string) {
  return queryOptions({
    queryKey: inspectionKeys.detail(id),
    queryFn: ({ signal }) => getInspection(id, signal),
  });
}

export function useInspection(id: string) {
  return useQuery(inspectionQueryOptions(id));
}
