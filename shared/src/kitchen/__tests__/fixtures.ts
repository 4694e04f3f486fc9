// Small builders for tests. Values here are test data, not reference values.
import type { Dessert, Ingredient, Recipe, RecipeLine } from '../types.js';
import type { Unit } from '../../units/units.js';

export function ingredient(id: string, overrides: Partial<Ingredient> = {}): Ingredient {
  return {
    id,
    name: overrides.name ?? id,
    purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 1000 },
    allergens: { contains: [], mayContain: [] },
    dietary: { animalOrigins: [], alcohol: false },
    ...overrides,
  };
}

export function line(ingredientId: string, quantity: number, unit: Unit = 'g'): RecipeLine {
  return { kind: 'ingredient', ingredientId, quantity, unit };
}

export function subRecipe(recipeId: string, quantity: number, unit: Unit = 'g'): RecipeLine {
  return { kind: 'recipe', recipeId, quantity, unit };
}

export function recipe(id: string, lines: RecipeLine[], overrides: Partial<Recipe> = {}): Recipe {
  return {
    id,
    name: overrides.name ?? id,
    lines,
    yieldG: overrides.yieldG ?? 1000,
    steps: [],
    storage: 'chilled',
    shelfLifeHours: 48,
    ...overrides,
  };
}

export function dessert(
  id: string,
  components: Dessert['components'],
  overrides: Partial<Dessert> = {},
): Dessert {
  return { id, name: overrides.name ?? id, components, photos: [], ...overrides };
}
