import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { InviteUserRequest, UpdateUserRequest, UserSummary } from '@yardcall/shared';
import { api } from '../api-client';
import { mailKeys } from './mail';

export interface UserFilters {
  // Only drivers in training (the trainer's students).
  student?: boolean;
}

export const userKeys = {
  all: ['users'] as const,
  lists: () => [...userKeys.all, 'list'] as const,
  list: (filters: UserFilters) => [...userKeys.lists(), { student: filters.student ?? false }] as const,
  details: () => [...userKeys.all, 'detail'] as const,
  detail: (id: string) => [...userKeys.details(), id] as const,
};

export function getUsers(filters: UserFilters, signal?: AbortSignal): Promise<UserSummary[]> {
  return api.get<UserSummary[]>('/users', { query: { student: filters.student ? true : undefined }, signal });
}

export function usersQueryOptions(filters: UserFilters = {}) {
  return queryOptions({
    queryKey: userKeys.list(filters),
    queryFn: ({ signal }) => getUsers(filters, signal),
  });
}

export function useUsers<T = UserSummary[]>(filters: UserFilters = {}, select?: (users: UserSummary[]) => T) {
  return useQuery({ ...usersQueryOptions(filters), select });
}

// The people a supervisor can filter inspections by: the organisation's drivers, by name.
export function driversOf(users: UserSummary[]): UserSummary[] {
  return users.filter((user) => user.role === 'driver').sort((a, b) => a.name.localeCompare(b.name));
}

export function inviteUser(body: InviteUserRequest): Promise<UserSummary> {
  return api.post<UserSummary>('/users', body);
}

export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteUser,
    // The new user shows in the lists, and the invitation e-mail in the outbox.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: userKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: mailKeys.outbox() }),
      ]),
  });
}

export function updateUser(id: string, body: UpdateUserRequest): Promise<UserSummary> {
  return api.patch<UserSummary>(`/users/${encodeURIComponent(id)}`, body);
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: { id: string; body: UpdateUserRequest }) => updateUser(id, body),
    onSuccess: (user) => {
      queryClient.setQueryData(userKeys.detail(user.id), user);
      return queryClient.invalidateQueries({ queryKey: userKeys.lists() });
    },
  });
}
