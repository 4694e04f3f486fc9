import { ChakraProvider } from '@chakra-ui/react';
import { ApiClientProvider } from '@nappe/web-kit/auth';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { api } from '../lib/api-client';
import { system } from '../theme';

/** The storefront's theme, the query cache, and its API client for the account hooks. */
export function AppProvider({
  queryClient,
  children,
}: {
  queryClient: QueryClient;
  children: ReactNode;
}) {
  return (
    <ChakraProvider value={system}>
      <QueryClientProvider client={queryClient}>
        <ApiClientProvider client={api}>{children}</ApiClientProvider>
      </QueryClientProvider>
    </ChakraProvider>
  );
}
