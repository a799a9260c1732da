import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DefectResponse, RepairRequest } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { defectKeys } from './defect-keys';

export function repairDefect(defectId: string, body: RepairRequest): Promise<DefectResponse> {
  return api.post<DefectResponse>(`/defects/${encodeURIComponent(defectId)}/repair`, body);
}

// `onCertified` runs before the lists refresh: the refreshed list no longer holds the form that
// asked, and a callback given to `mutate` would be dropped with it.
export function useRepairDefect({ onCertified }: { onCertified?: (defect: DefectResponse) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ defectId, body }: { defectId: string; body: RepairRequest }) => repairDefect(defectId, body),
    onSuccess: async (defect) => {
      onCertified?.(defect);
      await queryClient.invalidateQueries({ queryKey: defectKeys.lists() });
    },
  });
}
