import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** What the server says it erased and what the studio keeps (`DELETE /api/me`). */
export interface AccountDeletion {
  deleted: true;
  erased: string[];
  kept: string[];
  ordersAnonymised: number;
  guestEntriesRemoved: number;
  paymentRecordsKept: number;
}

/**
 * Deletes the signed-in client's account, confirmed with their current password. A 409 says
 * which upcoming booking to cancel first; a 403, that the password is not the current one.
 */
export function deleteAccount(password: string): Promise<AccountDeletion> {
  return api.request<AccountDeletion>('/me', { method: 'DELETE', body: { password } });
}

/** The caller signs the person out on success: the server has already ended every session. */
export const useDeleteAccount = () =>
  useMutation({ mutationFn: (password: string) => deleteAccount(password) });
