import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invitationKeys, type Invitation, type TeamRole } from './invitations';

export interface InvitationInput {
  email: string;
  name: string;
  role: TeamRole;
}

/** `POST /api/studio/invitations`: the API e-mails a one-time link (7 days). */
export const createInvitation = (input: InvitationInput) =>
  api.post<Invitation>('/studio/invitations', input);

export function useCreateInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvitation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationKeys.all }),
  });
}
