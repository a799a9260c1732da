import type { VehicleKind } from '@yardcall/shared';

export interface VehicleFilters {
  // Unit-number prefix.
  q?: string;
  kind?: VehicleKind;
}

export const vehicleKeys = {
  all: ['vehicles'] as const,
  lists: () => [...vehicleKeys.all, 'list'] as const,
  list: (filters: VehicleFilters) =>
    [...vehicleKeys.lists(), { q: filters.q ?? '', kind: filters.kind ?? '' }] as const,
  details: () => [...vehicleKeys.all, 'detail'] as const,
  detail: (id: string) => [...vehicleKeys.details(), id] as const,
};
