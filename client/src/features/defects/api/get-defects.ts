import { queryOptions, useQuery } from '@tanstack/react-query';
import type { DefectResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { defectKeys, type DefectFilters } from './defect-keys';

// The server orders them safety first, then newest first.
export function getDefects(filters: DefectFilters, signal?: AbortSignal): Promise<DefectResponse[]> {
  return api.get<DefectResponse[]>('/defects', {
    query: { status: filters.status, vehicleId: filters.vehicleId },
    signal,
  });
}

export function defectsQueryOptions(filters: DefectFilters = {}) {
  return queryOptions({
    queryKey: defectKeys.list(filters),
    queryFn: ({ signal }) => getDefects(filters, signal),
  });
}

export function useDefects(filters: DefectFilters = {}) {
  return useQuery(defectsQueryOptions(filters));
}
