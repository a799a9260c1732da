import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InvitationSummary } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { invitationKeys } from './invitation-keys';

export function getInvitation(token: string, signal?: AbortSignal): Promise<InvitationSummary> {
  return api.get<InvitationSummary>(`/invitations/${encodeURIComponent(token)}`, {
    signal,
    skipUnauthorizedHandler: true,
  });
}

export function invitationQueryOptions(token: string) {
  return queryOptions({
    queryKey: invitationKeys.detail(token),
    queryFn: ({ signal }) => getInvitation(token, signal),
    staleTime: 60_000,
  });
}

export function useInvitation(token: string) {
  return useQuery(invitationQueryOptions(token));
}
