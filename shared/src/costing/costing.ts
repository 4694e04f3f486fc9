import type { KitchenIndex } from '../kitchen/catalogue.js';
import { InvalidQuantityError, RecipeCycleError } from '../kitchen/errors.js';
import { roundHalfUp, roundMinorUnits } from '../kitchen/rounding.js';
import type { Dessert, Ingredient, Menu, Recipe } from '../kitchen/types.js';
import { componentGramsPerPlate } from '../scaling/scaling.js';
import { toGrams } from '../units/units.js';

/**
 * Costing (DESIGN.md §5). An ingredient costs its pack price ÷ the grams in the pack; a recipe
 * costs the sum of its lines ÷ its measured yield, through sub-recipes; a plate the sum of its
 * portions; a menu the sum of its desserts per guest.
 *
 * Rounding, stated: every figure is carried unrounded, in minor units (cents) as a real number,
 * and rounded half away from zero to a whole minor unit only when it is output. Rounded figures
 * are never added up: a total is the rounded exact sum, so it may differ by a cent from the sum
 * of the rounded parts shown beside it. No output is a fractional amount of money.
 */

/** Exact (unrounded) cost of one gram, in minor units. Internal: never shown as money. */
export type ExactMinorPerGram = number;

export function ingredientPackGrams(ingredient: Ingredient): number {
  return toGrams(ingredient.purchase.packSize, ingredient.purchase.packUnit, ingredient);
}

export function ingredientCostPerGramExact(ingredient: Ingredient): ExactMinorPerGram {
  const price = ingredient.purchase.packPriceMinor;
  if (!Number.isInteger(price) || price < 0) {
    throw new InvalidQuantityError(
      `The pack price of “${ingredient.name}”`,
      price,
      'whole cents, 0 or more',
    );
  }
  const grams = ingredientPackGrams(ingredient);
  if (!(grams > 0)) {
    throw new InvalidQuantityError(`The pack size of “${ingredient.name}”`, grams, 'more than 0 g');
  }
  return price / grams;
}

/** Exact cost of a whole batch and per gram of yield, memoised per index. */
interface ExactRecipeCost {
  batch: number;
  perGram: number;
  lines: Array<{
    kind: 'ingredient' | 'recipe';
    id: string;
    name: string;
    grams: number;
    cost: number;
  }>;
}

const memo = new WeakMap<KitchenIndex, Map<string, ExactRecipeCost>>();

function exactRecipeCost(
  index: KitchenIndex,
  recipe: Recipe,
  ancestors: readonly Recipe[],
): ExactRecipeCost {
  let cache = memo.get(index);
  if (!cache) {
    cache = new Map();
    memo.set(index, cache);
  }
  const cached = cache.get(recipe.id);
  if (cached) return cached;
  const loopStart = ancestors.findIndex((a) => a.id === recipe.id);
  if (loopStart >= 0) {
    const loop = [...ancestors.slice(loopStart), recipe];
    throw new RecipeCycleError(
      loop.map((r) => r.name),
      loop.map((r) => r.id),
    );
  }
  if (!(recipe.yieldG > 0)) {
    throw new InvalidQuantityError(`The yield of “${recipe.name}”`, recipe.yieldG, 'more than 0 g');
  }
  const chain = [...ancestors, recipe];
  const lines = recipe.lines.map((line) => {
    if (line.kind === 'ingredient') {
      const ing = index.ingredient(line.ingredientId, recipe.name);
      const grams = toGrams(line.quantity, line.unit, ing);
      return {
        kind: 'ingredient' as const,
        id: ing.id,
        name: ing.name,
        grams,
        cost: grams * ingredientCostPerGramExact(ing),
      };
    }
    const sub = index.recipe(line.recipeId, recipe.name);
    const grams = toGrams(line.quantity, line.unit, sub);
    return {
      kind: 'recipe' as const,
      id: sub.id,
      name: sub.name,
      grams,
      cost: grams * exactRecipeCost(index, sub, chain).perGram,
    };
  });
  const batch = lines.reduce((s, l) => s + l.cost, 0);
  const result = { batch, perGram: batch / recipe.yieldG, lines };
  cache.set(recipe.id, result);
  return result;
}

export function recipeCostPerGramExact(index: KitchenIndex, recipeId: string): ExactMinorPerGram {
  return exactRecipeCost(index, index.recipe(recipeId), []).perGram;
}

export interface CostLine {
  kind: 'ingredient' | 'recipe';
  id: string;
  name: string;
  grams: number;
  costMinor: number;
  /** Share of the batch cost, per cent, one decimal. */
  sharePercent: number;
}

export interface RecipeCost {
  recipeId: string;
  name: string;
  currency: string;
  yieldG: number;
  batchCostMinor: number;
  costPerKgMinor: number;
  lines: CostLine[];
}

