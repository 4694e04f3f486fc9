import type { KitchenIndex } from '../kitchen/catalogue.js';
import { InvalidQuantityError, RecipeCycleError } from '../kitchen/errors.js';
import { piecesCovering, roundHalfUp, roundKitchenGrams, tidy } from '../kitchen/rounding.js';
import type { Dessert, Ingredient, Recipe } from '../kitchen/types.js';
import { canConvert, fromGrams, toGrams, type Unit } from '../units/units.js';

/**
 * Scaling (DESIGN.md §2): factor = grams needed ÷ measured yield; a sub-recipe line asks its
 * recipe for that many grams, recursively; a loop is an error naming it. Everything is carried
 * unrounded; rounding happens once, on output: ≥ 100 g to 1 g, < 100 g to 0.1 g, and ingredients
 * the kitchen counts (eggs, gelatin leaves) up to whole pieces, with the grams those pieces weigh.
 */

// ---------------------------------------------------------------- the exact expansion

export interface ExpandedIngredientLine {
  kind: 'ingredient';
  lineIndex: number;
  ingredient: Ingredient;
  /** Unrounded grams at this scale. */
  grams: number;
  /** The line's own unit and quantity at this scale (unrounded). */
  quantity: number;
  unit: Unit;
}

export interface ExpandedRecipeLine {
  kind: 'recipe';
  lineIndex: number;
  node: ExpandedRecipe;
  quantity: number;
  unit: Unit;
}

export type ExpandedLine = ExpandedIngredientLine | ExpandedRecipeLine;

export interface ExpandedRecipe {
  recipe: Recipe;
  /** Unrounded grams of this recipe needed. */
  grams: number;
  factor: number;
  /** Recipe names from the outermost recipe down to this one. */
  path: string[];
  lines: ExpandedLine[];
}

function assertGrams(grams: number, what: string): void {
  if (!Number.isFinite(grams) || grams < 0) {
    throw new InvalidQuantityError(what, grams, 'a number of grams, 0 or more');
  }
}

/**
 * The recipe tree for `grams` of `recipeId`, unrounded. Throws RecipeCycleError when a recipe
 * uses itself through its sub-recipes, UnknownReferenceError for a missing ingredient or recipe,
 * MissingConversionError when a line's unit cannot be turned into grams.
 */
export function expandRecipe(
  index: KitchenIndex,
  recipeId: string,
  grams: number,
  ancestors: readonly Recipe[] = [],
  referencedFrom?: string,
): ExpandedRecipe {
  assertGrams(grams, 'The amount to make');
  const recipe = index.recipe(recipeId, referencedFrom);
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
  const factor = grams / recipe.yieldG;
  const chain = [...ancestors, recipe];
  const path = chain.map((r) => r.name);
  const lines = recipe.lines.map((line, lineIndex): ExpandedLine => {
    const quantity = line.quantity * factor;
    if (line.kind === 'ingredient') {
      const ingredient = index.ingredient(line.ingredientId, recipe.name);
      return {
        kind: 'ingredient',
        lineIndex,
        ingredient,
        grams: toGrams(line.quantity, line.unit, ingredient) * factor,
        quantity,
        unit: line.unit,
      };
    }
    const sub = index.recipe(line.recipeId, recipe.name);
    const subGrams = toGrams(line.quantity, line.unit, sub) * factor;
    return {
      kind: 'recipe',
      lineIndex,
      node: expandRecipe(index, sub.id, subGrams, chain, recipe.name),
      quantity,
      unit: line.unit,
    };
  });
  return { recipe, grams, factor, path, lines };
}

/** Visit every ingredient line of a tree with the path of recipes that holds it. */
export function forEachIngredientLine(
  node: ExpandedRecipe,
  visit: (line: ExpandedIngredientLine, holder: ExpandedRecipe) => void,
): void {
  for (const line of node.lines) {
    if (line.kind === 'ingredient') visit(line, node);
    else forEachIngredientLine(line.node, visit);
  }
}

