import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AcceptInvitationRequest, LoginResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { showDisplaySettings } from '@/lib/display-settings';
import { startSession } from '@/lib/session';
import { invitationKeys } from './invitation-keys';

export function acceptInvitation(token: string, body: AcceptInvitationRequest): Promise<LoginResponse> {
  return api.post<LoginResponse>(`/invitations/${encodeURIComponent(token)}/accept`, body, {
    skipUnauthorizedHandler: true,
  });
}

export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: AcceptInvitationRequest) => acceptInvitation(token, body),
    onSuccess: ({ accessToken, user }) => {
      queryClient.removeQueries({ queryKey: invitationKeys.detail(token) });
      startSession(queryClient, accessToken, user);
      showDisplaySettings(user.settings);
    },
  });
}
