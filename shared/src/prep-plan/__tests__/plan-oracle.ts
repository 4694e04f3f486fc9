// An independent reckoning of what a set of orders needs, for tests: plates per order with the
// spare percentage in whole integers, grams per plate straight from the dessert, each order's
// components expanded on their own through the scaling module. No sharing, no runs, no rounding.
import type { KitchenIndex } from '../../kitchen/catalogue.js';
import type { Dessert } from '../../kitchen/types.js';
import { exactIngredientGrams, expandRecipe, type ExpandedRecipe } from '../../scaling/scaling.js';
import type { PrepOrderInput } from '../prep-order.js';

function gramsPerPlate(index: KitchenIndex, c: Dessert['components'][number]): number {
  if (c.unit === 'g') return c.quantity;
  return c.quantity * (c.pieceWeightG ?? index.recipe(c.recipeId).unitWeightG!);
}

export interface Reckoning {
  /** Grams of each recipe that goes on plates. */
  plateGrams: Map<string, number>;
  /** Grams of each ingredient, through every sub-recipe. */
  ingredientGrams: Map<string, number>;
  /** Grams of each recipe, on plates and inside other recipes. */
  recipeGrams: Map<string, number>;
  plates: number;
}

/** `sparePercent` must be a whole number here, so that plates are an exact integer ceiling. */
export function reckon(
  index: KitchenIndex,
  orders: readonly PrepOrderInput[],
  sparePercent: number,
): Reckoning {
  const plateGrams = new Map<string, number>();
  const ingredientGrams = new Map<string, number>();
  const recipeGrams = new Map<string, number>();
  const walk = (node: ExpandedRecipe) => {
    recipeGrams.set(node.recipe.id, (recipeGrams.get(node.recipe.id) ?? 0) + node.grams);
    for (const l of node.lines) if (l.kind === 'recipe') walk(l.node);
  };
  let plates = 0;
  const addPlate = (recipeId: string, grams: number) => {
    plateGrams.set(recipeId, (plateGrams.get(recipeId) ?? 0) + grams);
  };
  for (const order of orders) {
    const menu = index.menu(order.menuId);
    const perOrder = new Map<string, number>();
    const add = (recipeId: string, grams: number) => {
      perOrder.set(recipeId, (perOrder.get(recipeId) ?? 0) + grams);
      addPlate(recipeId, grams);
    };
    for (const dessertId of menu.dessertIds) {
      const dessert = index.dessert(dessertId);
      const n = Math.ceil((order.guestCount * (100 + sparePercent)) / 100);
      plates += n;
      for (const c of dessert.components) add(c.recipeId, gramsPerPlate(index, c) * n);
      for (const g of order.guestChanges ?? []) {
        if (g.dessertId !== dessertId) continue;
        for (const change of g.changes) {
          const c = dessert.components.find((x) => x.recipeId === change.componentRecipeId)!;
          const grams = gramsPerPlate(index, c);
          add(c.recipeId, -grams);
          if (change.replacementRecipeId) add(change.replacementRecipeId, grams);
        }
      }
    }
    for (const [recipeId, grams] of perOrder) {
      if (grams <= 1e-9) continue;
      const tree = expandRecipe(index, recipeId, grams);
      walk(tree);
      for (const [id, g] of exactIngredientGrams(tree)) {
        ingredientGrams.set(id, (ingredientGrams.get(id) ?? 0) + g);
      }
    }
  }
  return { plateGrams, ingredientGrams, recipeGrams, plates };
}
