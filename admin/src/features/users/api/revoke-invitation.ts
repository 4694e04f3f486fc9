import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invitationKeys } from './invitations';

/** `DELETE /api/studio/invitations/:id`: the link stops working at once. */
export const revokeInvitation = (id: string) =>
  api.delete(`/studio/invitations/${encodeURIComponent(id)}`);

export function useRevokeInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeInvitation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationKeys.all }),
  });
}
