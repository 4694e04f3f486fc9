import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ApiClient } from '../api-client.js';
import { authKeys } from './auth-keys.js';
import { useApiClient } from './use-api-client.js';

/** The link's token: 32 random bytes in base64url (what the API mails: `/reset-password?token=…`). */
export const RESET_TOKEN = /^[A-Za-z0-9_-]{43}$/;

export interface ConfirmPasswordResetInput {
  token: string;
  password: string;
}

/**
 * `POST /api/auth/password-reset/confirm` (public): sets the new password from the one-time link.
 * The API ends every session of the account, so this browser forgets any it held too.
 */
export async function confirmPasswordReset(
  client: ApiClient,
  input: ConfirmPasswordResetInput,
): Promise<void> {
  await client.post<void>('/auth/password-reset/confirm', input, { auth: false });
}

export function useConfirmPasswordReset() {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ConfirmPasswordResetInput) => confirmPasswordReset(client, input),
    onSuccess: () => {
      client.clearSession();
      queryClient.setQueryData(authKeys.me(), null);
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
    },
  });
}
