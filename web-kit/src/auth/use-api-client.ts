import { useContext } from 'react';
import type { ApiClient } from '../api-client.js';
import { ApiClientContext } from './api-client-context.js';

/**
 * The client given by the nearest ApiClientProvider. In a module of its own: the hooks that read
 * it load with the screens that use them, not with the provider at startup.
 */
export function useApiClient(): ApiClient {
  const client = useContext(ApiClientContext);
  if (client === null) throw new Error('No ApiClientProvider above this component.');
  return client;
}
