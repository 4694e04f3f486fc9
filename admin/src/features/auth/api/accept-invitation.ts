import type { AuthSession } from '@nappe/shared';
import { authKeys } from '@nappe/web-kit/auth';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export interface AcceptInvitationInput {
  token: string;
  name: string;
  password: string;
}

/** The link's token: 32 random bytes in base64url (what the API mails: `/accept-invitation?token=…`). */
export const INVITATION_TOKEN = /^[A-Za-z0-9_-]{43}$/;

/**
 * `POST /api/auth/accept-invitation` (public): creates the account from the one-time link and
 * signs it in — the answer is a session, and the refresh cookie comes with it, as for sign-in.
 */
export async function acceptInvitation(input: AcceptInvitationInput): Promise<AuthSession> {
  const session = await api.post<AuthSession>('/auth/accept-invitation', input, { auth: false });
  api.setSession(session);
  return session;
}

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    onSuccess: (session) => {
      // Whoever was signed in on this browser before, the new member is now.
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
      queryClient.setQueryData(authKeys.me(), session.user);
    },
  });
}
