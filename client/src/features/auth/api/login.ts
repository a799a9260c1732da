import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LoginRequest, LoginResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { showDisplaySettings } from '@/lib/display-settings';
import { startSession } from '@/lib/session';

export function login(body: LoginRequest): Promise<LoginResponse> {
  return api.post<LoginResponse>('/auth/login', body, { skipUnauthorizedHandler: true });
}

export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: ({ accessToken, user }) => {
      startSession(queryClient, accessToken, user);
      showDisplaySettings(user.settings);
    },
  });
}
