import { queryOptions, useQuery } from '@tanstack/react-query';
import type { FleetBoard } from '@yardcall/shared';
import { api } from '../api-client';
import { vehicleKeys } from './vehicles';

// The board is made of the units: under the vehicles' keys, so a change to any vehicle refreshes it too.
export const fleetKeys = {
  all: [...vehicleKeys.all, 'fleet'] as const,
  board: () => [...fleetKeys.all, 'board'] as const,
};

export function getFleetBoard(signal?: AbortSignal): Promise<FleetBoard> {
  return api.get<FleetBoard>('/fleet/board', { signal });
}

export function fleetBoardQueryOptions() {
  return queryOptions({
    queryKey: fleetKeys.board(),
    queryFn: ({ signal }) => getFleetBoard(signal),
    // A dispatcher leaves the board open: keep it current.
    refetchInterval: 60_000,
  });
}

export function useFleetBoard() {
  return useQuery(fleetBoardQueryOptions());
}
