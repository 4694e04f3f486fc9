import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { kitchenKeys, type ScaleQuery } from './kitchen-keys';
import type { ScaledRecipeView } from './types';

/**
 * `GET /api/recipes/:id/scaled?grams=N` or `?plates=N&dessertId=…`: every ingredient in grams
 * and in its purchase unit, sub-recipes expanded, counted items rounded up (chef and staff).
 */
export function getRecipeScaled(id: string, query: ScaleQuery, signal?: AbortSignal) {
  const params = new URLSearchParams(
    'grams' in query
      ? { grams: String(query.grams) }
      : { plates: String(query.plates), dessertId: query.dessertId },
  );
  return api.get<ScaledRecipeView>(`/recipes/${encodeURIComponent(id)}/scaled?${params}`, {
    signal,
  });
}

export const recipeScaledQueryOptions = (id: string, query: ScaleQuery) =>
  queryOptions({
    queryKey: kitchenKeys.recipes.scaled(id, query),
    queryFn: ({ signal }) => getRecipeScaled(id, query, signal),
    placeholderData: keepPreviousData,
  });

export const useRecipeScaled = (id: string, query: ScaleQuery | null) =>
  useQuery({
    ...recipeScaledQueryOptions(id, query ?? { grams: 0 }),
    enabled: query !== null,
  });
