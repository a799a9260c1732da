import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OrganizationTimeZone } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { organizationKeys } from './organization-keys';

export function getTimeZone(signal?: AbortSignal): Promise<OrganizationTimeZone> {
  return api.get<OrganizationTimeZone>('/organizations/time-zone', { signal });
}

export function timeZoneQueryOptions() {
  return queryOptions({
    queryKey: organizationKeys.timeZone(),
    queryFn: ({ signal }) => getTimeZone(signal),
  });
}

export function useTimeZone() {
  return useQuery(timeZoneQueryOptions());
}