/** Unrounded grams per ingredient id in a tree. */
export function exactIngredientGrams(node: ExpandedRecipe): Map<string, number> {
  const totals = new Map<string, number>();
  forEachIngredientLine(node, (line) => {
    totals.set(line.ingredient.id, (totals.get(line.ingredient.id) ?? 0) + line.grams);
  });
  return totals;
}

/** Grams of a dessert component on one plate. */
export function componentGramsPerPlate(
  index: KitchenIndex,
  dessert: Dessert,
  component: Dessert['components'][number],
): number {
  if (component.unit === 'g') return component.quantity;
  const recipe = index.recipe(component.recipeId, dessert.name);
  const pieceWeight = component.pieceWeightG ?? recipe.unitWeightG;
  return toGrams(component.quantity, 'piece', {
    id: recipe.id,
    name: recipe.name,
    unitWeightG: pieceWeight,
  });
}

// ---------------------------------------------------------------- rounded output

export interface CountedAmount {
  countUnit: 'piece' | 'leaf';
  pieces: number;
  unitWeightG: number;
}

export interface ScaledIngredientLine {
  kind: 'ingredient';
  ingredientId: string;
  name: string;
  exactGrams: number;
  /** What to weigh: the kitchen rounding, or the weight of the whole pieces for counted items. */
  grams: number;
  /** The line's own unit, scaled (two decimals). */
  quantity: number;
  unit: Unit;
  counted?: CountedAmount;
}

export interface ScaledSubRecipeLine {
  kind: 'recipe';
  recipe: ScaledRecipe;
}

export type ScaledLine = ScaledIngredientLine | ScaledSubRecipeLine;

export interface ScaledRecipe {
  recipeId: string;
  name: string;
  exactGrams: number;
  grams: number;
  factor: number;
  yieldG: number;
  lines: ScaledLine[];
}

export interface IngredientTotal {
  ingredientId: string;
  name: string;
  exactGrams: number;
  grams: number;
  counted?: CountedAmount;
  /** The same amount in the unit the ingredient is bought in (three decimals), when convertible. */
  inPurchaseUnit?: { quantity: number; unit: Unit };
}

function countedFor(ingredient: Ingredient, exactGrams: number): CountedAmount | undefined {
  if (!ingredient.countUnit || !ingredient.unitWeightG) return undefined;
  return {
    countUnit: ingredient.countUnit,
    pieces: piecesCovering(exactGrams, ingredient.unitWeightG),
    unitWeightG: ingredient.unitWeightG,
  };
}

function roundLine(line: ExpandedIngredientLine): ScaledIngredientLine {
  const counted = countedFor(line.ingredient, line.grams);
  return {
    kind: 'ingredient',
    ingredientId: line.ingredient.id,
    name: line.ingredient.name,
    exactGrams: tidy(line.grams),
    grams: counted ? tidy(counted.pieces * counted.unitWeightG) : roundKitchenGrams(line.grams),
    quantity: roundHalfUp(line.quantity, 2),
    unit: line.unit,
    ...(counted ? { counted } : {}),
  };
}

export function roundTree(node: ExpandedRecipe): ScaledRecipe {
  return {
    recipeId: node.recipe.id,
    name: node.recipe.name,
    exactGrams: tidy(node.grams),
    grams: roundKitchenGrams(node.grams),
    factor: tidy(node.factor),
    yieldG: node.recipe.yieldG,
    lines: node.lines.map((line): ScaledLine =>
      line.kind === 'ingredient'
        ? roundLine(line)
        : { kind: 'recipe', recipe: roundTree(line.node) },
    ),
  };
}

/**
 * Ingredient totals over several trees. Counted items are totalled in whole pieces line by line
 * (each batch uses whole eggs and whole leaves); everything else is summed unrounded and rounded
 * once. Sorted by weight, heaviest first.
 */
