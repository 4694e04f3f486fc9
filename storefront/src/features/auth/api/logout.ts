import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { authKeys } from './auth-keys';

/** Ends the session on the server (revoking the refresh cookie) and forgets the token here. */
export async function logout(): Promise<void> {
  try {
    if (api.getAccessToken() !== null) await api.post<void>('/auth/logout');
  } finally {
    // Even when the server cannot be reached, this tab must stop acting as that person.
    api.clearSession();
  }
}

export function useLogout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: logout,
    onSettled: () => {
      queryClient.setQueryData(authKeys.me(), null);
      // Drop everything cached for that person; public data is simply fetched again.
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
    },
  });
}
