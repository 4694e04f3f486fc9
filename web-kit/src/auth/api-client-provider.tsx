import { useQueryClient } from '@tanstack/react-query';
import { useEffect, type ReactNode } from 'react';
import type { ApiClient } from '../api-client.js';
import { ApiClientContext } from './api-client-context.js';
import { authKeys } from './auth-keys.js';

/**
 * Gives the account hooks the app's one API client (each app makes its own: the storefront's
 * also hands over answers asked for ahead of its first screen). Goes inside the
 * QueryClientProvider: when a refresh fails mid-session, every screen learns at once that
 * nobody is signed in.
 */
export function ApiClientProvider({
  client,
  children,
}: {
  client: ApiClient;
  children: ReactNode;
}) {
  const queryClient = useQueryClient();
  useEffect(
    () =>
      client.subscribe((session) => {
        if (session === null) queryClient.setQueryData(authKeys.me(), null);
      }),
    [client, queryClient],
  );
  return <ApiClientContext value={client}>{children}</ApiClientContext>;
}
