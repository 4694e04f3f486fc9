import type { AuthUser } from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, ApiError } from '../../../lib/api-client';
import { authKeys } from './auth-keys';

/**
 * The signed-in person, or null. With no token in memory (a fresh page load) this first
 * tries a silent refresh with the cookie, which is how a session survives a reload.
 */
export async function getMe(): Promise<AuthUser | null> {
  if (api.getAccessToken() === null) {
    const session = await api.restoreSession();
    return session?.user ?? null;
  }
  try {
    return await api.get<AuthUser>('/auth/me');
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: getMe,
    staleTime: 5 * 60_000,
    // Screens wait on this answer; when the server is unreachable, say so at once, and do not
    // ask again on every mount: restoring calls the rate-limited refresh endpoint.
    retry: false,
    retryOnMount: false,
  });

export const useMe = () => useQuery(meQueryOptions());
