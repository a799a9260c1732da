import { queryOptions, useQuery } from '@tanstack/react-query';
import type { VehicleResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { inspectionKeys } from './inspection-keys';

// Every unit of the organisation, for the unit filter.
export async function getUnits(signal?: AbortSignal): Promise<VehicleResponse[]> {
  const vehicles = await api.get<VehicleResponse[]>('/vehicles', { signal });
  return [...vehicles].sort((a, b) => a.unitNumber.localeCompare(b.unitNumber, undefined, { numeric: true }));
}

export function unitsQueryOptions() {
  return queryOptions({ queryKey: inspectionKeys.units(), queryFn: ({ signal }) => getUnits(signal) });
}

export function useUnits() {
  return useQuery(unitsQueryOptions());
}
