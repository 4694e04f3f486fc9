import type { AuthSession, AuthUser, LoginInput } from '@nappe/shared';
import { authKeys } from '@nappe/web-kit/auth';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { isAdmitted } from './get-me';

/** A client signed in with the right password, at the wrong door. */
export class NotAdmittedError extends Error {
  readonly user: AuthUser;
  constructor(user: AuthUser) {
    super('Client accounts use the storefront, not the kitchen app.');
    this.name = 'NotAdmittedError';
    this.user = user;
  }
}

/** Signs in a chef or staff member; a client is signed straight back out. */
export async function login(input: LoginInput): Promise<AuthSession> {
  const session = await api.post<AuthSession>('/auth/login', input, { auth: false });
  api.setSession(session);
  if (!isAdmitted(session.user.role)) {
    try {
      await api.post<void>('/auth/logout');
    } catch {
      // The token is dropped below either way; it expires on its own within minutes.
    } finally {
      api.clearSession();
    }
    throw new NotAdmittedError(session.user);
  }
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
