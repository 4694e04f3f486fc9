import { ingredientPackGrams } from '../costing/costing.js';
import { componentGramsPerPlate } from '../scaling/scaling.js';
import { toGrams } from '../units/units.js';
import { createKitchenIndex, findRecipeCycle, type KitchenIndex } from './catalogue.js';
import { isKitchenError } from './errors.js';
import type { KitchenCatalogue } from './types.js';

export interface CatalogueProblem {
  kind: 'ingredient' | 'recipe' | 'dessert' | 'menu' | 'catalogue';
  id: string;
  message: string;
}

function attempt(
  problems: CatalogueProblem[],
  kind: CatalogueProblem['kind'],
  id: string,
  fn: () => void,
): void {
  try {
    fn();
  } catch (e) {
    if (!isKitchenError(e)) throw e;
    problems.push({ kind, id, message: e.message });
  }
}

/**
 * Every problem that would stop the computation on this catalogue: references that do not
 * resolve, quantities that cannot become grams, packs that cannot be priced, loops of recipes.
 * Empty when the catalogue is consistent.
 */
export function findCatalogueProblems(catalogue: KitchenCatalogue): CatalogueProblem[] {
  const problems: CatalogueProblem[] = [];
  let index: KitchenIndex | undefined;
  attempt(problems, 'catalogue', '', () => {
    index = createKitchenIndex(catalogue);
  });
  if (!index) return problems;
  const idx = index;

  for (const ing of catalogue.ingredients) {
    attempt(problems, 'ingredient', ing.id, () => ingredientPackGrams(ing));
  }
  for (const recipe of catalogue.recipes) {
    recipe.lines.forEach((line) => {
      attempt(problems, 'recipe', recipe.id, () => {
        const item =
          line.kind === 'ingredient'
            ? idx.ingredient(line.ingredientId, recipe.name)
            : idx.recipe(line.recipeId, recipe.name);
        toGrams(line.quantity, line.unit, item);
      });
    });
  }
  const cycle = findRecipeCycle(catalogue.recipes);
  if (cycle) {
    problems.push({
      kind: 'recipe',
      id: cycle.ids[0] ?? '',
      message: `These recipes use each other in a loop: ${cycle.names.join(' → ')}.`,
    });
  }
  for (const dessert of catalogue.desserts) {
    for (const c of dessert.components) {
      attempt(problems, 'dessert', dessert.id, () => componentGramsPerPlate(idx, dessert, c));
    }
  }
  for (const menu of catalogue.menus) {
    for (const id of menu.dessertIds) {
      attempt(problems, 'menu', menu.id, () => idx.dessert(id, menu.name));
    }
  }
  return problems;
}
