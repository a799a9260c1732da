import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { AcceptInvitationRequest, InvitationSummary, LoginResponse } from '@yardcall/shared';
import { api } from '../api-client';
import { startSession } from './auth';

export const invitationKeys = {
  all: ['invitations'] as const,
  details: () => [...invitationKeys.all, 'detail'] as const,
  detail: (token: string) => [...invitationKeys.details(), token] as const,
};

const invitationPath = (token: string) => `/invitations/${encodeURIComponent(token)}`;

// Asked before any session exists: a 401 here is the link's problem, not a lost session.
export function getInvitation(token: string, signal?: AbortSignal): Promise<InvitationSummary> {
  return api.get<InvitationSummary>(invitationPath(token), { signal, skipUnauthorizedHandler: true });
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

export function acceptInvitation(token: string, body: AcceptInvitationRequest): Promise<LoginResponse> {
  return api.post<LoginResponse>(`${invitationPath(token)}/accept`, body, { skipUnauthorizedHandler: true });
}

// An accepted invitation signs the new user in.
export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: AcceptInvitationRequest) => acceptInvitation(token, body),
    onSuccess: (session) => {
      queryClient.removeQueries({ queryKey: invitationKeys.detail(token) });
      startSession(queryClient, session);
    },
  });
}
