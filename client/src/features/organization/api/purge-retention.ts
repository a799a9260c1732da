import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RetentionPurgeResult } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { organizationKeys } from './organization-keys';

export function purgeRetention(): Promise<RetentionPurgeResult> {
  return api.post<RetentionPurgeResult>('/organizations/retention/purge');
}

export function usePurgeRetention() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: purgeRetention,
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: organizationKeys.retention() });
    },
  });
}
