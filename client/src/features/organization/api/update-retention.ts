import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RetentionSettings, UpdateRetentionRequest } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { organizationKeys } from './organization-keys';

export function updateRetention(body: UpdateRetentionRequest): Promise<RetentionSettings> {
  return api.patch<RetentionSettings>('/organizations/retention', body);
}

export function useUpdateRetention() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateRetention,
    onSuccess: async (settings) => {
      queryClient.setQueryData(organizationKeys.retention(), settings);
      await queryClient.invalidateQueries({ queryKey: organizationKeys.retention() });
    },
  });
}
