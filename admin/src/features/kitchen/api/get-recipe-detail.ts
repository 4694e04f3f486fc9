import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { kitchenKeys } from './kitchen-keys';
import type { RecipeResponse } from './types';

/** `GET /api/recipes/:id`. */
export const getRecipe = (id: string, signal?: AbortSignal) =>
  api.get<RecipeResponse>(`/recipes/${encodeURIComponent(id)}`, { signal });

export const recipeQueryOptions = (id: string) =>
  queryOptions({
    queryKey: kitchenKeys.recipes.detail(id),
    queryFn: ({ signal }) => getRecipe(id, signal),
  });

export const useRecipe = (id: string) => useQuery(recipeQueryOptions(id));
