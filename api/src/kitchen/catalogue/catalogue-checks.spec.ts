import { BadRequestException, ConflictException } from '@nestjs/common';
import type { Dessert, Ingredient, KitchenCatalogue, Recipe } from '@nappe/shared';
import { describe, expect, it } from 'vitest';
import {
  assertWriteKeepsCatalogue,
  catalogueProblems,
  inUseMessage,
  usersOf,
} from './catalogue-checks.js';

// Test data, not reference values.
const ingredient = (id: string, extra: Partial<Ingredient> = {}): Ingredient => ({
  id,
  name: id,
  purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 100 },
  allergens: { contains: [], mayContain: [] },
  dietary: { animalOrigins: [], alcohol: false },
  ...extra,
});
const recipe = (id: string, lines: Recipe['lines']): Recipe => ({
  id,
  name: id,
  lines,
  yieldG: 100,
  steps: [],
  storage: 'dry',
  shelfLifeHours: 24,
});
const dessert = (id: string, recipeId: string): Dessert => ({
  id,
  name: id,
  components: [{ recipeId, quantity: 10, unit: 'g' }],
  photos: [],
});

const base: KitchenCatalogue = {
  currency: 'EUR',
  ingredients: [ingredient('Milk', { densityGPerMl: 1.03 }), ingredient('Sugar')],
  recipes: [
    recipe('Syrup', [{ kind: 'ingredient', ingredientId: 'Sugar', quantity: 50, unit: 'g' }]),
    recipe('Custard', [
      { kind: 'ingredient', ingredientId: 'Milk', quantity: 100, unit: 'ml' },
      { kind: 'recipe', recipeId: 'Syrup', quantity: 20, unit: 'g' },
    ]),
  ],
  desserts: [dessert('Plate', 'Custard')],
  menus: [],
};

const thrown = (fn: () => void): unknown => {
  try {
    fn();
  } catch (error) {
    return error;
  }
  return undefined;
};
const body = (error: unknown) =>
  (error as BadRequestException).getResponse() as { message: unknown };

describe('assertWriteKeepsCatalogue', () => {
  it('passes a write that keeps every reference and conversion', () => {
    const after = { ...base, ingredients: [...base.ingredients, ingredient('Salt')] };
    expect(() =>
      assertWriteKeepsCatalogue(base, after, { kind: 'ingredient', id: 'Salt', name: 'Salt' }),
    ).not.toThrow();
  });

  it('blames the written thing with 400 (shared message)', () => {
    const broken = recipe('Syrup', [
      { kind: 'ingredient', ingredientId: 'Nope', quantity: 1, unit: 'g' },
    ]);
    const after = { ...base, recipes: [broken, base.recipes[1]!] };
    const error = thrown(() =>
      assertWriteKeepsCatalogue(base, after, { kind: 'recipe', id: 'Syrup', name: 'Syrup' }),
    );
    expect(error).toBeInstanceOf(BadRequestException);
    expect(body(error).message).toEqual([
      '“Syrup” uses an ingredient that no longer exists (id Nope). Remove that line or pick another ingredient.',
    ]);
  });

  it('answers 409 when the write breaks something else, naming it', () => {
    const after = { ...base, ingredients: [ingredient('Milk'), ingredient('Sugar')] };
    const error = thrown(() =>
      assertWriteKeepsCatalogue(base, after, { kind: 'ingredient', id: 'Milk', name: 'Milk' }),
    );
    expect(error).toBeInstanceOf(ConflictException);
    expect(body(error).message).toMatch(
      /^Saving “Milk” would break the recipe “Custard”: “Milk” has no density/,
    );
  });

  it('does not blame a write for a problem that was already there', () => {
    const before = { ...base, ingredients: [ingredient('Milk'), ingredient('Sugar')] };
    const after = { ...before, ingredients: [...before.ingredients, ingredient('Salt')] };
    expect(() =>
      assertWriteKeepsCatalogue(before, after, { kind: 'ingredient', id: 'Salt', name: 'Salt' }),
    ).not.toThrow();
  });

  it('names a loop with the shared message (400)', () => {
    const looping = recipe('Syrup', [
      { kind: 'recipe', recipeId: 'Custard', quantity: 5, unit: 'g' },
    ]);
    const after = { ...base, recipes: [base.recipes[1]!, looping] };
    const error = thrown(() =>
      assertWriteKeepsCatalogue(base, after, { kind: 'recipe', id: 'Syrup', name: 'Syrup' }),
    );
    expect(error).toBeInstanceOf(BadRequestException);
    expect(body(error).message).toEqual([
      'These recipes use each other in a loop: Custard → Syrup → Custard. Remove one of the sub-recipe lines to break it.',
    ]);
  });

  it('catches a component by grams whose recipe is missing', () => {
    const after = { ...base, desserts: [...base.desserts, dessert('Ghost', 'Nope')] };
    expect(catalogueProblems(after)).toEqual([
      {
        kind: 'dessert',
        id: 'Ghost',
        message:
          '“Ghost” uses a recipe that no longer exists (id Nope). Remove that line or pick another recipe.',
      },
    ]);
  });
});

describe('usersOf and inUseMessage', () => {
  it('lists recipes first, then desserts, by name', () => {
    const withMore = {
      ...base,
      recipes: [
        ...base.recipes,
        recipe('Brittle', [{ kind: 'recipe', recipeId: 'Syrup', quantity: 5, unit: 'g' }]),
      ],
      desserts: [...base.desserts, dessert('A plate', 'Syrup')],
    };
    expect(usersOf(withMore, { kind: 'recipe', id: 'Syrup', name: 'Syrup' })).toEqual([
      { kind: 'recipe', id: 'Brittle', name: 'Brittle' },
      { kind: 'recipe', id: 'Custard', name: 'Custard' },
      { kind: 'dessert', id: 'A plate', name: 'A plate' },
    ]);
    expect(usersOf(base, { kind: 'dessert', id: 'Plate', name: 'Plate' })).toEqual([]);
  });

  it('names the first user and counts the rest', () => {
    const users = [
      { kind: 'recipe' as const, id: '1', name: 'Hazelnut sponge' },
      { kind: 'recipe' as const, id: '2', name: 'Praline' },
      { kind: 'dessert' as const, id: '3', name: 'Cloud' },
    ];
    expect(inUseMessage('Butter', users)).toBe(
      '“Butter” cannot be deleted: used by the recipe “Hazelnut sponge” and 2 more. Remove it from them first.',
    );
    expect(inUseMessage('Butter', users.slice(0, 1))).toBe(
      '“Butter” cannot be deleted: used by the recipe “Hazelnut sponge”. Remove it from there first.',
    );
  });
});
