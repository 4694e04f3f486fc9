import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { forgetAndInvalidate } from './invalidate-kitchen';
import { kitchenKeys } from './kitchen-keys';

/** `DELETE /api/desserts/:id` (chef). 409 with a message naming what still uses it. */
export const deleteDessert = (id: string) => api.delete(`/desserts/${encodeURIComponent(id)}`);

export function useDeleteDessert() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteDessert,
    onSuccess: (_done, id) => forgetAndInvalidate(queryClient, kitchenKeys.desserts.detail(id)),
  });
}
