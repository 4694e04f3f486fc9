import { KitchenError, RecipeCycleError, UnknownReferenceError } from './errors.js';
import type { Dessert, Ingredient, KitchenCatalogue, Menu, Recipe } from './types.js';

export class DuplicateIdError extends KitchenError {
  readonly code = 'duplicate_id';

  constructor(
    readonly kind: string,
    readonly id: string,
  ) {
    super(`Two ${kind}s share the id ${id}.`);
  }
}

/** Look-ups over a loaded catalogue. Every computation takes one of these. */
export class KitchenIndex {
  readonly currency: string;
  private readonly ingredients = new Map<string, Ingredient>();
  private readonly recipes = new Map<string, Recipe>();
  private readonly desserts = new Map<string, Dessert>();
  private readonly menus = new Map<string, Menu>();

  constructor(catalogue: Partial<KitchenCatalogue>) {
    this.currency = catalogue.currency ?? 'EUR';
    fill(this.ingredients, catalogue.ingredients, 'ingredient');
    fill(this.recipes, catalogue.recipes, 'recipe');
    fill(this.desserts, catalogue.desserts, 'dessert');
    fill(this.menus, catalogue.menus, 'menu');
  }

  ingredient(id: string, referencedFrom?: string): Ingredient {
    const found = this.ingredients.get(id);
    if (!found) throw new UnknownReferenceError('ingredient', id, referencedFrom);
    return found;
  }

  recipe(id: string, referencedFrom?: string): Recipe {
    const found = this.recipes.get(id);
    if (!found) throw new UnknownReferenceError('recipe', id, referencedFrom);
    return found;
  }

  dessert(id: string, referencedFrom?: string): Dessert {
    const found = this.desserts.get(id);
    if (!found) throw new UnknownReferenceError('dessert', id, referencedFrom);
    return found;
  }

  menu(id: string): Menu {
    const found = this.menus.get(id);
    if (!found) throw new UnknownReferenceError('menu', id);
    return found;
  }

  hasRecipe(id: string): boolean {
    return this.recipes.has(id);
  }

  allIngredients(): Ingredient[] {
    return [...this.ingredients.values()];
  }

  allRecipes(): Recipe[] {
    return [...this.recipes.values()];
  }

  allDesserts(): Dessert[] {
    return [...this.desserts.values()];
  }

  allMenus(): Menu[] {
    return [...this.menus.values()];
  }
}

function fill<T extends { id: string }>(
  map: Map<string, T>,
  items: readonly T[] | undefined,
  kind: string,
): void {
  for (const item of items ?? []) {
    if (map.has(item.id)) throw new DuplicateIdError(kind, item.id);
    map.set(item.id, item);
  }
}

export function createKitchenIndex(catalogue: Partial<KitchenCatalogue>): KitchenIndex {
  return new KitchenIndex(catalogue);
}

/**
 * The first loop among `recipes` through their sub-recipe lines, as recipe names with the first
 * repeated at the end ("Praline → Crumble → Praline"), or null. Lines pointing at recipes not in
 * the list are ignored here (they are reported as unknown references elsewhere). The API calls
 * this with the saved recipes plus the one being saved, before saving it.
 */
export function findRecipeCycle(
  recipes: readonly Recipe[],
): { names: string[]; ids: string[] } | null {
  const byId = new Map(recipes.map((r) => [r.id, r]));
  const state = new Map<string, 'open' | 'done'>();
  const stack: string[] = [];

  const visit = (id: string): string[] | null => {
    state.set(id, 'open');
    stack.push(id);
    const recipe = byId.get(id);
    for (const line of recipe?.lines ?? []) {
      if (line.kind !== 'recipe' || !byId.has(line.recipeId)) continue;
      const s = state.get(line.recipeId);
      if (s === 'open') return [...stack.slice(stack.indexOf(line.recipeId)), line.recipeId];
      if (s === undefined) {
        const found = visit(line.recipeId);
        if (found) return found;
      }
    }
    stack.pop();
    state.set(id, 'done');
    return null;
  };

  for (const r of recipes) {
    if (state.has(r.id)) continue;
    const ids = visit(r.id);
    if (ids) return { ids, names: ids.map((id) => byId.get(id)?.name ?? id) };
  }
  return null;
}

/** Throws RecipeCycleError naming the loop when `recipes` use each other in a circle. */
export function assertNoRecipeCycle(recipes: readonly Recipe[]): void {
  const cycle = findRecipeCycle(recipes);
  if (cycle) throw new RecipeCycleError(cycle.names, cycle.ids);
}
