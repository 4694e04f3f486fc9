import { queryOptions, useQueries } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { prepKeys } from './prep-keys';
import type { RecipeLabelView } from './types';

/**
 * `GET /api/recipes/:id/allergens`: its `label` is the ingredient list with allergens
 * emphasised — the same text (shared `recipeIngredientLabel`) the Component labels PDF prints.
 */
export const getRecipeLabel = (recipeId: string, signal?: AbortSignal) =>
  api.get<RecipeLabelView>(`/recipes/${encodeURIComponent(recipeId)}/allergens`, { signal });

export const recipeLabelQueryOptions = (recipeId: string) =>
  queryOptions({
    queryKey: prepKeys.label(recipeId),
    queryFn: ({ signal }) => getRecipeLabel(recipeId, signal),
  });

/** The label texts of several recipes, by recipe id. */
export const useRecipeLabels = (recipeIds: readonly string[]) =>
  useQueries({
    queries: recipeIds.map((id) => recipeLabelQueryOptions(id)),
    combine: (results) => new Map(recipeIds.map((id, i) => [id, results[i]!] as const)),
  });
