import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { OrganizationSummary, UpdateRequiredReadingsRequest } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { organizationKeys } from './organization-keys';

export function updateRequiredReadings(body: UpdateRequiredReadingsRequest): Promise<OrganizationSummary> {
  return api.patch<OrganizationSummary>('/organizations/readings', body);
}

export function useUpdateRequiredReadings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateRequiredReadings,
    onSuccess: async (organization) => {
      queryClient.setQueryData(organizationKeys.current(), organization);
      await queryClient.invalidateQueries({ queryKey: organizationKeys.current() });
    },
  });
}
