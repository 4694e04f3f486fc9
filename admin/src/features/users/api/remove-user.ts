import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { usersKeys } from './get-users';

/** `DELETE /api/users/:id` (chef only): the member's sessions end on their next request. */
export const removeUser = (id: string) => api.delete(`/users/${encodeURIComponent(id)}`);

export function useRemoveUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersKeys.all }),
  });
}
