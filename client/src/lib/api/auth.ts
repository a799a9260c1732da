import { queryOptions, useMutation, useQueryClient, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import type { DisplaySettings, LoginRequest, LoginResponse, UserSummary } from '@yardcall/shared';
import { ApiError, NETWORK_ERROR_STATUS, api, tokenStore } from '../api-client';
import { showDisplaySettings } from '../display-settings';

// The signed-in user: the shell, route guards, settings and sign-in all read or write it.
export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
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
    queryKey: authKeys.me(),
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

// A sign-in or an accepted invitation: keep the token and the user, and show the account's display
// settings at once.
export function startSession(queryClient: QueryClient, { accessToken, user }: LoginResponse): void {
  tokenStore.set(accessToken);
  keepUser(user);
  queryClient.setQueryData(authKeys.me(), user);
  showDisplaySettings(user.settings);
}

export function endSession(queryClient: QueryClient): void {
  tokenStore.clear();
  localStorage.removeItem(KEPT_USER_KEY);
  queryClient.clear();
}

export function login(body: LoginRequest): Promise<LoginResponse> {
  return api.post<LoginResponse>('/auth/login', body, { skipUnauthorizedHandler: true });
}

export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: (session) => startSession(queryClient, session),
  });
}

export function updateSettings(settings: DisplaySettings): Promise<UserSummary> {
  return api.patch<UserSummary>('/auth/me/settings', settings);
}

export function useUpdateSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSettings,
    onSuccess: (user) => queryClient.setQueryData(authKeys.me(), user),
  });
}
