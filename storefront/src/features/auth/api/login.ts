import type { AuthSession, LoginInput } from '@nappe/shared';
import { authKeys } from '@nappe/web-kit/auth';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export async function login(input: LoginInput): Promise<AuthSession> {
  const session = await api.post<AuthSession>('/auth/login', input, { auth: false });
  api.setSession(session);
  return session;
}

export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    // The answer already holds the user: store it rather than asking /auth/me again.
    onSuccess: (session) => queryClient.setQueryData(authKeys.me(), session.user),
  });
}
