import { useMutation } from '@tanstack/react-query';
import type { InspectionListFilters } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { toQueryParams } from '../utils/inspection-filters';

// The filtered list as CSV (the token guards it, so it comes as a Blob).
export function exportInspectionsCsv(filters: InspectionListFilters): Promise<Blob> {
  return api.getBlob('/inspections/export.csv', { query: toQueryParams(filters), accept: 'text/csv' });
}

export function useExportInspectionsCsv() {
  return useMutation({ mutationFn: exportInspectionsCsv });
}
