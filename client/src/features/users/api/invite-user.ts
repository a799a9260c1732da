import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InviteUserRequest, UserSummary } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { userKeys } from './user-keys';

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
        queryClient.invalidateQueries({ queryKey: userKeys.outbox() }),
      ]),
  });
}
