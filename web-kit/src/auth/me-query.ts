import type { AuthUser } from '@nappe/shared';
import { queryOptions } from '@tanstack/react-query';
import { ApiError, type ApiClient } from '../api-client.js';
import { authKeys } from './auth-keys.js';

/**
 * Who is signed in on `client`, or null. With no token in memory (a fresh page load) this first
 * tries a silent refresh with the cookie, which is how a session survives a reload.
 */
export async function fetchSignedInUser(client: ApiClient): Promise<AuthUser | null> {
  if (client.getAccessToken() === null) {
    const session = await client.restoreSession();
    return session?.user ?? null;
  }
  try {
    return await client.get<AuthUser>('/auth/me');
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

/** The one cache entry for "who is signed in"; `getMe` is the app's own (who it admits). */
export const meQueryOptionsFor = (getMe: () => Promise<AuthUser | null>) =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: getMe,
    staleTime: 5 * 60_000,
    // Screens wait on this answer; when the server is unreachable, say so at once, and do not
    // ask again on every mount: restoring calls the rate-limited refresh endpoint.
    retry: false,
    retryOnMount: false,
  });
