import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { TeamRole } from './invitations';
import { usersKeys } from './get-users';

export interface TeamMember {
  id: string;
  email: string;
  name: string;
  role: TeamRole;
}

/** `PATCH /api/users/:id/role` (chef only): applies on the member's next request. */
export const changeRole = ({ id, role }: { id: string; role: TeamRole }) =>
  api.request<TeamMember>(`/users/${encodeURIComponent(id)}/role`, {
    method: 'PATCH',
    body: { role },
  });

export function useChangeRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changeRole,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersKeys.all }),
  });
}
