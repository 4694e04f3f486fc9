import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export interface PasswordResetRequested {
  message: string;
}

/**
 * `POST /api/auth/password-reset` (public): the API answers 202 with the same body whether or not
 * an account uses the address, and e-mails a one-time link only when one does.
 */
export function requestPasswordReset(input: { email: string }): Promise<PasswordResetRequested> {
  return api.post<PasswordResetRequested>('/auth/password-reset', input, { auth: false });
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
