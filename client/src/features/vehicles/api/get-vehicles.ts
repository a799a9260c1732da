import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { VEHICLE_KINDS, type VehicleKind, type VehicleResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { vehicleKeys, type VehicleFilters } from './vehicle-keys';

export function getVehicles(filters: VehicleFilters, signal?: AbortSignal): Promise<VehicleResponse[]> {
  return api.get<VehicleResponse[]>('/vehicles', { query: { q: filters.q?.trim(), kind: filters.kind }, signal });
}

export function vehiclesQueryOptions(filters: VehicleFilters = {}) {
  return queryOptions({
    queryKey: vehicleKeys.list(filters),
    queryFn: ({ signal }) => getVehicles(filters, signal),
  });
}

export function useVehicles(filters: VehicleFilters = {}) {
  // Keep the last list on screen while the next search loads.
  return useQuery({ ...vehiclesQueryOptions(filters), placeholderData: keepPreviousData });
}

// Filters live in the address (?q=&kind=) so a list can be bookmarked and reloaded.
export function vehicleFiltersFromSearch(search: URLSearchParams): VehicleFilters {
  const kind = search.get('kind');
  const q = search.get('q') ?? '';
  return {
    ...(q ? { q } : {}),
    ...((VEHICLE_KINDS as readonly string[]).includes(kind ?? '') ? { kind: kind as VehicleKind } : {}),
  };
}
