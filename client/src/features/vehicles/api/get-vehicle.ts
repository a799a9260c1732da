import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { VehicleResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { vehicleKeys } from './vehicle-keys';

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
