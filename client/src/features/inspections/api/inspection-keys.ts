import type { InspectionListFilters } from '@yardcall/shared';

export const inspectionKeys = {
  all: ['inspections'] as const,
  lists: () => [...inspectionKeys.all, 'list'] as const,
  list: (filters: InspectionListFilters) => [...inspectionKeys.lists(), filters] as const,
  details: () => [...inspectionKeys.all, 'detail'] as const,
  detail: (id: string) => [...inspectionKeys.details(), id] as const,
  // What the filters offer to choose from.
  drivers: () => [...inspectionKeys.all, 'drivers'] as const,
  units: () => [...inspectionKeys.all, 'units'] as const,
};
