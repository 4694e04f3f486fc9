import { queryOptions, useQuery } from '@tanstack/react-query';
import { fetchAllPages } from './fetch-all-pages';
import { kitchenKeys } from './kitchen-keys';
import type { RecipeResponse } from './types';

/** `GET /api/recipes`, every page: the whole list, by name. */
export const getRecipes = (signal?: AbortSignal) =>
  fetchAllPages<RecipeResponse>('/recipes', signal);

export const recipesQueryOptions = () =>
  queryOptions({
    queryKey: kitchenKeys.recipes.list(),
    queryFn: ({ signal }) => getRecipes(signal),
  });

export const useRecipes = () => useQuery(recipesQueryOptions());
