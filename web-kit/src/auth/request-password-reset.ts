import { useMutation } from '@tanstack/react-query';
import type { ApiClient } from '../api-client.js';
import { useApiClient } from './use-api-client.js';

export interface PasswordResetRequested {
  message: string;
}

/**
 * `POST /api/auth/password-reset` (public): the API answers 202 with the same body whether or not
 * an account uses the address, and e-mails a one-time link only when one does.
 */
export function requestPasswordReset(
  client: ApiClient,
  input: { email: string },
): Promise<PasswordResetRequested> {
  return client.post<PasswordResetRequested>('/auth/password-reset', input, { auth: false });
}

export function useRequestPasswordReset() {
  const client = useApiClient();
  return useMutation({
    mutationFn: (input: { email: string }) => requestPasswordReset(client, input),
  });
}
