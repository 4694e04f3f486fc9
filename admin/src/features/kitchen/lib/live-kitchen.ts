import {
  computeMixBalance,
  costDessertPlate,
  costRecipe,
  createKitchenIndex,
  dessertIngredientLabel,
  findRecipeCycle,
  isKitchenError,
  recipeIngredientLabel,
  rollUpDessert,
  rollUpRecipe,
  toGrams,
  usContainsStatement,
  type AllergenReport,
  type Dessert,
  type Ingredient,
  type IngredientLabel,
  type KitchenIndex,
  type MixBalance,
  type PlateCost,
  type Recipe,
  type RecipeCost,
  type RecipeLine,
} from '@nappe/shared';
import type { DessertResponse, IngredientResponse, RecipeResponse } from '../api/types';

/**
 * The kitchen computation run in the browser, over the catalogue loaded from the API, with the
 * draft being edited in place of its saved version: the same shared functions the server runs,
 * so what the chef sees while typing is what the server will say after saving.
 */

export type Outcome<T> = { ok: true; value: T } | { ok: false; message: string };

/** Runs `work`; a kitchen error (a missing density, a loop…) becomes its message for the chef. */
export function attempt<T>(work: () => T): Outcome<T> {
  try {
    return { ok: true, value: work() };
  } catch (error) {
    if (isKitchenError(error)) return { ok: false, message: error.message };
    return {
      ok: false,
      message: 'This could not be worked out from what is entered so far.',
    };
  }
}

/** Staff receive no prices: their copy prices every pack at 0, and costs are never shown to them. */
export function toDomainIngredient(response: IngredientResponse): Ingredient {
  return {
    ...response,
    purchase: { ...response.purchase, packPriceMinor: response.purchase.packPriceMinor ?? 0 },
  };
}

export function toDomainRecipe(response: RecipeResponse): Recipe {
  return {
    id: response.id,
    name: response.name,
    lines: response.lines,
    yieldG: response.yieldG,
    steps: response.steps,
    storage: response.storage,
    shelfLifeHours: response.shelfLifeHours,
    ...(response.equipment ? { equipment: response.equipment } : {}),
    ...(response.densityGPerMl !== undefined ? { densityGPerMl: response.densityGPerMl } : {}),
    ...(response.unitWeightG !== undefined ? { unitWeightG: response.unitWeightG } : {}),
    ...(response.notes !== undefined ? { notes: response.notes } : {}),
  };
}

export function toDomainDessert(response: DessertResponse): Dessert {
  return {
    id: response.id,
    name: response.name,
    components: response.components,
    photos: response.photos.map((p) => p.id),
    ...(response.description !== undefined ? { description: response.description } : {}),
    ...(response.platingNotes !== undefined ? { platingNotes: response.platingNotes } : {}),
  };
}

export interface LoadedCatalogue {
  currency: string;
  ingredients: readonly IngredientResponse[];
  recipes: readonly RecipeResponse[];
  desserts?: readonly DessertResponse[];
}

/** The id a recipe or dessert has while it is being created. */
export const DRAFT_ID = 'draft';

/** An index of the catalogue with `draft` in place of the saved item of the same id. */
export function indexWith(
  catalogue: LoadedCatalogue,
  draft: { recipe?: Recipe; dessert?: Dessert } = {},
): KitchenIndex {
  const recipes = catalogue.recipes.filter((r) => r.id !== draft.recipe?.id).map(toDomainRecipe);
  const desserts = (catalogue.desserts ?? [])
    .filter((d) => d.id !== draft.dessert?.id)
    .map(toDomainDessert);
  return createKitchenIndex({
    currency: catalogue.currency,
    ingredients: catalogue.ingredients.map(toDomainIngredient),
    recipes: draft.recipe ? [...recipes, draft.recipe] : recipes,
    desserts: draft.dessert ? [...desserts, draft.dessert] : desserts,
  });
}

export interface AllergenView {
  report: AllergenReport;
  label: IngredientLabel;
  usStatement: string | null;
}

export interface RecipeInsights {
  cost: Outcome<RecipeCost> | null;
  allergens: Outcome<AllergenView>;
  /** Only for frozen recipes. */
  mix: Outcome<MixBalance> | null;
}

export function recipeInsights(
  index: KitchenIndex,
  recipe: Recipe,
  options: { withCost: boolean; overrunPercent?: number },
): RecipeInsights {
  return {
    cost: options.withCost ? attempt(() => costRecipe(index, recipe.id)) : null,
    allergens: attempt(() => {
      const report = rollUpRecipe(index, recipe.id);
      return {
        report,
        label: recipeIngredientLabel(index, recipe.id),
        usStatement: usContainsStatement(report),
      };
    }),
    mix:
      recipe.storage === 'frozen'
        ? attempt(() =>
            computeMixBalance(
              index,
              recipe.id,
              options.overrunPercent !== undefined
                ? { overrunPercent: options.overrunPercent }
                : {},
            ),
          )
        : null,
  };
}

export interface DessertInsights {
  cost: Outcome<PlateCost> | null;
  allergens: Outcome<AllergenView>;
}

export function dessertInsights(
  index: KitchenIndex,
  dessert: Dessert,
  options: { withCost: boolean },
): DessertInsights {
  return {
    cost: options.withCost ? attempt(() => costDessertPlate(index, dessert)) : null,
    allergens: attempt(() => {
      const report = rollUpDessert(index, dessert);
      return {
        report,
        label: dessertIngredientLabel(index, dessert),
        usStatement: usContainsStatement(report),
      };
    }),
  };
}

/** Grams of one line, or why it cannot be weighed (a volume without density, a piece without weight). */
export function lineGrams(index: KitchenIndex, line: RecipeLine, holder: string): Outcome<number> {
  return attempt(() => {
    const item =
      line.kind === 'ingredient'
        ? index.ingredient(line.ingredientId, holder)
        : index.recipe(line.recipeId, holder);
    return toGrams(line.quantity, line.unit, item);
  });
}

/**
 * The recipe the loop through `draftId` enters next, with the loop's names, or null. The line
 * of the draft that points at `enters` is where the loop is broken.
 */
export function cycleThrough(
  index: KitchenIndex,
  draftId: string,
): { enters: string; names: string[] } | null {
  const cycle = findRecipeCycle(index.allRecipes());
  if (!cycle) return null;
  const at = cycle.ids.indexOf(draftId);
  if (at < 0 || at + 1 >= cycle.ids.length) return null;
  return { enters: cycle.ids[at + 1]!, names: cycle.names };
}
