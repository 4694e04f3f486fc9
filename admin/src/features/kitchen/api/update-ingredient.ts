import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invalidateKitchen } from './invalidate-kitchen';
import { kitchenKeys } from './kitchen-keys';
import type { IngredientBody, IngredientResponse } from './types';

/** `PUT /api/ingredients/:id` (chef): replaces the whole ingredient. */
export const updateIngredient = ({ id, body }: { id: string; body: IngredientBody }) =>
  api.put<IngredientResponse>(`/ingredients/${encodeURIComponent(id)}`, body);

export function useUpdateIngredient() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateIngredient,
    onSuccess: (saved) => {
      queryClient.setQueryData(kitchenKeys.ingredients.detail(saved.id), saved);
      return invalidateKitchen(queryClient);
    },
  });
}
