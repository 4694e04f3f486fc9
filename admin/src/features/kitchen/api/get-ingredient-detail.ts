import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { kitchenKeys } from './kitchen-keys';
import type { IngredientResponse } from './types';

/** `GET /api/ingredients/:id`. */
export const getIngredient = (id: string, signal?: AbortSignal) =>
  api.get<IngredientResponse>(`/ingredients/${encodeURIComponent(id)}`, { signal });

export const ingredientQueryOptions = (id: string) =>
  queryOptions({
    queryKey: kitchenKeys.ingredients.detail(id),
    queryFn: ({ signal }) => getIngredient(id, signal),
  });

export const useIngredient = (id: string) => useQuery(ingredientQueryOptions(id));
