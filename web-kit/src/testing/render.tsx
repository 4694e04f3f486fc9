import { ChakraProvider, defaultSystem } from '@chakra-ui/react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactElement } from 'react';
import { createApiClient, type ApiClient } from '../api-client.js';
import { ApiClientProvider } from '../auth/api-client-provider.js';

/** A client like each app's (`/api` on this origin), with nothing cached and no retries. */
export function makeTestClients() {
  const client = createApiClient({ basePath: '/api' });
  const queryClient = new QueryClient({
    defaultOptions: { queries: { retry: false }, mutations: { retry: false } },
  });
  return { client, queryClient };
}

/** Renders `ui` as both apps do: Chakra (its default theme here), the query cache, the client. */
export function renderWithClient(
  ui: ReactElement,
  { client, queryClient }: { client: ApiClient; queryClient: QueryClient } = makeTestClients(),
) {
  const user = userEvent.setup();
  const view = render(
    <ChakraProvider value={defaultSystem}>
      <QueryClientProvider client={queryClient}>
        <ApiClientProvider client={client}>{ui}</ApiClientProvider>
      </QueryClientProvider>
    </ChakraProvider>,
  );
  return { ...view, user, client, queryClient };
}
