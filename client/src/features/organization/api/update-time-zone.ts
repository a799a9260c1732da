import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { OrganizationTimeZone, UpdateTimeZoneRequest } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { organizationKeys } from './organization-keys';

export function updateTimeZone(body: UpdateTimeZoneRequest): Promise<OrganizationTimeZone> {
  return api.patch<OrganizationTimeZone>('/organizations/time-zone', body);
}

export function useUpdateTimeZone() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateTimeZone,
    onSuccess: async (saved) => {
      queryClient.setQueryData(organizationKeys.timeZone(), saved);
      await queryClient.invalidateQueries({ queryKey: organizationKeys.timeZone() });
    },
  });
}
