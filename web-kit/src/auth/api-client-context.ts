import { createContext } from 'react';
import type { ApiClient } from '../api-client.js';

/** The app's API client, for the account hooks: set by ApiClientProvider, read by useApiClient. */
export const ApiClientContext = createContext<ApiClient | null>(null);
