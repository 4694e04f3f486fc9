import type { Page } from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { allergyNotesKeys } from './allergy-notes-keys';
import type { DessertComponents, RecipeChoice } from './types';

/** `GET /api/desserts/:id`: the components a substitution can leave out or replace. */
export const getDessertComponents = (dessertId: string, signal?: AbortSignal) =>
  api.get<DessertComponents>(`/desserts/${encodeURIComponent(dessertId)}`, { signal });

export const dessertComponentsQueryOptions = (dessertId: string) =>
  queryOptions({
    queryKey: allergyNotesKeys.dessert(dessertId),
    queryFn: ({ signal }) => getDessertComponents(dessertId, signal),
  });

/** `GET /api/recipes`, every page: the recipes that can replace a component, by name. */
export async function getRecipeChoices(signal?: AbortSignal): Promise<RecipeChoice[]> {
  const items: RecipeChoice[] = [];
  for (let page = 1; ; page += 1) {
    const query = new URLSearchParams({ page: String(page), pageSize: '100' });
    const answer = await api.get<Page<RecipeChoice>>(`/recipes?${query}`, { signal });
    items.push(...answer.items.map(({ id, name }) => ({ id, name })));
    if (answer.items.length === 0 || items.length >= answer.total) break;
  }
  return items.sort((a, b) => a.name.localeCompare(b.name, 'en'));
}

export const recipeChoicesQueryOptions = () =>
  queryOptions({
    queryKey: allergyNotesKeys.recipeChoices(),
    queryFn: ({ signal }) => getRecipeChoices(signal),
  });

/** Both lists, for the chef's substitution form only. */
export function useSubstitutionChoices(dessertId: string) {
  const dessert = useQuery(dessertComponentsQueryOptions(dessertId));
  const recipes = useQuery(recipeChoicesQueryOptions());
  return { dessert, recipes };
}
