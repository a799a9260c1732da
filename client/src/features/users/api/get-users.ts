import { queryOptions, useQuery } from '@tanstack/react-query';
import type { UserSummary } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { userKeys, type UserFilters } from './user-keys';

export function getUsers(filters: UserFilters, signal?: AbortSignal): Promise<UserSummary[]> {
  return api.get<UserSummary[]>('/users', { query: { student: filters.student ? true : undefined }, signal });
}

export function usersQueryOptions(filters: UserFilters = {}) {
  return queryOptions({
    queryKey: userKeys.list(filters),
    queryFn: ({ signal }) => getUsers(filters, signal),
  });
}

export function useUsers(filters: UserFilters = {}) {
  return useQuery(usersQueryOptions(filters));
}
