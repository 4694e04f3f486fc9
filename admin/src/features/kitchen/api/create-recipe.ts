import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invalidateKitchen } from './invalidate-kitchen';
import { kitchenKeys } from './kitchen-keys';
import type { RecipeBody, RecipeResponse } from './types';

/** `POST /api/recipes` (chef). */
export const createRecipe = (body: RecipeBody) => api.post<RecipeResponse>('/recipes', body);

export function useCreateRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRecipe,
    onSuccess: (saved) => {
      queryClient.setQueryData(kitchenKeys.recipes.detail(saved.id), saved);
      return invalidateKitchen(queryClient);
    },
  });
}
