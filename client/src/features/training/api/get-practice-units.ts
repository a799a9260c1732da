import { queryOptions, useQuery } from '@tanstack/react-query';
import type { VehicleResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { trainingKeys } from './training-keys';

// The organisation's units a student may practise on.
export function getPracticeUnits(signal?: AbortSignal): Promise<VehicleResponse[]> {
  return api.get<VehicleResponse[]>('/vehicles', { signal });
}

export function practiceUnitsQueryOptions() {
  return queryOptions({ queryKey: trainingKeys.units(), queryFn: ({ signal }) => getPracticeUnits(signal) });
}

export function usePracticeUnits() {
  return useQuery(practiceUnitsQueryOptions());
}
