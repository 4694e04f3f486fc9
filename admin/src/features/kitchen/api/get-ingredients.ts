import { queryOptions, useQuery } from '@tanstack/react-query';
import { fetchAllPages } from './fetch-all-pages';
import { kitchenKeys } from './kitchen-keys';
import type { IngredientResponse } from './types';

/** `GET /api/ingredients`, every page: the whole list, by name. */
export const getIngredients = (signal?: AbortSignal) =>
  fetchAllPages<IngredientResponse>('/ingredients', signal);

export const ingredientsQueryOptions = () =>
  queryOptions({
    queryKey: kitchenKeys.ingredients.list(),
    queryFn: ({ signal }) => getIngredients(signal),
  });

export const useIngredients = () => useQuery(ingredientsQueryOptions());
