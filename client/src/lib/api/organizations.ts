import { queryOptions, useMutation, useQuery, useQueryClient, type QueryKey } from '@tanstack/react-query';
import type {
  OrganizationSummary,
  OrganizationTimeZone,
  RetentionPurgeResult,
  RetentionSettings,
  UpdateRequiredReadingsRequest,
  UpdateRetentionRequest,
  UpdateTimeZoneRequest,
} from '@yardcall/shared';
import { api } from '../api-client';

// One key factory for the organisation's own settings.
export const organizationKeys = {
  all: ['organization'] as const,
  current: () => [...organizationKeys.all, 'current'] as const,
  retention: () => [...organizationKeys.all, 'retention'] as const,
  timeZone: () => [...organizationKeys.all, 'time-zone'] as const,
};

// The organisation's settings are read alike: one query each, under its key.
function settingQueryOptions<T>(queryKey: QueryKey, path: string) {
  return queryOptions({ queryKey, queryFn: ({ signal }) => api.get<T>(path, { signal }) });
}

export function currentOrganizationQueryOptions() {
  return settingQueryOptions<OrganizationSummary>(organizationKeys.current(), '/organizations/current');
}

export function useCurrentOrganization() {
  return useQuery(currentOrganizationQueryOptions());
}

export function retentionQueryOptions() {
  return settingQueryOptions<RetentionSettings>(organizationKeys.retention(), '/organizations/retention');
}

export function useRetention() {
  return useQuery(retentionQueryOptions());
}

export function timeZoneQueryOptions() {
  return settingQueryOptions<OrganizationTimeZone>(organizationKeys.timeZone(), '/organizations/time-zone');
}

export function useTimeZone() {
  return useQuery(timeZoneQueryOptions());
}

// A setting saved: the server's answer is shown at once, then asked again.
function useSaveSetting<Body, Saved>(queryKey: QueryKey, save: (body: Body) => Promise<Saved>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: save,
    onSuccess: async (saved) => {
      queryClient.setQueryData(queryKey, saved);
      await queryClient.invalidateQueries({ queryKey });
    },
  });
}

export function updateRequiredReadings(body: UpdateRequiredReadingsRequest): Promise<OrganizationSummary> {
  return api.patch<OrganizationSummary>('/organizations/readings', body);
}

export function useUpdateRequiredReadings() {
  return useSaveSetting(organizationKeys.current(), updateRequiredReadings);
}

export function updateRetention(body: UpdateRetentionRequest): Promise<RetentionSettings> {
  return api.patch<RetentionSettings>('/organizations/retention', body);
}

export function useUpdateRetention() {
  return useSaveSetting(organizationKeys.retention(), updateRetention);
}

export function updateTimeZone(body: UpdateTimeZoneRequest): Promise<OrganizationTimeZone> {
  return api.patch<OrganizationTimeZone>('/organizations/time-zone', body);
}

export function useUpdateTimeZone() {
  return useSaveSetting(organizationKeys.timeZone(), updateTimeZone);
}

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
