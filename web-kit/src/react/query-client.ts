import { QueryClient, type DefaultOptions } from '@tanstack/react-query';
import { ApiError } from '../api-client.js';

/** Client errors (4xx) will not change on a retry; server and network errors might. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export function createQueryClient(overrides: DefaultOptions = {}): QueryClient {
  return new QueryClient({
    defaultOptions: {
      ...overrides,
      queries: { staleTime: 60_000, retry: shouldRetry, ...overrides.queries },
      mutations: { retry: false, ...overrides.mutations },
    },
  });
}
