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

export function hasSession(): boolean {
  return tokenStore.get() !== null;
}

export function startSession(queryClient: QueryClient, accessToken: string, user: UserSummary): void {
  tokenStore.set(accessToken);
  queryClient.setQueryData(sessionKeys.me(), user);
}

export function endSession(queryClient: QueryClient): void {
  tokenStore.clear();
  queryClient.clear();
}

export const SIGN_IN_PATH = '/sign-in';

export function signInPath(next?: string): string {
  return next && next !== '/' ? `${SIGN_IN_PATH}?next=${encodeURIComponent(next)}` : SIGN_IN_PATH;
}

// Only a path inside the app: never a full URL or a protocol-relative "//host" from a crafted link.
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return '/';
  if (next === SIGN_IN_PATH || next.startsWith(`${SIGN_IN_PATH}?`)) return '/';
  return next;
}
