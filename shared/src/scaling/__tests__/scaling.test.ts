import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  assertNoRecipeCycle,
  createKitchenIndex,
  findRecipeCycle,
} from '../../kitchen/catalogue.js';
import {
  InvalidQuantityError,
  MissingConversionError,
  RecipeCycleError,
  UnknownReferenceError,
} from '../../kitchen/errors.js';
import { roundHalfUp, roundKitchenGrams } from '../../kitchen/rounding.js';
import type { Ingredient, Recipe } from '../../kitchen/types.js';
import { dessert, ingredient, line, recipe, subRecipe } from '../../kitchen/__tests__/fixtures.js';
import type { Unit } from '../../units/units.js';
import {
  exactIngredientGrams,
  expandRecipe,
  scaleDessert,
  scaleRecipe,
  scaleRecipes,
  type ScaledIngredientLine,
} from '../scaling.js';

const sugar = ingredient('sugar', { name: 'Sugar' });
const milk = ingredient('milk', { name: 'Whole milk', densityGPerMl: 1.031 });
// 1.65 g per leaf: two leaves weigh 3.3 g (common practice, no source).
const gelatin = ingredient('gelatin', {
  name: 'Gelatin leaves',
  unitWeightG: 1.65,
  countUnit: 'leaf',
});
// A large egg without shell is 50 g (USDA FDC 171287 portion).
const egg = ingredient('egg', { name: 'Eggs', unitWeightG: 50, countUnit: 'piece' });
const water = ingredient('water', { name: 'Water', densityGPerMl: 1 });

describe('the kitchen rounding rule (DESIGN.md §2)', () => {
  it('rounds 100 g and more to the gram, less to the tenth, half up', () => {
    expect(roundKitchenGrams(123.456)).toBe(123);
    expect(roundKitchenGrams(100.5)).toBe(101);
    expect(roundKitchenGrams(100)).toBe(100);
    expect(roundKitchenGrams(99.94)).toBe(99.9);
    expect(roundKitchenGrams(99.96)).toBe(100);
    expect(roundKitchenGrams(12.25)).toBe(12.3); // half up, not to even
    expect(roundKitchenGrams(0.04)).toBe(0);
    expect(roundKitchenGrams(0.05)).toBe(0.1);
  });

  it('is not fooled by binary floating point (1.005 is 1.005)', () => {
    expect(roundHalfUp(1.005, 2)).toBe(1.01);
    expect(roundHalfUp(0.1 + 0.2, 1)).toBe(0.3);
  });
});

describe('scaling a recipe to the grams needed', () => {
  const custard = recipe(
    'custard',
    [
      line('milk', 500, 'ml'),
      line('sugar', 120),
      line('egg', 3, 'piece'),
      line('gelatin', 2, 'leaf'),
    ],
    { name: 'Set custard', yieldG: 800 },
  );
  const index = createKitchenIndex({
    ingredients: [sugar, milk, gelatin, egg],
    recipes: [custard],
  });

  it('uses factor = grams needed ÷ measured yield, by hand arithmetic', () => {
    const { tree } = scaleRecipe(index, 'custard', 1200); // factor 1.5
    expect(tree.factor).toBe(1.5);
    const byId = Object.fromEntries(
      tree.lines.map((l) => [(l as ScaledIngredientLine).ingredientId, l as ScaledIngredientLine]),
    );
    expect(byId.milk!.exactGrams).toBeCloseTo(500 * 1.031 * 1.5, 9); // 773.25 g
    expect(byId.milk!.grams).toBe(773);
    expect(byId.milk!.quantity).toBe(750);
    expect(byId.milk!.unit).toBe('ml');
    expect(byId.sugar!.grams).toBe(180);
  });

  it('rounds counted items up to whole pieces and reports what they weigh', () => {
    const { tree } = scaleRecipe(index, 'custard', 1200);
    const eggs = tree.lines.find(
      (l) => l.kind === 'ingredient' && l.ingredientId === 'egg',
    ) as ScaledIngredientLine;
    const leaves = tree.lines.find(
      (l) => l.kind === 'ingredient' && l.ingredientId === 'gelatin',
    ) as ScaledIngredientLine;
    // 3 × 1.5 = 4.5 eggs → 5 eggs = 250 g; 2 × 1.5 = 3 leaves exactly → 3 leaves = 4.95 g.
    expect(eggs.counted).toEqual({ countUnit: 'piece', pieces: 5, unitWeightG: 50 });
    expect(eggs.exactGrams).toBe(225);
    expect(eggs.grams).toBe(250);
    expect(leaves.counted?.pieces).toBe(3);
    expect(leaves.grams).toBe(4.95);
  });

  it('does not add a piece for floating-point noise (0.1 + 0.2 leaves × 10 = 3 leaves)', () => {
    const r = recipe('r', [line('gelatin', 0.1 + 0.2, 'leaf')], { yieldG: 100 });
    const idx = createKitchenIndex({ ingredients: [gelatin], recipes: [r] });
    const { totals } = scaleRecipe(idx, 'r', 1000);
    expect(totals[0]!.counted?.pieces).toBe(3);
  });

  it('refuses a recipe without a usable yield, naming it', () => {
    const r = recipe('z', [line('sugar', 10)], { name: 'Nougat', yieldG: 0 });
    const idx = createKitchenIndex({ ingredients: [sugar], recipes: [r] });
    expect(() => scaleRecipe(idx, 'z', 100)).toThrowError(
      /The yield of “Nougat” must be more than 0 g/,
    );
  });

  it('refuses a negative amount', () => {
    expect(() => scaleRecipe(index, 'custard', -5)).toThrowError(InvalidQuantityError);
  });

  it('names a missing ingredient and the recipe that uses it', () => {
    const broken = recipe('b', [line('nope', 10)], { name: 'Lemon curd' });
    const idx = createKitchenIndex({ recipes: [broken] });
    expect(() => scaleRecipe(idx, 'b', 100)).toThrowError(UnknownReferenceError);
    expect(() => scaleRecipe(idx, 'b', 100)).toThrowError(
      /“Lemon curd” uses an ingredient that no longer exists/,
    );
  });
});

