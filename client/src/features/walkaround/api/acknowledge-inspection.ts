import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AcknowledgeRequest, SignatureResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { walkaroundKeys } from './walkaround-keys';

export function acknowledgeInspection(inspectionId: string, body: AcknowledgeRequest): Promise<SignatureResponse> {
  return api.post<SignatureResponse>(`/inspections/${encodeURIComponent(inspectionId)}/acknowledge`, body);
}

export function useAcknowledgeInspection() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ inspectionId, body }: { inspectionId: string; body: AcknowledgeRequest }) =>
      acknowledgeInspection(inspectionId, body),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: walkaroundKeys.pendingAcknowledgements() });
    },
  });
}
