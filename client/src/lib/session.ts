import { queryOptions, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import type { UserSummary } from '@yardcall/shared';
import { ApiError, NETWORK_ERROR_STATUS, api, tokenStore } from './api-client';

// The signed-in user: the shell, route guards, settings and sign-in all read or write it.
export const sessionKeys = {
  all: ['session'] as const,
  me: () => [...sessionKeys.all, 'me'] as const,
};

// The user of the session on this phone, kept beside the token so the app opens with no signal.
const KEPT_USER_KEY = 'yardcall.me';

function keepUser(user: UserSummary): void {
  localStorage.setItem(KEPT_USER_KEY, JSON.stringify(user));
}

function keptUser(): UserSummary | null {
  try {
    const parsed: unknown = JSON.parse(localStorage.getItem(KEPT_USER_KEY) ?? 'null');
    return typeof parsed === 'object' && parsed !== null && 'role' in parsed && 'id' in parsed
      ? (parsed as UserSummary)
      : null;
  } catch {
    return null;
  }
}

// The server's answer when it can be reached; with no signal, the user this phone signed in last.
export async function getMe(signal?: AbortSignal): Promise<UserSummary> {
  try {
    const user = await api.get<UserSummary>('/auth/me', { signal });
    keepUser(user);
    return user;
  } catch (error) {
    const kept = error instanceof ApiError && error.status === NETWORK_ERROR_STATUS ? keptUser() : null;
    if (kept) return kept;
    throw error;
  }
}

export function meQueryOptions() {
  return queryOptions({
    queryKey: sessionKeys.me(),
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
    // Asked even offline: the phone's copy answers then.
    networkMode: 'always',
  });
}

// For screens behind the sign-in guard, whose loader has already fetched the user.
export function useCurrentUser(): UserSummary {
  return useSuspenseQuery(meQueryOptions()).data;
}

export function startSession(queryClient: QueryClient, accessToken: string, user: UserSummary): void {
  tokenStore.set(accessToken);
  keepUser(user);
  queryClient.setQueryData(sessionKeys.me(), user);
}

export function endSession(queryClient: QueryClient): void {
  tokenStore.clear();
  localStorage.removeItem(KEPT_USER_KEY);
  queryClient.clear();
}
