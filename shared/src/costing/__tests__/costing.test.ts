import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createKitchenIndex } from '../../kitchen/catalogue.js';
import { RecipeCycleError } from '../../kitchen/errors.js';
import { roundMinorUnits } from '../../kitchen/rounding.js';
import { dessert, ingredient, line, recipe, subRecipe } from '../../kitchen/__tests__/fixtures.js';
import {
  costDessertPlate,
  costMenu,
  costRecipe,
  foodCostPercent,
  ingredientCostPerGramExact,
  ingredientPackGrams,
  priceForTargetFoodCost,
  recipeCostPerGramExact,
  suggestMenuPrice,
} from '../costing.js';

describe('cost per gram = price per pack ÷ grams per pack', () => {
  it('by weight, by volume through density, by the piece', () => {
    const sugar = ingredient('s', {
      purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 145 },
    });
    const rum = ingredient('r', {
      densityGPerMl: 0.95,
      purchase: { packSize: 70, packUnit: 'cl', packPriceMinor: 2290 },
    });
    const eggs = ingredient('e', {
      unitWeightG: 50,
      purchase: { packSize: 30, packUnit: 'piece', packPriceMinor: 690 },
    });
    expect(ingredientCostPerGramExact(sugar)).toBe(0.145);
    expect(ingredientPackGrams(rum)).toBeCloseTo(665, 9); // 700 ml × 0.95 g/ml
    expect(ingredientCostPerGramExact(rum)).toBeCloseTo(2290 / 665, 12);
    expect(ingredientCostPerGramExact(eggs)).toBeCloseTo(690 / 1500, 12);
  });

  it('a pack in a volume without a density is a typed error naming the ingredient', () => {
    const cream = ingredient('c', {
      name: 'Cream',
      purchase: { packSize: 1, packUnit: 'l', packPriceMinor: 500 },
    });
    expect(() => ingredientCostPerGramExact(cream)).toThrowError(/“Cream” has no density/);
  });
});

describe('recipe cost through sub-recipes, by hand arithmetic', () => {
  // Syrup: 300 g sugar (0.2 c/g) + 200 g water (free) → yield 400 g: 60 c, 0.15 c/g.
  // Sorbet: 200 g syrup (30 c) + 400 g fruit (0.5 c/g = 200 c) → yield 550 g: 230 c.
  const sugar = ingredient('sugar', {
    name: 'Sugar',
    purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 200 },
  });
  const water = ingredient('water', {
    name: 'Water',
    purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 0 },
  });
  const fruit = ingredient('fruit', {
    name: 'Fruit purée',
    purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 500 },
  });
  const syrup = recipe('syrup', [line('sugar', 300), line('water', 200)], {
    name: 'Syrup',
    yieldG: 400,
  });
  const sorbet = recipe('sorbet', [subRecipe('syrup', 200), line('fruit', 400)], {
    name: 'Sorbet',
    yieldG: 550,
  });
  const index = createKitchenIndex({
    ingredients: [sugar, water, fruit],
    recipes: [syrup, sorbet],
    desserts: [
      dessert('plate', [
        { recipeId: 'sorbet', quantity: 110, unit: 'g' },
        { recipeId: 'syrup', quantity: 20, unit: 'g' },
      ]),
    ],
    menus: [
      {
        id: 'm',
        name: 'Menu',
        dessertIds: ['plate'],
        pricePerGuestMinor: 150,
        minGuests: 1,
        maxGuests: 10,
        leadDays: 1,
        active: true,
      },
    ],
  });

  it('costs a batch, per kg and per line', () => {
    const cost = costRecipe(index, 'sorbet');
    expect(cost.batchCostMinor).toBe(230);
    expect(cost.costPerKgMinor).toBe(418); // 230 / 550 × 1000 = 418.18
    expect(cost.lines.map((l) => [l.name, l.costMinor, l.sharePercent])).toEqual([
      ['Syrup', 30, 13],
      ['Fruit purée', 200, 87],
    ]);
    expect(recipeCostPerGramExact(index, 'syrup')).toBe(0.15);
  });

  it('costs a plate and a menu, food-cost % and the price for a target', () => {
    // Plate: 110 g sorbet × 230/550 = 46 c; 20 g syrup × 0.15 = 3 c → 49 c.
    expect(costDessertPlate(index, 'plate').plateCostMinor).toBe(46 + 3);
    const menu = costMenu(index, 'm');
    expect(menu.costPerGuestMinor).toBe(49);
    expect(menu.foodCostPercent).toBe(32.7); // 49 / 150
    expect(suggestMenuPrice(index, 'm', 30)).toBe(164); // 163.33 → up to 164
    expect(suggestMenuPrice(index, 'm', 30, 50)).toBe(200);
  });

  it('a loop of sub-recipes is refused while costing too', () => {
    const a = recipe('a', [subRecipe('b', 10)], { name: 'Nougatine' });
    const b = recipe('b', [subRecipe('a', 10)], { name: 'Praline' });
    const idx = createKitchenIndex({ recipes: [a, b] });
    expect(() => costRecipe(idx, 'a')).toThrowError(RecipeCycleError);
    expect(() => costRecipe(idx, 'a')).toThrowError(/Nougatine → Praline → Nougatine/);
  });
});

