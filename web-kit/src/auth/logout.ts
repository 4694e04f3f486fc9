import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ApiClient } from '../api-client.js';
import { authKeys } from './auth-keys.js';
import { useApiClient } from './use-api-client.js';

/** Ends the session on the server (revoking the refresh cookie) and forgets the token here. */
export async function logout(client: ApiClient): Promise<void> {
  try {
    if (client.getAccessToken() !== null) await client.post<void>('/auth/logout');
  } finally {
    // Even when the server cannot be reached, this tab must stop acting as that person.
    client.clearSession();
  }
}

export function useLogout() {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => logout(client),
    onSettled: () => {
      queryClient.setQueryData(authKeys.me(), null);
      // Drop everything cached for that person; public data is simply fetched again.
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
    },
  });
}
