import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export type TeamRole = 'staff' | 'chef';

/** A pending invitation, as `GET /api/studio/invitations` lists it (never the token). */
export interface Invitation {
  id: string;
  email: string;
  name: string;
  role: TeamRole;
  invitedBy: string;
  /** ISO 8601 timestamps. */
  createdAt: string;
  expiresAt: string;
}

export const invitationKeys = {
  all: ['invitations'] as const,
  pending: () => [...invitationKeys.all, 'pending'] as const,
};

/** `GET /api/studio/invitations` (chef only): not yet used, withdrawn or expired; newest first. */
export const getInvitations = (signal?: AbortSignal) =>
  api.get<Invitation[]>('/studio/invitations', { signal });

export const invitationsQueryOptions = () =>
  queryOptions({
    queryKey: invitationKeys.pending(),
    queryFn: ({ signal }) => getInvitations(signal),
  });

export const useInvitations = () => useQuery(invitationsQueryOptions());
