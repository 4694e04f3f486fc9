import { useMemo } from 'react';
import type { KitchenCatalogueData } from './types';
import { useDesserts } from './get-desserts';
import { useIngredients } from './get-ingredients';
import { useRecipes } from './get-recipes';

/**
 * Ingredients, recipes and desserts together: what the editors compute with. The three lists
 * are ordinary cached queries (the list screens read the same ones).
 */
export function useKitchenCatalogue(currency: string) {
  const ingredients = useIngredients();
  const recipes = useRecipes();
  const desserts = useDesserts();
  const data = useMemo<KitchenCatalogueData | undefined>(
    () =>
      ingredients.data && recipes.data && desserts.data
        ? {
            currency,
            ingredients: ingredients.data,
            recipes: recipes.data,
            desserts: desserts.data,
          }
        : undefined,
    [currency, ingredients.data, recipes.data, desserts.data],
  );
  const failed = [ingredients, recipes, desserts].find((q) => q.isError);
  return {
    data,
    isPending: !data && !failed,
    error: failed?.error ?? null,
    isFetching: ingredients.isFetching || recipes.isFetching || desserts.isFetching,
    refetch: () =>
      Promise.all(
        [ingredients, recipes, desserts].filter((q) => q.isError).map((q) => q.refetch()),
      ),
  };
}
