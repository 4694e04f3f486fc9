import { ChakraProvider } from '@chakra-ui/react';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { useEffect, type ReactNode } from 'react';
import { authKeys } from '../features/auth/api/auth-keys';
import { api } from '../lib/api-client';
import { system } from '../theme';

export function AppProvider({
  queryClient,
  children,
}: {
  queryClient: QueryClient;
  children: ReactNode;
}) {
  // When a refresh fails mid-session, every screen learns at once that nobody is signed in.
  useEffect(
    () =>
      api.subscribe((session) => {
        if (session === null) queryClient.setQueryData(authKeys.me(), null);
      }),
    [queryClient],
  );

  return (
    <ChakraProvider value={system}>
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </ChakraProvider>
  );
}
