import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createKitchenIndex, type KitchenIndex } from '../../kitchen/catalogue.js';
import { DEMO_CATALOGUE } from '../../kitchen/demo-catalogue.js';
import { dessert, ingredient, line, recipe, subRecipe } from '../../kitchen/__tests__/fixtures.js';
import { ingredientPackGrams } from '../../costing/costing.js';
import type { Menu, MethodStep, Recipe, RecipeLine } from '../../kitchen/types.js';
import { addCalendarDays } from '../../prep-schedule/zoned-time.js';
import { planPrep, type PrepPlan } from '../prep-plan.js';
import type { GuestPlateChange, PrepOrderInput } from '../prep-order.js';
import { reckon, type Reckoning } from './plan-oracle.js';

// ---------------------------------------------------------------- checks shared by every case

function expectClose(actual: number, expected: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(1e-6 + 1e-9 * Math.abs(expected));
}

function expectPlanMatches(index: KitchenIndex, plan: PrepPlan, expected: Reckoning): void {
  // Plan totals equal the sum over orders (before pack rounding).
  const bought = new Map(plan.purchaseList.lines.map((l) => [l.ingredientId, l.exactGrams]));
  expect([...bought.keys()].sort()).toEqual(
    [...expected.ingredientGrams]
      .filter(([, g]) => g > 1e-9)
      .map(([id]) => id)
      .sort(),
  );
  for (const [id, grams] of expected.ingredientGrams)
    if (grams > 1e-9) expectClose(bought.get(id)!, grams);
  const made = new Map(plan.recipes.map((r) => [r.recipeId, r.exactGrams]));
  for (const [id, grams] of expected.recipeGrams)
    if (grams > 1e-9) expectClose(made.get(id)!, grams);
  expect(plan.plates.reduce((n, p) => n + p.plates, 0)).toBe(expected.plates);

  // Packs: packs × pack ≥ need, (packs − 1) × pack < need.
  for (const l of plan.purchaseList.lines) {
    const pack = ingredientPackGrams(index.ingredient(l.ingredientId));
    expect(l.packs * pack).toBeGreaterThanOrEqual(l.neededGrams);
    expect((l.packs - 1) * pack).toBeLessThan(l.neededGrams);
    expect(l.totalMinor).toBe(l.packs * l.packPriceMinor);
  }

  const rows = plan.days.flatMap((d) => d.recipes);
  const runs = new Map(plan.schedule.runs.map((r) => [r.runId, r]));
  for (const row of rows) {
    // Batches: batches × capacity ≥ grams, each batch ≤ capacity, and no batch too many.
    const cap = row.equipment?.batchCapacityG;
    if (cap === undefined) expect(row.batches).toBe(1);
    else {
      expect(row.batches * cap).toBeGreaterThanOrEqual(row.exactGrams);
      expect((row.batches - 1) * cap).toBeLessThan(row.exactGrams);
      expect(row.exactGramsPerBatch).toBeLessThanOrEqual(cap);
      expect(row.gramsPerBatch).toBeLessThanOrEqual(cap);
    }
    expectClose(row.exactGramsPerBatch * row.batches, row.exactGrams);

    // No step is scheduled before its sub-recipe is finished.
    const run = runs.get(row.runId)!;
    for (const subId of row.usesRunIds) {
      const sub = runs.get(subId)!;
      expect(Date.parse(sub.finishAt)).toBeLessThanOrEqual(
        Date.parse(run.steps[0]?.startAt ?? run.startAt),
      );
    }

    // Every latest start ≤ the time needed minus the durations from that step on.
    const r = index.recipe(row.recipeId);
    let after = 0;
    for (let i = r.steps.length - 1; i >= 0; i -= 1) {
      const s = r.steps[i]!;
      after += s.activeMinutes + s.waitMinutes;
      const bound =
        Date.parse(run.neededByAt) - (after + (row.batches - 1) * s.activeMinutes) * 60_000;
      expect(Date.parse(run.steps[i]!.latestStartAt)).toBeLessThanOrEqual(bound);
    }
  }

  // Each plate component is finished by service minus the plating buffer. A run joins a later
  // order only while it still keeps at that service; only its first order can be past expiry,
  // and then a shelf-life conflict says so.
  const serviceOf = new Map(plan.orders.map((o) => [o.orderId, Date.parse(o.serviceAt)]));
  const flagged = new Set(
    plan.schedule.conflicts.filter((c) => c.kind === 'shelf_life').map((c) => c.runId),
  );
  for (const row of rows.filter((x) => x.onPlates && x.forRecipes.length === 0)) {
    const services = row.orderIds.map((id) => serviceOf.get(id)!).sort((a, b) => a - b);
    services.forEach((service, i) => {
      expect(Date.parse(row.finishAt)).toBeLessThanOrEqual(
        service - plan.schedule.platingBufferMinutes * 60_000,
      );
      if (i > 0 || !flagged.has(row.runId)) {
        expect(Date.parse(row.expiresAt)).toBeGreaterThanOrEqual(service);
      }
    });
  }
}