export function totalIngredients(trees: readonly ExpandedRecipe[]): IngredientTotal[] {
  const acc = new Map<string, { ingredient: Ingredient; exact: number; pieces: number }>();
  for (const tree of trees) {
    forEachIngredientLine(tree, (line) => {
      const entry = acc.get(line.ingredient.id) ?? {
        ingredient: line.ingredient,
        exact: 0,
        pieces: 0,
      };
      entry.exact += line.grams;
      entry.pieces += countedFor(line.ingredient, line.grams)?.pieces ?? 0;
      acc.set(line.ingredient.id, entry);
    });
  }
  const totals = [...acc.values()].map(({ ingredient, exact, pieces }): IngredientTotal => {
    const counted =
      ingredient.countUnit && ingredient.unitWeightG
        ? { countUnit: ingredient.countUnit, pieces, unitWeightG: ingredient.unitWeightG }
        : undefined;
    const grams = counted ? tidy(pieces * counted.unitWeightG) : roundKitchenGrams(exact);
    const packUnit = ingredient.purchase.packUnit;
    return {
      ingredientId: ingredient.id,
      name: ingredient.name,
      exactGrams: tidy(exact),
      grams,
      ...(counted ? { counted } : {}),
      ...(canConvert(packUnit, ingredient)
        ? {
            inPurchaseUnit: {
              quantity: roundHalfUp(fromGrams(grams, packUnit, ingredient), 3),
              unit: packUnit,
            },
          }
        : {}),
    };
  });
  return totals.sort((a, b) => b.exactGrams - a.exactGrams || a.name.localeCompare(b.name));
}

export interface ScaleResult {
  tree: ScaledRecipe;
  totals: IngredientTotal[];
}

/** `targetGrams` of a recipe: the per-recipe tree and the flattened ingredient totals. */
export function scaleRecipe(
  index: KitchenIndex,
  recipeId: string,
  targetGrams: number,
): ScaleResult {
  const tree = expandRecipe(index, recipeId, targetGrams);
  return { tree: roundTree(tree), totals: totalIngredients([tree]) };
}

export interface RecipeNeed {
  recipeId: string;
  grams: number;
}

/** Several recipes at once (a dessert, a day's production): one tree each, totals across all. */
export function scaleRecipes(
  index: KitchenIndex,
  needs: readonly RecipeNeed[],
): { trees: ScaledRecipe[]; totals: IngredientTotal[] } {
  const trees = needs.map((n) => expandRecipe(index, n.recipeId, n.grams));
  return { trees: trees.map(roundTree), totals: totalIngredients(trees) };
}

export interface ScaledDessert {
  dessertId: string;
  name: string;
  plates: number;
  components: Array<{
    recipeId: string;
    name: string;
    gramsPerPlate: number;
    recipe: ScaledRecipe;
  }>;
  totals: IngredientTotal[];
}

/** Every component of a dessert for `plates` plates. */
export function scaleDessert(
  index: KitchenIndex,
  dessertId: string,
  plates: number,
): ScaledDessert {
  if (!Number.isInteger(plates) || plates < 0) {
    throw new InvalidQuantityError('The number of plates', plates, 'a whole number, 0 or more');
  }
  const dessert = index.dessert(dessertId);
  const trees = dessert.components.map((c) =>
    expandRecipe(
      index,
      c.recipeId,
      componentGramsPerPlate(index, dessert, c) * plates,
      [],
      dessert.name,
    ),
  );
  return {
    dessertId: dessert.id,
    name: dessert.name,
    plates,
    components: trees.map((t, i) => ({
      recipeId: t.recipe.id,
      name: t.recipe.name,
      gramsPerPlate: tidy(componentGramsPerPlate(index, dessert, dessert.components[i]!)),
      recipe: roundTree(t),
    })),
    totals: totalIngredients(trees),
  };
}