describe('sub-recipes expand recursively', () => {
  const syrup = recipe('syrup', [line('sugar', 300), line('water', 200, 'ml')], {
    name: 'Syrup',
    yieldG: 400,
  });
  const sorbet = recipe(
    'sorbet',
    [subRecipe('syrup', 200), line('water', 300, 'ml'), line('sugar', 50)],
    {
      name: 'Sorbet',
      yieldG: 550,
    },
  );
  const index = createKitchenIndex({ ingredients: [sugar, water], recipes: [syrup, sorbet] });

  it('asks the sub-recipe for its grams: 200 g of a 400 g syrup is half a batch', () => {
    const { tree, totals } = scaleRecipe(index, 'sorbet', 550);
    const sub = tree.lines[0];
    expect(sub?.kind).toBe('recipe');
    if (sub?.kind !== 'recipe') return;
    expect(sub.recipe.factor).toBe(0.5);
    expect(sub.recipe.grams).toBe(200);
    // Totals by hand: sugar 150 + 50 = 200 g; water 100 + 300 = 400 g.
    expect(totals.find((t) => t.ingredientId === 'sugar')?.grams).toBe(200);
    expect(totals.find((t) => t.ingredientId === 'water')?.grams).toBe(400);
    expect(totals.map((t) => t.ingredientId)).toEqual(['water', 'sugar']); // heaviest first
  });

  it('reports totals in the purchase unit too', () => {
    const { totals } = scaleRecipe(index, 'sorbet', 1100);
    expect(totals.find((t) => t.ingredientId === 'sugar')?.inPurchaseUnit).toEqual({
      quantity: 0.4,
      unit: 'kg',
    });
  });

  it('totals several recipes at once', () => {
    const { trees, totals } = scaleRecipes(index, [
      { recipeId: 'sorbet', grams: 550 },
      { recipeId: 'syrup', grams: 400 },
    ]);
    expect(trees).toHaveLength(2);
    expect(totals.find((t) => t.ingredientId === 'sugar')?.grams).toBe(500);
  });
});

