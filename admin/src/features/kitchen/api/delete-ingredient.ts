import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { forgetAndInvalidate } from './invalidate-kitchen';
import { kitchenKeys } from './kitchen-keys';

/** `DELETE /api/ingredients/:id` (chef). 409 with a message naming what still uses it. */
export const deleteIngredient = (id: string) =>
  api.delete(`/ingredients/${encodeURIComponent(id)}`);

export function useDeleteIngredient() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteIngredient,
    onSuccess: (_done, id) => forgetAndInvalidate(queryClient, kitchenKeys.ingredients.detail(id)),
  });
}
