import { queryOptions, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import type { UserSummary } from '@yardcall/shared';
import { api, tokenStore } from './api-client';

// The signed-in user: the shell, route guards, settings and sign-in all read or write it.
export const sessionKeys = {
  all: ['session'] as const,
  me: () => [...sessionKeys.all, 'me'] as const,
};

export function getMe(signal?: AbortSignal): Promise<UserSummary> {
  return api.get<UserSummary>('/auth/me', { signal });
}

export function meQueryOptions() {
  return queryOptions({
    queryKey: sessionKeys.me(),
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });
}

// For screens behind the sign-in guard, whose loader has already fetched the user.
export function useCurrentUser(): UserSummary {
  return useSuspenseQuery(meQueryOptions()).data;
}

export function startSession(queryClient: QueryClient, accessToken: string, user: UserSummary): void {
  tokenStore.set(accessToken);
  queryClient.setQueryData(sessionKeys.me(), user);
}

export function endSession(queryClient: QueryClient): void {
  tokenStore.clear();
  queryClient.clear();
}
