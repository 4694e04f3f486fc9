import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { allergyNotesKeys } from './allergy-notes-keys';
import type { AllergyNotes, GuestNote, SubstitutionBody } from './types';

export interface SubstitutionTarget {
  orderId: string;
  guestId: number;
  dessertId: string;
}

const substitutionPath = ({ orderId, guestId, dessertId }: SubstitutionTarget) =>
  `/orders/${encodeURIComponent(orderId)}/guests/${guestId}/substitutions/${encodeURIComponent(dessertId)}`;

/** `PUT …/substitutions/:dessertId` (chef): records the change; the API checks the plate again. */
export const saveSubstitution = ({
  body,
  ...target
}: SubstitutionTarget & { body: SubstitutionBody }) =>
  api.put<GuestNote>(substitutionPath(target), body);

/** `DELETE …/substitutions/:dessertId` (chef): back to the standard plate. */
export const removeSubstitution = (target: SubstitutionTarget) =>
  api.delete<GuestNote>(substitutionPath(target));

/**
 * The answer is the guest's notes checked again: put them in the order's notes at once (the
 * screen shows the re-check without another read, which the API would log as another opening),
 * then mark what depends on them as out of date.
 */
function applyGuest(queryClient: QueryClient, orderId: string, guest: GuestNote) {
  queryClient.setQueryData<AllergyNotes>(allergyNotesKeys.detail(orderId), (notes) => {
    if (!notes) return notes;
    const guests = notes.guests.map((g) => (g.guestId === guest.guestId ? guest : g));
    return {
      ...notes,
      guests,
      unresolved: guests.flatMap((g) =>
        g.plates
          .filter((p) => !p.resolved)
          .map((p) => ({
            guestId: g.guestId,
            guest: g.label,
            dessertId: p.dessertId,
            dessertName: p.dessertName,
            messages: (p.afterSubstitution ?? p).conflicts.map((c) => c.message),
          })),
      ),
    };
  });
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: allergyNotesKeys.counts() }),
    queryClient.invalidateQueries({
      queryKey: allergyNotesKeys.briefing(orderId),
      refetchType: 'none',
    }),
  ]);
}

export function useSaveSubstitution() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveSubstitution,
    onSuccess: (guest, { orderId }) => applyGuest(queryClient, orderId, guest),
  });
}

export function useRemoveSubstitution() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeSubstitution,
    onSuccess: (guest, { orderId }) => applyGuest(queryClient, orderId, guest),
  });
}
