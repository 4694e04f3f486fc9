import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { forgetAndInvalidate } from './invalidate-kitchen';
import { kitchenKeys } from './kitchen-keys';

/** `DELETE /api/menus/:id` (chef). 409 with a message naming what still uses it. */
export const deleteMenu = (id: string) => api.delete(`/menus/${encodeURIComponent(id)}`);

export function useDeleteMenu() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteMenu,
    onSuccess: (_done, id) => forgetAndInvalidate(queryClient, kitchenKeys.menus.detail(id)),
  });
}
