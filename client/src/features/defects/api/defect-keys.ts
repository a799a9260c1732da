import type { DefectStatus } from '@yardcall/shared';

export interface DefectFilters {
  status?: DefectStatus;
  vehicleId?: string;
}

// One key factory for the shop: defect lists and the inspections their notes come from (note audio
// is lib/audio's).
export const defectKeys = {
  all: ['defects'] as const,
  lists: () => [...defectKeys.all, 'list'] as const,
  list: (filters: DefectFilters) =>
    [...defectKeys.lists(), { status: filters.status ?? '', vehicleId: filters.vehicleId ?? '' }] as const,
  inspections: () => [...defectKeys.all, 'inspection'] as const,
  inspection: (inspectionId: string) => [...defectKeys.inspections(), inspectionId] as const,
};