// ---------------------------------------------------------------- generated kitchens

const ingredients = [
  ingredient('flour', { name: 'Flour' }),
  ingredient('sugar', {
    name: 'Sugar',
    purchase: { packSize: 25, packUnit: 'kg', packPriceMinor: 2900 },
  }),
  ingredient('cream', {
    name: 'Cream',
    densityGPerMl: 1.006,
    purchase: { packSize: 1, packUnit: 'l', packPriceMinor: 520 },
  }),
  ingredient('egg', {
    name: 'Eggs',
    unitWeightG: 50,
    countUnit: 'piece',
    purchase: { packSize: 30, packUnit: 'piece', packPriceMinor: 690 },
  }),
];

const ingredientLineArb: fc.Arbitrary<RecipeLine> = fc.oneof(
  fc
    .record({ id: fc.constantFrom('flour', 'sugar'), q: fc.integer({ min: 5, max: 500 }) })
    .map(({ id, q }) => line(id, q)),
  fc.integer({ min: 10, max: 500 }).map((q) => line('cream', q, 'ml')),
  fc.integer({ min: 1, max: 6 }).map((q) => line('egg', q, 'piece')),
);

const stepArb: fc.Arbitrary<MethodStep> = fc
  .record({
    a: fc.integer({ min: 0, max: 60 }),
    w: fc.oneof(fc.constant(0), fc.integer({ min: 1, max: 720 })),
  })
  .map(({ a, w }) => ({ name: 'Step', kind: 'prep', activeMinutes: a, waitMinutes: w }));

const recipeSpecArb = fc.record({
  lines: fc.array(ingredientLineArb, { minLength: 1, maxLength: 3 }),
  steps: fc.array(stepArb, { minLength: 0, maxLength: 4 }),
  yieldG: fc.integer({ min: 100, max: 2000 }),
  shelfLifeHours: fc.integer({ min: 6, max: 240 }),
  capacity: fc.option(fc.integer({ min: 800, max: 3000 }), { nil: undefined }),
  subGrams: fc.integer({ min: 20, max: 300 }),
});

type RecipeSpec = typeof recipeSpecArb extends fc.Arbitrary<infer T> ? T : never;

function makeRecipe(id: string, spec: RecipeSpec, subs: string[]): Recipe {
  return recipe(id, [...spec.lines, ...subs.map((s) => subRecipe(s, spec.subGrams))], {
    name: id,
    yieldG: spec.yieldG,
    steps: spec.steps,
    shelfLifeHours: spec.shelfLifeHours,
    ...(spec.capacity !== undefined
      ? { equipment: { name: 'Pan', batchCapacityG: spec.capacity } }
      : {}),
  });
}

const gramsArb = fc.integer({ min: 10, max: 80 });

const kitchenArb = fc
  .record({
    specs: fc.array(recipeSpecArb, { minLength: 5, maxLength: 5 }),
    portions: fc.array(gramsArb, { minLength: 5, maxLength: 5 }),
  })
  .map(({ specs, portions }) => {
    // leaf1, leaf2, leaf3; comp1 uses leaf1; comp2 uses comp1 and leaf2 (three levels).
    const recipes = [
      makeRecipe('leaf1', specs[0]!, []),
      makeRecipe('leaf2', specs[1]!, []),
      makeRecipe('leaf3', specs[2]!, []),
      makeRecipe('comp1', specs[3]!, ['leaf1']),
      makeRecipe('comp2', specs[4]!, ['comp1', 'leaf2']),
    ];
    const desserts = [
      dessert('d1', [
        { recipeId: 'comp2', quantity: portions[0]!, unit: 'g' },
        { recipeId: 'leaf3', quantity: portions[1]!, unit: 'g' },
        { recipeId: 'comp1', quantity: portions[2]!, unit: 'g' },
      ]),
      dessert('d2', [
        { recipeId: 'leaf2', quantity: portions[3]!, unit: 'g' },
        { recipeId: 'leaf3', quantity: portions[4]!, unit: 'g' },
      ]),
    ];
    const menus: Menu[] = [
      {
        id: 'both',
        name: 'Both',
        dessertIds: ['d1', 'd2'],
        pricePerGuestMinor: 2000,
        minGuests: 1,
        maxGuests: 500,
        leadDays: 0,
        active: true,
      },
      {
        id: 'one',
        name: 'One',
        dessertIds: ['d2'],
        pricePerGuestMinor: 900,
        minGuests: 1,
        maxGuests: 500,
        leadDays: 0,
        active: true,
      },
    ];
    return createKitchenIndex({ ingredients, recipes, desserts, menus });
  });

