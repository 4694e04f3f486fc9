import type { AuthUser } from '@nappe/shared';
import { fetchSignedInUser, meQueryOptionsFor } from '@nappe/web-kit/auth';
import { useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/**
 * The signed-in person, or null. With no token in memory (a fresh page load) this first
 * tries a silent refresh with the cookie, which is how a session survives a reload.
 */
export const getMe = (): Promise<AuthUser | null> => fetchSignedInUser(api);

export const meQueryOptions = () => meQueryOptionsFor(getMe);

export const useMe = () => useQuery(meQueryOptions());
