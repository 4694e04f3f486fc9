import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invalidateKitchen } from './invalidate-kitchen';
import { kitchenKeys } from './kitchen-keys';
import type { IngredientBody, IngredientResponse } from './types';

/** `POST /api/ingredients` (chef). */
export const createIngredient = (body: IngredientBody) =>
  api.post<IngredientResponse>('/ingredients', body);

export function useCreateIngredient() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createIngredient,
    onSuccess: (saved) => {
      queryClient.setQueryData(kitchenKeys.ingredients.detail(saved.id), saved);
      return invalidateKitchen(queryClient);
    },
  });
}
