import {
  keepPreviousData,
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
  useSuspenseQuery,
} from '@tanstack/react-query';
import type { PendingAcknowledgement, VehicleKind, VehicleRequest, VehicleResponse } from '@yardcall/shared';
import { api } from '../api-client';

export interface VehicleFilters {
  // Unit-number prefix.
  q?: string;
  kind?: VehicleKind;
}

// One key factory for /vehicles: the lists, one unit, and the report each unit waits to have reviewed.
export const vehicleKeys = {
  all: ['vehicles'] as const,
  lists: () => [...vehicleKeys.all, 'list'] as const,
  list: (filters: VehicleFilters) =>
    [...vehicleKeys.lists(), { q: filters.q ?? '', kind: filters.kind ?? '' }] as const,
  details: () => [...vehicleKeys.all, 'detail'] as const,
  detail: (id: string) => [...vehicleKeys.details(), id] as const,
  pendingAcknowledgements: () => [...vehicleKeys.all, 'pending-acknowledgement'] as const,
  pendingAcknowledgement: (vehicleId: string) => [...vehicleKeys.pendingAcknowledgements(), vehicleId] as const,
};

export function getVehicles(filters: VehicleFilters, signal?: AbortSignal): Promise<VehicleResponse[]> {
  return api.get<VehicleResponse[]>('/vehicles', { query: { q: filters.q?.trim(), kind: filters.kind }, signal });
}

// Without filters: every unit of the organisation (the start screen fills this one from the phone's
// start data, so it answers with no signal).
export function vehiclesQueryOptions(filters: VehicleFilters = {}) {
  return queryOptions({
    queryKey: vehicleKeys.list(filters),
    queryFn: ({ signal }) => getVehicles(filters, signal),
  });
}

export function useVehicles<T = VehicleResponse[]>(
  filters: VehicleFilters = {},
  select?: (vehicles: VehicleResponse[]) => T,
) {
  // Keep the last list on screen while the next search loads.
  return useQuery({ ...vehiclesQueryOptions(filters), placeholderData: keepPreviousData, select });
}

// For a pick list: by unit number, KV-9 before KV-10.
export function byUnitNumber(vehicles: VehicleResponse[]): VehicleResponse[] {
  return [...vehicles].sort((a, b) => a.unitNumber.localeCompare(b.unitNumber, undefined, { numeric: true }));
}

export function getVehicle(id: string, signal?: AbortSignal): Promise<VehicleResponse> {
  return api.get<VehicleResponse>(`/vehicles/${encodeURIComponent(id)}`, { signal });
}

export function vehicleQueryOptions(id: string) {
  return queryOptions({
    queryKey: vehicleKeys.detail(id),
    queryFn: ({ signal }) => getVehicle(id, signal),
  });
}

export function useVehicle(id: string) {
  return useSuspenseQuery(vehicleQueryOptions(id));
}

export function createVehicle(body: VehicleRequest): Promise<VehicleResponse> {
  return api.post<VehicleResponse>('/vehicles', body);
}

export function updateVehicle(id: string, body: Partial<VehicleRequest>): Promise<VehicleResponse> {
  return api.patch<VehicleResponse>(`/vehicles/${encodeURIComponent(id)}`, body);
}

// A saved unit is its own detail at once; the lists ask again.
function useSaveVehicle<Body>(save: (body: Body) => Promise<VehicleResponse>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: save,
    onSuccess: async (vehicle) => {
      queryClient.setQueryData(vehicleKeys.detail(vehicle.id), vehicle);
      await queryClient.invalidateQueries({ queryKey: vehicleKeys.lists() });
    },
  });
}

export function useCreateVehicle() {
  return useSaveVehicle(createVehicle);
}

export function useUpdateVehicle(id: string) {
  return useSaveVehicle((body: Partial<VehicleRequest>) => updateVehicle(id, body));
}

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
    queryKey: vehicleKeys.pendingAcknowledgement(vehicleId),
    queryFn: ({ signal }) => getPendingAcknowledgement(vehicleId, signal),
    staleTime: 0,
  });
}
