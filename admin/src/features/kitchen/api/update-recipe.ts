import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invalidateKitchen } from './invalidate-kitchen';
import { kitchenKeys } from './kitchen-keys';
import type { RecipeBody, RecipeResponse } from './types';

/** `PUT /api/recipes/:id` (chef): replaces the whole recipe. */
export const updateRecipe = ({ id, body }: { id: string; body: RecipeBody }) =>
  api.put<RecipeResponse>(`/recipes/${encodeURIComponent(id)}`, body);

export function useUpdateRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateRecipe,
    onSuccess: (saved) => {
      queryClient.setQueryData(kitchenKeys.recipes.detail(saved.id), saved);
      return invalidateKitchen(queryClient);
    },
  });
}
