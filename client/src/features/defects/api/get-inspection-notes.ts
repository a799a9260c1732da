import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InspectionResponse, VoiceNoteResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { defectKeys } from './defect-keys';

// The voice notes of the report a defect came from; the detail carries them with their item keys.
export async function getInspectionNotes(inspectionId: string, signal?: AbortSignal): Promise<VoiceNoteResponse[]> {
  const inspection = await api.get<InspectionResponse>(`/inspections/${encodeURIComponent(inspectionId)}`, {
    signal,
  });
  return inspection.notes;
}

export function inspectionNotesQueryOptions(inspectionId: string) {
  return queryOptions({
    queryKey: defectKeys.inspection(inspectionId),
    queryFn: ({ signal }) => getInspectionNotes(inspectionId, signal),
    // A submitted report's notes do not change.
    staleTime: 5 * 60_000,
  });
}

export function useInspectionNotes(inspectionId: string) {
  return useQuery(inspectionNotesQueryOptions(inspectionId));
}