describe('a cycle is an error naming the loop', () => {
  const praline = recipe('praline', [line('sugar', 100), subRecipe('crumble', 50)], {
    name: 'Praline',
  });
  const crumble = recipe('crumble', [line('sugar', 100), subRecipe('praline', 50)], {
    name: 'Crumble',
  });
  const index = createKitchenIndex({ ingredients: [sugar], recipes: [praline, crumble] });

  it('while scaling', () => {
    let caught: unknown;
    try {
      scaleRecipe(index, 'praline', 500);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(RecipeCycleError);
    expect((caught as RecipeCycleError).loop).toEqual(['Praline', 'Crumble', 'Praline']);
    expect((caught as Error).message).toContain('Praline → Crumble → Praline');
  });

  it('before saving (the API checks the saved recipes plus the new one)', () => {
    expect(findRecipeCycle([praline, crumble])?.names).toEqual(['Praline', 'Crumble', 'Praline']);
    expect(() => assertNoRecipeCycle([praline, crumble])).toThrowError(
      /Praline → Crumble → Praline/,
    );
    const fixed = { ...crumble, lines: [line('sugar', 100)] };
    expect(findRecipeCycle([praline, fixed])).toBeNull();
  });

  it('including a recipe that uses itself', () => {
    const caramel = recipe('caramel', [subRecipe('caramel', 10)], { name: 'Caramel' });
    expect(findRecipeCycle([caramel])?.names).toEqual(['Caramel', 'Caramel']);
  });

  it('but a shared sub-recipe used twice is not a cycle', () => {
    const base = recipe('base', [line('sugar', 100)], { name: 'Base', yieldG: 100 });
    const a = recipe('a', [subRecipe('base', 10)], { name: 'A' });
    const b = recipe('b', [subRecipe('base', 10), subRecipe('a', 10)], { name: 'B' });
    expect(findRecipeCycle([base, a, b])).toBeNull();
    const idx = createKitchenIndex({ ingredients: [sugar], recipes: [base, a, b] });
    // B (1000 g yield, made at 1000 g): 10 g of Base = 10 g sugar; 10 g of A = 1 % of A = 0.1 g of Base.
    expect(scaleRecipe(idx, 'b', 1000).totals[0]?.exactGrams).toBeCloseTo(10 + 0.1, 9);
  });
});

describe('desserts scale by plates', () => {
  const shards = recipe('shards', [line('sugar', 100)], {
    name: 'Shards',
    yieldG: 100,
    unitWeightG: 4,
  });
  const sorbet = recipe('sorbet', [line('sugar', 300), line('water', 700, 'ml')], {
    name: 'Sorbet',
  });
  const index = createKitchenIndex({
    ingredients: [sugar, water],
    recipes: [shards, sorbet],
    desserts: [
      dessert('d', [
        { recipeId: 'sorbet', quantity: 70, unit: 'g' },
        { recipeId: 'shards', quantity: 2, unit: 'piece' },
      ]),
      dessert('bad', [{ recipeId: 'sorbet', quantity: 1, unit: 'piece' }], { name: 'Odd plate' }),
    ],
  });

  it('plates × portion, pieces through the recipe’s piece weight', () => {
    const result = scaleDessert(index, 'd', 40);
    expect(result.components.map((c) => c.gramsPerPlate)).toEqual([70, 8]);
    expect(result.components[0]!.recipe.grams).toBe(2800);
    expect(result.components[1]!.recipe.grams).toBe(320);
    // Sugar: 2800 × 0.3 + 320 × 1 = 1160 g.
    expect(result.totals.find((t) => t.ingredientId === 'sugar')?.grams).toBe(1160);
  });

  it('a piece portion without a piece weight is a typed error naming the recipe', () => {
    expect(() => scaleDessert(index, 'bad', 10)).toThrowError(MissingConversionError);
    expect(() => scaleDessert(index, 'bad', 10)).toThrowError(/“Sorbet” has no weight per piece/);
  });

  it('refuses fractional plates', () => {
    expect(() => scaleDessert(index, 'd', 2.5)).toThrowError(/whole number/);
  });
});

// ---------------------------------------------------------------- properties

interface Shape {
  ingredients: Array<{ density: number; unitWeight: number; counted: boolean }>;
  recipes: Array<{
    yieldG: number;
    lines: Array<{ target: number; sub: boolean; quantity: number; unit: Unit }>;
  }>;
}

const shapeArb: fc.Arbitrary<Shape> = fc.record({
  ingredients: fc.array(
    fc.record({
      density: fc.double({ min: 0.3, max: 2, noNaN: true }),
      unitWeight: fc.double({ min: 0.5, max: 80, noNaN: true }),
      counted: fc.boolean(),
    }),
    { minLength: 1, maxLength: 6 },
  ),
  recipes: fc.array(
    fc.record({
      yieldG: fc.double({ min: 10, max: 5000, noNaN: true }),
      lines: fc.array(
        fc.record({
          target: fc.nat(),
          sub: fc.boolean(),
          quantity: fc.double({ min: 0.01, max: 2000, noNaN: true }),
          unit: fc.constantFrom<Unit>('g', 'kg', 'oz', 'ml', 'us_cup', 'metric_tbsp', 'piece'),
        }),
        { minLength: 1, maxLength: 5 },
      ),
    }),
    { minLength: 1, maxLength: 6 },
  ),
});

/** Recipe i may only use recipes before it, so the graph is acyclic by construction. */
function build(shape: Shape) {
  const ingredients: Ingredient[] = shape.ingredients.map((s, i) =>
    ingredient(`i${i}`, {
      densityGPerMl: s.density,
      unitWeightG: s.unitWeight,
      ...(s.counted ? { countUnit: 'piece' as const } : {}),
    }),
  );
  const recipes: Recipe[] = shape.recipes.map((r, i) =>
    recipe(
      `r${i}`,
      r.lines.map((l) =>
        l.sub && i > 0
          ? subRecipe(`r${l.target % i}`, l.quantity, l.unit)
          : line(`i${l.target % ingredients.length}`, l.quantity, l.unit),
      ),
      { yieldG: r.yieldG, densityGPerMl: 1.1, unitWeightG: 25 },
    ),
  );
  const root = recipes[recipes.length - 1]!;
  return { index: createKitchenIndex({ ingredients, recipes }), root };
}

function expectSameTotals(a: Map<string, number>, b: Map<string, number>): void {
  expect([...a.keys()].sort()).toEqual([...b.keys()].sort());
  for (const [id, grams] of a) {
    const other = b.get(id)!;
    expect(Math.abs(grams - other)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(grams)));
  }
}

