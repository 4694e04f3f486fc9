import { cautionForStep, storageCaution, type Recipe } from '@nappe/shared';
import { recipeFromRows } from '../catalogue/catalogue-rows.js';
import type { RecipeLineEntity } from '../entities/recipe-line.entity.js';
import type { RecipeEntity } from '../entities/recipe.entity.js';

/**
 * A recipe as the API shows it: the domain shape (editable and sendable back without the
 * server's fields), the names of what its lines point at, and the safety cautions the kitchen
 * computation suggests for each step and for its storage (shown where the chef wrote none).
 */
export type RecipeResponse = Recipe & {
  /** Name of every ingredient and sub-recipe its lines use, by id. */
  referenceNames: Record<string, string>;
  suggestedCautions: { steps: Array<string | null>; storage: string | null };
  createdAt: string;
  updatedAt: string;
};

export function toRecipeResponse(
  row: RecipeEntity,
  lines: readonly RecipeLineEntity[],
  names: ReadonlyMap<string, string>,
): RecipeResponse {
  const recipe = recipeFromRows(row, lines);
  const referenceNames: Record<string, string> = {};
  for (const line of recipe.lines) {
    const ref = line.kind === 'ingredient' ? line.ingredientId : line.recipeId;
    referenceNames[ref] = names.get(ref) ?? ref;
  }
  return {
    ...recipe,
    referenceNames,
    suggestedCautions: {
      steps: recipe.steps.map((step) => cautionForStep(step) ?? null),
      storage: storageCaution(recipe.storage) ?? null,
    },
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}
