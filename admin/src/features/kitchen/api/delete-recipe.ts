import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { forgetAndInvalidate } from './invalidate-kitchen';
import { kitchenKeys } from './kitchen-keys';

/** `DELETE /api/recipes/:id` (chef). 409 with a message naming what still uses it. */
export const deleteRecipe = (id: string) => api.delete(`/recipes/${encodeURIComponent(id)}`);

export function useDeleteRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteRecipe,
    onSuccess: (_done, id) => forgetAndInvalidate(queryClient, kitchenKeys.recipes.detail(id)),
  });
}
