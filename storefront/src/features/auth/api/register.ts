import type { AuthSession, RegisterInput } from '@nappe/shared';
import { authKeys } from '@nappe/web-kit/auth';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** Creates a client account and signs it in (the API answers with a session). */
export async function register(input: RegisterInput): Promise<AuthSession> {
  const session = await api.post<AuthSession>('/auth/register', input, { auth: false });
  api.setSession(session);
  return session;
}

export function useRegister() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: register,
    onSuccess: (session) => queryClient.setQueryData(authKeys.me(), session.user),
  });
}
