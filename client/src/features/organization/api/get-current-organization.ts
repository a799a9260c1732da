import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OrganizationSummary } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { organizationKeys } from './organization-keys';

export function getCurrentOrganization(signal?: AbortSignal): Promise<OrganizationSummary> {
  return api.get<OrganizationSummary>('/organizations/current', { signal });
}

export function currentOrganizationQueryOptions() {
  return queryOptions({
    queryKey: organizationKeys.current(),
    queryFn: ({ signal }) => getCurrentOrganization(signal),
  });
}

export function useCurrentOrganization() {
  return useQuery(currentOrganizationQueryOptions());
}
