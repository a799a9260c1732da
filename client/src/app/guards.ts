import type { QueryClient } from '@tanstack/react-query';
import { redirect, type LoaderFunctionArgs } from 'react-router';
import type { Role, UserSummary } from '@yardcall/shared';
import { ApiError } from '@/lib/api-client';
import { meQueryOptions } from '@/lib/api/auth';
import { hasSession, signInPath } from '@/lib/sign-in';
import { homePathFor } from './role-homes';

function pathOf(request: Request): string {
  const url = new URL(request.url);
  return `${url.pathname}${url.search}`;
}

// The signed-in user, or the way to the sign-in screen that comes back here afterwards.
async function userOrSignIn(queryClient: QueryClient, request: Request): Promise<UserSummary | Response> {
  if (!hasSession()) return redirect(signInPath(pathOf(request)));
  try {
    return await queryClient.ensureQueryData(meQueryOptions());
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return redirect(signInPath(pathOf(request)));
    throw error;
  }
}

// A screen for other roles sends the user to their own home (the server refuses the data anyway).
export function requireRole(queryClient: QueryClient, roles: readonly Role[]) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await userOrSignIn(queryClient, request);
    if (user instanceof Response) return user;
    return roles.includes(user.role) ? null : redirect(homePathFor(user.role));
  };
}

export function redirectToRoleHome(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await userOrSignIn(queryClient, request);
    return user instanceof Response ? user : redirect(homePathFor(user.role));
  };
}
