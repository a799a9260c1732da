import { queryOptions, useQuery } from '@tanstack/react-query';
import type { FleetBoard } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { vehicleKeys } from './vehicle-keys';

// Under the vehicles' keys: a change to any vehicle refreshes the board too.
export const fleetBoardKey = [...vehicleKeys.all, 'board'] as const;

export function getFleetBoard(signal?: AbortSignal): Promise<FleetBoard> {
  return api.get<FleetBoard>('/fleet/board', { signal });
}

export function fleetBoardQueryOptions() {
  return queryOptions({
    queryKey: fleetBoardKey,
    queryFn: ({ signal }) => getFleetBoard(signal),
    // A dispatcher leaves the board open: keep it current.
    refetchInterval: 60_000,
  });
}

export function useFleetBoard() {
  return useQuery(fleetBoardQueryOptions());
}
