import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateUserRequest, UserSummary } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { userKeys } from './user-keys';

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
