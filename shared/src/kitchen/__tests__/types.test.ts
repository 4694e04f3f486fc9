import { describe, expect, it } from 'vitest';
import {
  compositionSchema,
  ingredientSchema,
  menuSchema,
  methodStepSchema,
  recipeSchema,
} from '../types.js';

const firstMessage = (r: { success: boolean; error?: { issues: Array<{ message: string }> } }) =>
  r.error?.issues[0]?.message;

const validIngredient = {
  id: 'ing-1',
  name: 'Caster sugar',
  purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 145 },
  allergens: {},
  dietary: {},
};

describe('the kitchen schemas the API stores and the forms validate with', () => {
  it('fills the defaults a chef need not type', () => {
    const i = ingredientSchema.parse(validIngredient);
    expect(i.allergens).toEqual({ contains: [], mayContain: [] });
    expect(i.dietary).toEqual({ animalOrigins: [], alcohol: false });
  });

  it('money is whole minor units: no floats, no negatives', () => {
    const fractional = ingredientSchema.safeParse({
      ...validIngredient,
      purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 1.45 },
    });
    expect(firstMessage(fractional)).toBe('The pack price is in cents (whole minor units).');
    const negative = ingredientSchema.safeParse({
      ...validIngredient,
      purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: -1 },
    });
    expect(firstMessage(negative)).toBe('The pack price cannot be negative.');
  });

  it('a counted ingredient needs the weight of one piece', () => {
    const r = ingredientSchema.safeParse({ ...validIngredient, countUnit: 'leaf' });
    expect(firstMessage(r)).toBe('Counted in leaves: add the weight of one.');
  });

  it('a composition cannot exceed 100 g per 100 g, nor milkfat the fat', () => {
    expect(firstMessage(compositionSchema.safeParse({ water: 70, fat: 36, msnf: 6 }))).toMatch(
      /add up to 112\.0 g per 100 g/,
    );
    expect(firstMessage(compositionSchema.safeParse({ water: 60, fat: 10, milkFat: 12 }))).toBe(
      'Milkfat cannot exceed total fat.',
    );
    expect(
      compositionSchema.safeParse({ water: 57.71, fat: 36.08, milkFat: 36.08, msnf: 6.21 }).success,
    ).toBe(true);
  });

  it('recipes need a line and a positive yield; lines name an ingredient or a recipe', () => {
    const base = { id: 'r', name: 'Syrup', yieldG: 100, storage: 'chilled', shelfLifeHours: 24 };
    expect(firstMessage(recipeSchema.safeParse({ ...base, lines: [] }))).toBe(
      'Add at least one line.',
    );
    expect(
      firstMessage(
        recipeSchema.safeParse({
          ...base,
          yieldG: 0,
          lines: [{ kind: 'recipe', recipeId: 'x', quantity: 1, unit: 'g' }],
        }),
      ),
    ).toBe('The yield must be more than 0.');
    expect(
      recipeSchema.safeParse({
        ...base,
        lines: [{ kind: 'ingredient', ingredientId: 'i', quantity: 2, unit: 'leaf' }],
      }).success,
    ).toBe(true);
  });

  it('steps default to a plain prep step and refuse impossible temperatures', () => {
    expect(methodStepSchema.parse({ name: 'Mix', activeMinutes: 5, waitMinutes: 0 }).kind).toBe(
      'prep',
    );
    expect(
      methodStepSchema.safeParse({
        name: 'Bake',
        activeMinutes: 5,
        waitMinutes: 0,
        temperatureC: 900,
      }).success,
    ).toBe(false);
  });

  it('a menu’s maximum guests cannot be below its minimum', () => {
    const r = menuSchema.safeParse({
      id: 'm',
      name: 'Supper',
      dessertIds: ['d'],
      pricePerGuestMinor: 950,
      minGuests: 20,
      maxGuests: 10,
      leadDays: 3,
      active: true,
    });
    expect(firstMessage(r)).toBe('The maximum number of guests must be at least the minimum.');
  });

  it('names fit on one line', () => {
    expect(ingredientSchema.safeParse({ ...validIngredient, name: 'Sugar\nBcc: x' }).success).toBe(
      false,
    );
  });
});
