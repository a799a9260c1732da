import { queryOptions, useQuery } from '@tanstack/react-query';
import type { UserSummary } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { inspectionKeys } from './inspection-keys';

// The people a supervisor can filter inspections by: the organisation's drivers.
export async function getDrivers(signal?: AbortSignal): Promise<UserSummary[]> {
  const users = await api.get<UserSummary[]>('/users', { signal });
  return users.filter((user) => user.role === 'driver').sort((a, b) => a.name.localeCompare(b.name));
}

export function driversQueryOptions() {
  return queryOptions({ queryKey: inspectionKeys.drivers(), queryFn: ({ signal }) => getDrivers(signal) });
}

export function useDrivers() {
  return useQuery(driversQueryOptions());
}
