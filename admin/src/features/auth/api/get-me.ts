import { ADMIN_ROLES, type AuthUser, type Role } from '@nappe/shared';
import { fetchSignedInUser, meQueryOptionsFor } from '@nappe/web-kit/auth';
import { useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** Chef and staff use the kitchen app; clients book on the storefront. */
export function isAdmitted(role: Role): boolean {
  return ADMIN_ROLES.includes(role);
}

/**
 * The signed-in team member, or null. On a fresh page load this first tries a silent refresh
 * with the cookie. A client's session (the cookie is shared with the storefront on the same
 * host) is not adopted here, but neither is it revoked: the storefront keeps it.
 */
export async function getMe(): Promise<AuthUser | null> {
  const user = await fetchSignedInUser(api);
  if (user !== null && !isAdmitted(user.role)) {
    api.clearSession();
    return null;
  }
  return user;
}

export const meQueryOptions = () => meQueryOptionsFor(getMe);

export const useMe = () => useQuery(meQueryOptions());
