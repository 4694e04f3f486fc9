import { ADMIN_ROLES, type AuthUser, type Role } from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, ApiError } from '../../../lib/api-client';
import { authKeys } from './auth-keys';

/** Chef and staff use the kitchen app; clients book on the storefront. */
export function isAdmitted(role: Role): boolean {
  return ADMIN_ROLES.includes(role);
}

async function fetchUser(): Promise<AuthUser | null> {
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

/**
 * The signed-in team member, or null. On a fresh page load this first tries a silent refresh
 * with the cookie. A client's session (the cookie is shared with the storefront on the same
 * host) is not adopted here, but neither is it revoked: the storefront keeps it.
 */
export async function getMe(): Promise<AuthUser | null> {
  const user = await fetchUser();
  if (user !== null && !isAdmitted(user.role)) {
    api.clearSession();
    return null;
  }
  return user;
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