describe('scaling properties (fast-check)', () => {
  const grams = fc.double({ min: 1, max: 10_000, noNaN: true });
  const k = fc.double({ min: 0.01, max: 100, noNaN: true });

  it('scaling by k then by 1/k returns the original amounts (before rounding)', () => {
    fc.assert(
      fc.property(shapeArb, grams, k, (shape, g, factor) => {
        const { index, root } = build(shape);
        const original = exactIngredientGrams(expandRecipe(index, root.id, g));
        const scaled = expandRecipe(index, root.id, g * factor);
        const back = expandRecipe(index, root.id, scaled.grams * (1 / factor));
        expectSameTotals(exactIngredientGrams(back), original);
      }),
    );
  });

  it('totals are linear in k', () => {
    fc.assert(
      fc.property(shapeArb, grams, k, k, (shape, g, a, b) => {
        const { index, root } = build(shape);
        const sum = exactIngredientGrams(expandRecipe(index, root.id, g * (a + b)));
        const ta = exactIngredientGrams(expandRecipe(index, root.id, g * a));
        const tb = exactIngredientGrams(expandRecipe(index, root.id, g * b));
        const added = new Map([...ta].map(([id, v]) => [id, v + (tb.get(id) ?? 0)]));
        expectSameTotals(sum, added);
        const single = exactIngredientGrams(expandRecipe(index, root.id, g));
        expectSameTotals(ta, new Map([...single].map(([id, v]) => [id, v * a])));
      }),
    );
  });

  it('the expansion of a recipe equals the sum of its parts', () => {
    fc.assert(
      fc.property(shapeArb, grams, (shape, g) => {
        const { index, root } = build(shape);
        const whole = expandRecipe(index, root.id, g);
        const parts = new Map<string, number>();
        for (const l of whole.lines) {
          if (l.kind === 'ingredient') {
            parts.set(l.ingredient.id, (parts.get(l.ingredient.id) ?? 0) + l.grams);
          } else {
            // The sub-recipe on its own, asked for the same grams.
            const alone = exactIngredientGrams(expandRecipe(index, l.node.recipe.id, l.node.grams));
            for (const [id, v] of alone) parts.set(id, (parts.get(id) ?? 0) + v);
          }
        }
        expectSameTotals(exactIngredientGrams(whole), parts);
      }),
    );
  });

  it('rounded totals stay within the rounding rule; counted items never fall short', () => {
    fc.assert(
      fc.property(shapeArb, grams, (shape, g) => {
        const { index, root } = build(shape);
        for (const t of scaleRecipe(index, root.id, g).totals) {
          if (t.counted) {
            expect(Number.isInteger(t.counted.pieces)).toBe(true);
            expect(t.grams).toBeGreaterThanOrEqual(t.exactGrams - 1e-6);
          } else {
            const tolerance = t.exactGrams >= 100 ? 0.5 : 0.05;
            expect(Math.abs(t.grams - t.exactGrams)).toBeLessThanOrEqual(tolerance + 1e-6);
          }
        }
      }),
    );
  });
});