export function costRecipe(index: KitchenIndex, recipeId: string): RecipeCost {
  const recipe = index.recipe(recipeId);
  const exact = exactRecipeCost(index, recipe, []);
  return {
    recipeId: recipe.id,
    name: recipe.name,
    currency: index.currency,
    yieldG: recipe.yieldG,
    batchCostMinor: roundMinorUnits(exact.batch),
    costPerKgMinor: roundMinorUnits(exact.perGram * 1000),
    lines: exact.lines.map((l) => ({
      kind: l.kind,
      id: l.id,
      name: l.name,
      grams: roundHalfUp(l.grams, 3),
      costMinor: roundMinorUnits(l.cost),
      sharePercent: exact.batch > 0 ? roundHalfUp((l.cost / exact.batch) * 100, 1) : 0,
    })),
  };
}

function plateCostExact(index: KitchenIndex, dessert: Dessert) {
  const components = dessert.components.map((c) => {
    const recipe = index.recipe(c.recipeId, dessert.name);
    const grams = componentGramsPerPlate(index, dessert, c);
    return { recipe, grams, cost: grams * exactRecipeCost(index, recipe, []).perGram };
  });
  return { components, total: components.reduce((s, c) => s + c.cost, 0) };
}

export function plateCostExactMinor(index: KitchenIndex, dessertId: string): number {
  return plateCostExact(index, index.dessert(dessertId)).total;
}

export interface PlateCost {
  dessertId: string;
  name: string;
  currency: string;
  plateCostMinor: number;
  components: Array<{ recipeId: string; name: string; grams: number; costMinor: number }>;
}

export function costDessertPlate(index: KitchenIndex, dessertOrId: string | Dessert): PlateCost {
  const dessert = typeof dessertOrId === 'string' ? index.dessert(dessertOrId) : dessertOrId;
  const exact = plateCostExact(index, dessert);
  return {
    dessertId: dessert.id,
    name: dessert.name,
    currency: index.currency,
    plateCostMinor: roundMinorUnits(exact.total),
    components: exact.components.map((c) => ({
      recipeId: c.recipe.id,
      name: c.recipe.name,
      grams: roundHalfUp(c.grams, 3),
      costMinor: roundMinorUnits(c.cost),
    })),
  };
}

/** Food cost as a percentage of a price, one decimal. Both in minor units; cost may be exact. */
export function foodCostPercent(costMinor: number, priceMinor: number): number {
  if (!Number.isInteger(priceMinor) || priceMinor <= 0) {
    throw new InvalidQuantityError('The price', priceMinor, 'whole cents, more than 0');
  }
  return roundHalfUp((costMinor / priceMinor) * 100, 1);
}

/**
 * The lowest price at which `costMinor` is at most `targetPercent` of it, rounded UP to a whole
 * multiple of `stepMinor` (1 = any cent; 50 = half-euros) so the target is always met.
 */
export function priceForTargetFoodCost(
  costMinor: number,
  targetPercent: number,
  stepMinor = 1,
): number {
  if (!(targetPercent > 0 && targetPercent < 100)) {
    throw new InvalidQuantityError(
      'The target food cost',
      targetPercent,
      'a percentage between 0 and 100',
    );
  }
  if (!Number.isInteger(stepMinor) || stepMinor < 1) {
    throw new InvalidQuantityError(
      'The price step',
      stepMinor,
      'a whole number of cents, 1 or more',
    );
  }
  if (!(costMinor >= 0)) throw new InvalidQuantityError('The cost', costMinor, '0 or more');
  const exact = (costMinor * 100) / targetPercent;
  const steps = Math.ceil(Number((exact / stepMinor).toPrecision(15)));
  return steps * stepMinor;
}

export interface MenuCost {
  menuId: string;
  name: string;
  currency: string;
  costPerGuestMinor: number;
  pricePerGuestMinor: number;
  /** Cost ÷ price per guest × 100, one decimal (the price as stored: state whether it includes tax). */
  foodCostPercent: number;
  desserts: PlateCost[];
}

function menuCostExact(index: KitchenIndex, menu: Menu): number {
  return menu.dessertIds.reduce(
    (s, id) => s + plateCostExact(index, index.dessert(id, menu.name)).total,
    0,
  );
}

export function costMenu(index: KitchenIndex, menuOrId: string | Menu): MenuCost {
  const menu = typeof menuOrId === 'string' ? index.menu(menuOrId) : menuOrId;
  const exact = menuCostExact(index, menu);
  return {
    menuId: menu.id,
    name: menu.name,
    currency: index.currency,
    costPerGuestMinor: roundMinorUnits(exact),
    pricePerGuestMinor: menu.pricePerGuestMinor,
    foodCostPercent: foodCostPercent(exact, menu.pricePerGuestMinor),
    desserts: menu.dessertIds.map((id) => costDessertPlate(index, index.dessert(id, menu.name))),
  };
}

/** The price per guest that meets `targetPercent` food cost for a menu (computed from the exact cost). */
export function suggestMenuPrice(
  index: KitchenIndex,
  menuOrId: string | Menu,
  targetPercent: number,
  stepMinor = 1,
): number {
  const menu = typeof menuOrId === 'string' ? index.menu(menuOrId) : menuOrId;
  return priceForTargetFoodCost(menuCostExact(index, menu), targetPercent, stepMinor);
}
