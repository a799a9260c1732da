import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RetentionSettings } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { organizationKeys } from './organization-keys';

export function getRetention(signal?: AbortSignal): Promise<RetentionSettings> {
  return api.get<RetentionSettings>('/organizations/retention', { signal });
}

export function retentionQueryOptions() {
  return queryOptions({
    queryKey: organizationKeys.retention(),
    queryFn: ({ signal }) => getRetention(signal),
  });
}

export function useRetention() {
  return useQuery(retentionQueryOptions());
}
