import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DisplaySettings, UserSummary } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { sessionKeys } from '@/lib/session';

export function updateSettings(settings: DisplaySettings): Promise<UserSummary> {
  return api.patch<UserSummary>('/auth/me/settings', settings);
}

export function useUpdateSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSettings,
    onSuccess: (user) => queryClient.setQueryData(sessionKeys.me(), user),
  });
}