describe('rounding, stated: half up, once, at the end', () => {
  it('never accumulates rounded cents: three lines of 0.4 c cost 1 c, not 0 c', () => {
    const pinch = ingredient('p', {
      name: 'Spice',
      purchase: { packSize: 100, packUnit: 'g', packPriceMinor: 40 },
    });
    const idx = createKitchenIndex({
      ingredients: [pinch],
      recipes: [recipe('r', [line('p', 1), line('p', 1), line('p', 1)], { yieldG: 3 })],
    });
    const cost = costRecipe(idx, 'r');
    expect(cost.lines.map((l) => l.costMinor)).toEqual([0, 0, 0]);
    expect(cost.batchCostMinor).toBe(1); // 1.2 c
  });

  it('and three lines of 0.5 c cost 2 c (1.5 rounded half up), not 3 c', () => {
    const pinch = ingredient('p', {
      purchase: { packSize: 100, packUnit: 'g', packPriceMinor: 50 },
    });
    const idx = createKitchenIndex({
      ingredients: [pinch],
      recipes: [recipe('r', [line('p', 1), line('p', 1), line('p', 1)], { yieldG: 3 })],
    });
    const cost = costRecipe(idx, 'r');
    expect(cost.lines.map((l) => l.costMinor)).toEqual([1, 1, 1]);
    expect(cost.batchCostMinor).toBe(2);
  });

  it('a menu total is the rounded exact sum, not the sum of rounded plates', () => {
    const p = ingredient('p', {
      purchase: { packSize: 1000, packUnit: 'g', packPriceMinor: 1000 },
    });
    const idx = createKitchenIndex({
      ingredients: [p],
      recipes: [recipe('r', [line('p', 1000)], { yieldG: 1000 })],
      desserts: [
        dessert('a', [{ recipeId: 'r', quantity: 0.4, unit: 'g' }]),
        dessert('b', [{ recipeId: 'r', quantity: 0.4, unit: 'g' }]),
      ],
      menus: [
        {
          id: 'm',
          name: 'M',
          dessertIds: ['a', 'b'],
          pricePerGuestMinor: 100,
          minGuests: 1,
          maxGuests: 2,
          leadDays: 0,
          active: true,
        },
      ],
    });
    const menu = costMenu(idx, 'm');
    expect(menu.desserts.map((d) => d.plateCostMinor)).toEqual([0, 0]);
    expect(menu.costPerGuestMinor).toBe(1); // 0.8 c
  });

  it('half up means 12.5 → 13 and is not fooled by 0.1 + 0.2', () => {
    expect(roundMinorUnits(12.5)).toBe(13);
    expect(roundMinorUnits(12.4999)).toBe(12);
    expect(roundMinorUnits((0.1 + 0.2) * 5 * 1000 + 0.5)).toBe(1501); // 1500.5000000000002 → 1501
    expect(roundMinorUnits(1.005 * 1000 - 0.5)).toBe(1005); // 1004.4999999999999 is 1004.5
  });

  it('every money output is a whole number of minor units (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            price: fc.integer({ min: 0, max: 100_000 }),
            pack: fc.double({ min: 1, max: 25_000, noNaN: true }),
            grams: fc.double({ min: 0.01, max: 5000, noNaN: true }),
          }),
          { minLength: 1, maxLength: 8 },
        ),
        fc.double({ min: 1, max: 10_000, noNaN: true }),
        (lines, yieldG) => {
          const ings = lines.map((l, i) =>
            ingredient(`i${i}`, {
              purchase: { packSize: l.pack, packUnit: 'g', packPriceMinor: l.price },
            }),
          );
          const idx = createKitchenIndex({
            ingredients: ings,
            recipes: [
              recipe(
                'r',
                lines.map((l, i) => line(`i${i}`, l.grams)),
                { yieldG },
              ),
            ],
          });
          const cost = costRecipe(idx, 'r');
          for (const v of [
            cost.batchCostMinor,
            cost.costPerKgMinor,
            ...cost.lines.map((l) => l.costMinor),
          ]) {
            expect(Number.isInteger(v)).toBe(true);
          }
          const exact = lines.reduce((s, l) => s + (l.grams * l.price) / l.pack, 0);
          expect(Math.abs(cost.batchCostMinor - exact)).toBeLessThanOrEqual(0.5 + 1e-9 * exact);
        },
      ),
    );
  });
});

describe('food-cost percent and the price for a target', () => {
  it('a price of cost × 3 gives 33.3 % (common practice, no source: usual range 25–35 %)', () => {
    expect(foodCostPercent(500, 1500)).toBe(33.3);
    const p = priceForTargetFoodCost(500, 30);
    expect(p).toBe(1667);
    expect((500 / p) * 100).toBeLessThanOrEqual(30);
  });

  it('the suggested price meets the target and one step less would not (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 1_000_000, noNaN: true }),
        fc.double({ min: 1, max: 99, noNaN: true }),
        fc.constantFrom(1, 5, 10, 50, 100),
        (cost, target, step) => {
          const price = priceForTargetFoodCost(cost, target, step);
          expect(Number.isInteger(price)).toBe(true);
          expect(price % step).toBe(0);
          expect((cost / price) * 100).toBeLessThanOrEqual(target * (1 + 1e-12));
          if (price > step)
            expect((cost / (price - step)) * 100).toBeGreaterThan(target * (1 - 1e-12));
        },
      ),
    );
  });

  it('refuses targets outside 0–100 % and non-whole prices', () => {
    expect(() => priceForTargetFoodCost(100, 0)).toThrowError(/between 0 and 100/);
    expect(() => priceForTargetFoodCost(100, 100)).toThrowError(/between 0 and 100/);
    expect(() => foodCostPercent(100, 12.5)).toThrowError(/whole cents/);
  });
});