const changeArb = fc.constantFrom<Omit<GuestPlateChange, 'guest'>>(
  { dessertId: 'd1', changes: [{ componentRecipeId: 'leaf3' }] },
  { dessertId: 'd1', changes: [{ componentRecipeId: 'comp1', replacementRecipeId: 'leaf2' }] },
  { dessertId: 'd2', changes: [{ componentRecipeId: 'leaf2', replacementRecipeId: 'leaf1' }] },
);

const orderArb = fc
  .record({
    day: fc.integer({ min: 0, max: 16 }), // 20 March – 5 April 2026: across the spring clock change
    minute: fc.integer({ min: 11 * 60, max: 22 * 60 + 30 }),
    zone: fc.constantFrom('Europe/Brussels', 'Europe/London'),
    menuId: fc.constantFrom('both', 'one'),
    guests: fc.integer({ min: 1, max: 40 }),
    changes: fc.array(changeArb, { maxLength: 3 }),
  })
  .map((o) => ({
    eventDate: addCalendarDays('2026-03-20', o.day),
    serviceTime: `${String(Math.floor(o.minute / 60)).padStart(2, '0')}:${String(o.minute % 60).padStart(2, '0')}`,
    timeZone: o.zone,
    menuId: o.menuId,
    guestCount: o.guests,
    guestChanges: o.changes
      .filter((c) => o.menuId === 'both' || c.dessertId === 'd2')
      .slice(0, o.guests)
      .map((c, k) => ({ guest: `Guest ${k + 1}`, ...c })),
  }));

describe('plan properties (fast-check)', () => {
  it('totals, packs, batches, sub-recipe order and latest starts hold for generated kitchens and orders', () => {
    fc.assert(
      fc.property(
        kitchenArb,
        fc.array(orderArb, { minLength: 1, maxLength: 8 }),
        fc.integer({ min: 0, max: 20 }),
        (index, raw, spare) => {
          const orders: PrepOrderInput[] = raw.map((o, i) => ({ id: `o${i + 1}`, ...o }));
          const plan = planPrep(index, orders, {
            from: '2026-03-20',
            to: '2026-04-05',
            settings: { studioTimeZone: 'Europe/Brussels' },
            sparePercent: spare,
          });
          expectPlanMatches(index, plan, reckon(index, orders, spare));
        },
      ),
      { numRuns: 60 },
    );
  });
});

// ---------------------------------------------------------------- 1,000 orders

/** Small deterministic generator (mulberry32), so the test is the same every run. */
function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

describe('1,000 confirmed orders over 30 days (demo catalogue)', () => {
  it('plans them with totals equal to the sum over the orders', () => {
    const index = createKitchenIndex(DEMO_CATALOGUE);
    const rand = prng(20260323);
    const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)]!;
    const orders: PrepOrderInput[] = Array.from({ length: 1000 }, (_, i) => {
      const menuId = pick(['menu-garden-supper', 'menu-celebration-trio']);
      const guestCount = 8 + Math.floor(rand() * 40);
      const changes =
        rand() < 0.3
          ? [
              {
                guest: 'Table 1, seat 1',
                dessertId: 'des-pistachio-frost',
                changes: [{ componentRecipeId: 'rec-almond-crumble' }],
              },
            ]
          : [];
      return {
        id: `gen-${i + 1}`,
        eventDate: addCalendarDays('2026-04-01', Math.floor(rand() * 30)),
        serviceTime: pick(['12:30', '13:00', '19:00', '19:30', '20:00']),
        timeZone: 'Europe/Brussels',
        menuId,
        guestCount,
        guestChanges: changes,
      };
    });
    const plan = planPrep(index, orders, {
      from: '2026-04-01',
      to: '2026-04-30',
      settings: { studioTimeZone: 'Europe/Brussels' },
      sparePercent: 5,
    });
    expect(plan.orders).toHaveLength(1000);
    expectPlanMatches(index, plan, reckon(index, orders, 5));
  });
});
