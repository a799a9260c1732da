import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { DefectResponse, DefectStatus, RepairRequest } from '@yardcall/shared';
import { api } from '../api-client';

export interface DefectFilters {
  status?: DefectStatus;
  vehicleId?: string;
}

// One key factory for /defects. A defect's voice notes come from its report (inspections.ts) and
// their audio from lib/audio.
export const defectKeys = {
  all: ['defects'] as const,
  lists: () => [...defectKeys.all, 'list'] as const,
  list: (filters: DefectFilters) =>
    [...defectKeys.lists(), { status: filters.status ?? '', vehicleId: filters.vehicleId ?? '' }] as const,
};

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

export function repairDefect(defectId: string, body: RepairRequest): Promise<DefectResponse> {
  return api.post<DefectResponse>(`/defects/${encodeURIComponent(defectId)}/repair`, body);
}

// `onCertified` runs before the lists refresh: the refreshed list no longer holds the form that
// asked, and a callback given to `mutate` would be dropped with it.
export function useRepairDefect({ onCertified }: { onCertified?: (defect: DefectResponse) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ defectId, body }: { defectId: string; body: RepairRequest }) => repairDefect(defectId, body),
    onSuccess: async (defect) => {
      onCertified?.(defect);
      await queryClient.invalidateQueries({ queryKey: defectKeys.lists() });
    },
  });
}
