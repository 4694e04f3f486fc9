import { describe, expect, it } from 'vitest';
import { createKitchenIndex } from '../../kitchen/catalogue.js';
import { DEMO_CATALOGUE } from '../../kitchen/demo-catalogue.js';
import { RecipeCycleError } from '../../kitchen/errors.js';
import { dessert, ingredient, line, recipe, subRecipe } from '../../kitchen/__tests__/fixtures.js';
import type { Menu, MethodStep } from '../../kitchen/types.js';
import { PrepInputError } from '../../prep-schedule/working-calendar.js';
import {
  batchesFor,
  checkOrderLeadTime,
  packsCovering,
  planPrep,
  platesWithSpare,
  type PrepPlan,
} from '../prep-plan.js';
import type { PrepOrderInput } from '../prep-order.js';

const BXL = 'Europe/Brussels';
const demo = createKitchenIndex(DEMO_CATALOGUE);
const settings = { studioTimeZone: BXL };

function order(id: string, eventDate: string, extra: Partial<PrepOrderInput> = {}): PrepOrderInput {
  return {
    id,
    eventDate,
    serviceTime: '19:30',
    timeZone: BXL,
    menuId: 'menu-garden-supper',
    guestCount: 20,
    ...extra,
  };
}

const rowsOf = (plan: PrepPlan) =>
  plan.days.flatMap((d) => d.recipes.map((r) => ({ ...r, date: d.date })));
const rowFor = (plan: PrepPlan, recipeId: string) =>
  rowsOf(plan).filter((r) => r.recipeId === recipeId);
const line_ = (plan: PrepPlan, ingredientId: string) =>
  plan.purchaseList.lines.find((l) => l.ingredientId === ingredientId)!;

describe('plates with the spare percentage, rounded up to whole plates', () => {
  it('rounds up, and is not fooled by 20 × 1.1 = 22.000000000000004 in floating point', () => {
    expect(platesWithSpare(20, 10)).toBe(22);
    expect(platesWithSpare(40, 5)).toBe(42);
    expect(platesWithSpare(41, 5)).toBe(44); // 43.05 → 44
    expect(platesWithSpare(8, 0)).toBe(8);
    expect(platesWithSpare(7, 2.5)).toBe(8); // 7.175 → 8
    expect(() => platesWithSpare(10, 150)).toThrow(/0–100/);
  });
});

describe('Garden Supper for 20 guests, 10 % spare, two changed plates (demo catalogue, hand-worked)', () => {
  // Pistachio Frost per plate: parfait 1 piece of 70 g, vanilla ice cream 60 g, almond crumble
  // 25 g, white chocolate shards 2 × 4 g. 22 plates; Table 2 seat 3 (tree nuts) has no crumble;
  // Table 4 seat 1 has crème fraîche cream instead of the ice cream, at the same 60 g.
  const plan = planPrep(
    demo,
    [
      order('ord-1', '2026-03-24', {
        guestChanges: [
          {
            guest: 'Table 2, seat 3',
            dessertId: 'des-pistachio-frost',
            changes: [{ componentRecipeId: 'rec-almond-crumble' }],
          },
          {
            guest: 'Table 4, seat 1',
            dessertId: 'des-pistachio-frost',
            changes: [
              {
                componentRecipeId: 'rec-vanilla-base',
                replacementRecipeId: 'rec-creme-fraiche-cream',
              },
            ],
          },
        ],
      }),
    ],
    { from: '2026-03-23', to: '2026-03-29', settings, sparePercent: 10 },
  );

  it('counts 22 plates, 2 of them spare, 2 changed', () => {
    expect(plan.orders[0]!.desserts).toEqual([
      {
        dessertId: 'des-pistachio-frost',
        dessertName: 'Pistachio Frost',
        plates: 22,
        sparePlates: 2,
        changedPlates: 2,
      },
    ]);
    expect(plan.orders[0]!.serviceAt).toBe('2026-03-24T19:30:00+01:00');
  });

  it('gives grams per component as the plates really use them', () => {
    const grams = Object.fromEntries(plan.recipes.map((r) => [r.recipeId, r.exactGrams]));
    expect(grams['rec-pistachio-parfait']).toBe(22 * 70); // 1540
    expect(grams['rec-vanilla-base']).toBe(21 * 60); // 1260
    expect(grams['rec-creme-fraiche-cream']).toBe(60);
    expect(grams['rec-almond-crumble']).toBe(21 * 25); // 525
    expect(grams['rec-white-chocolate-shards']).toBe(22 * 8); // 176
    // Sub-recipes: the parfait's 200 g of meringue per 790 g, the crumble's 100 g of brown butter per 370 g.
    expect(grams['rec-italian-meringue']).toBeCloseTo((1540 * 200) / 790, 6); // 389.873418
    expect(grams['rec-brown-butter']).toBeCloseTo((525 * 100) / 370, 6); // 141.891892
  });

  it('makes the meringue before the parfait and the brown butter before the crumble', () => {
    const [meringue] = rowFor(plan, 'rec-italian-meringue');
    const [parfait] = rowFor(plan, 'rec-pistachio-parfait');
    expect(meringue!.forRecipes).toEqual(['Frozen pistachio parfait']);
    expect(meringue!.onPlates).toBe(false);
    expect(Date.parse(meringue!.finishAt)).toBeLessThanOrEqual(Date.parse(parfait!.startAt));
    const [butter] = rowFor(plan, 'rec-brown-butter');
    const [crumble] = rowFor(plan, 'rec-almond-crumble');
    expect(Date.parse(butter!.finishAt)).toBeLessThanOrEqual(Date.parse(crumble!.startAt));
  });

  it('puts the ice cream on Monday (12 h rest) and the rest on Tuesday', () => {
    expect(rowFor(plan, 'rec-vanilla-base').map((r) => r.date)).toEqual(['2026-03-23']);
    expect(rowFor(plan, 'rec-pistachio-parfait').map((r) => r.date)).toEqual(['2026-03-24']);
    expect(rowFor(plan, 'rec-almond-crumble').map((r) => r.date)).toEqual(['2026-03-24']);
  });

  it('buys whole packs: 1540 g of parfait holds 1540 × 120/790 g pistachio paste → one 1 kg pack at €56.00', () => {
    const paste = line_(plan, 'ing-pistachio-paste');
    expect(paste.exactGrams).toBeCloseTo((1540 * 120) / 790, 5); // 233.924051
    expect(paste.packs).toBe(1);
    expect(paste.totalMinor).toBe(5600);
    // Its share of the pack at €56.00 per kg: 233.924 g × 5.6 cents per g = 1309.97 → 1310 cents.
    expect(paste.usedCostMinor).toBe(1310);
  });

  it('buys vanilla pods by the piece: one per 1115 g of base and ½ per 530 g of cream, whole pods per run', () => {
    const pods = line_(plan, 'ing-vanilla-pod');
    // 1260/1115 = 1.13 pods → 2 pods; 60/530 × 0.5 = 0.06 pods → 1 pod. 3 pods, one pack of 10.
    expect(pods.counted).toEqual({ countUnit: 'piece', pieces: 3 });
    expect(pods.neededGrams).toBe(3 * 4);
    expect(pods.packs).toBe(1);
  });

  it('totals the purchase list in whole cents', () => {
    expect(plan.currency).toBe('EUR');
    expect(plan.purchaseList.totalMinor).toBe(
      plan.purchaseList.lines.reduce((s, l) => s + l.packs * l.packPriceMinor, 0),
    );
    for (const l of plan.purchaseList.lines) {
      expect(Number.isInteger(l.totalMinor)).toBe(true);
      expect(Number.isInteger(l.usedCostMinor)).toBe(true);
      expect(l.usedCostMinor).toBeLessThanOrEqual(l.totalMinor);
    }
  });
});

describe('batches that fit the equipment, split evenly', () => {
  it('7,140 g of ice cream in a 2,400 g batch freezer is 3 batches of 2,380 g', () => {
    // 119 plates of Pistachio Frost × 60 g of ice cream (the plan does not re-check menu limits).
    const plan = planPrep(demo, [order('a', '2026-03-24', { guestCount: 119 })], {
      from: '2026-03-24',
      to: '2026-03-24',
      settings,
    });
    const [vanilla] = rowFor(plan, 'rec-vanilla-base');
    expect(vanilla!.exactGrams).toBe(119 * 60); // 7,140 g
    expect(vanilla!.batches).toBe(3);
    expect(vanilla!.gramsPerBatch).toBe(2380);
    expect(vanilla!.equipment).toEqual({ name: 'Batch freezer (3 l)', batchCapacityG: 2400 });
  });

  it('a recipe without equipment is one batch; exactly full is one batch, a gram more is two', () => {
    expect(batchesFor(10_000, undefined)).toBe(1);
    expect(batchesFor(2400, 2400)).toBe(1);
    expect(batchesFor(2401, 2400)).toBe(2);
    expect(batchesFor(0.3 * 3, 0.3)).toBe(3); // 0.8999999999999999 / 0.3 in floating point
  });

  it('packs: the least whole number that covers the need', () => {
    expect(packsCovering(1000, 1000)).toBe(1);
    expect(packsCovering(1000.001, 1000)).toBe(2);
    expect(packsCovering(2000.0000001, 1000)).toBe(3);
    expect(packsCovering(0.3, 0.1)).toBe(3); // 0.3 / 0.1 = 2.9999999999999996 in floating point
    expect(packsCovering(0, 500)).toBe(0);
  });
});

// ---------------------------------------------------------------- sharing across events

const KEEPS_72H: MethodStep[] = [
  {
    name: 'Cook the caramel',
    kind: 'caramel',
    activeMinutes: 30,
    waitMinutes: 0,
    temperatureC: 175,
  },
  { name: 'Cool to 21 °C', kind: 'cool', activeMinutes: 10, waitMinutes: 60, temperatureC: 21 },
  {
    name: 'Set overnight in the cold room',
    kind: 'chill',
    activeMinutes: 0,
    waitMinutes: 720,
    temperatureC: 4,
  },
];

function sauceKitchen(shelfLifeHours = 72) {
  const sugar = ingredient('sugar', { name: 'Sugar' });
  const sauce = recipe('sauce', [line('sugar', 1000)], {
    name: 'Salted caramel',
    yieldG: 1000,
    steps: KEEPS_72H,
    storage: 'chilled',
    shelfLifeHours,
  });
  const plated = dessert('caramel-plate', [{ recipeId: 'sauce', quantity: 50, unit: 'g' }], {
    name: 'Caramel plate',
  });
  const menu: Menu = {
    id: 'm',
    name: 'Caramel',
    dessertIds: ['caramel-plate'],
    pricePerGuestMinor: 1000,
    minGuests: 1,
    maxGuests: 500,
    leadDays: 0,
    active: true,
  };
  return createKitchenIndex({
    ingredients: [sugar],
    recipes: [sauce],
    desserts: [plated],
    menus: [menu],
  });
}

describe('sharing a component across events, greedy earliest first', () => {
  // Services at 13:00 on Tuesday 24, Wednesday 25 and Friday 27 March 2026 (Brussels, UTC+1).
  const orders = ['2026-03-24', '2026-03-25', '2026-03-27'].map((d, i) =>
    order(`o${i + 1}`, d, { menuId: 'm', serviceTime: '13:00' }),
  );

  it('a 72 h component made Monday serves Tuesday and Wednesday but not Friday', () => {
    const plan = planPrep(sauceKitchen(72), orders, {
      from: '2026-03-23',
      to: '2026-03-31',
      settings,
    });
    const runs = rowFor(plan, 'sauce');
    expect(runs.map((r) => [r.date, r.orderIds])).toEqual([
      ['2026-03-23', ['o1', 'o2']],
      ['2026-03-26', ['o3']],
    ]);
    // Cooked Mon 18:20–18:50, cooled by 20:00, set overnight: finished 08:00 Tue, keeps until 08:00 Fri.
    expect(runs[0]!.startAt).toBe('2026-03-23T18:20:00+01:00');
    expect(runs[0]!.finishAt).toBe('2026-03-24T08:00:00+01:00');
    expect(runs[0]!.expiresAt).toBe('2026-03-27T08:00:00+01:00');
    expect(runs[0]!.exactGrams).toBe(2 * 20 * 50);
  });

  it('with 24 h it is made once per event; with 5 days once for all three', () => {
    expect(
      rowFor(
        planPrep(sauceKitchen(24), orders, { from: '2026-03-23', to: '2026-03-31', settings }),
        'sauce',
      ),
    ).toHaveLength(3);
    const all = rowFor(
      planPrep(sauceKitchen(120), orders, { from: '2026-03-23', to: '2026-03-31', settings }),
      'sauce',
    );
    expect(all.map((r) => r.orderIds)).toEqual([['o1', 'o2', 'o3']]);
  });

  it('shares a sub-recipe between runs of its parents when it keeps long enough', () => {
    // Demo: brown butter keeps 14 days, the crumble 5: crumbles for 24 and 31 March, one brown butter.
    const plan = planPrep(demo, [order('a', '2026-03-24'), order('b', '2026-03-31')], {
      from: '2026-03-23',
      to: '2026-03-31',
      settings,
    });
    expect(rowFor(plan, 'rec-almond-crumble')).toHaveLength(2);
    const butter = rowFor(plan, 'rec-brown-butter');
    expect(butter).toHaveLength(1);
    expect(butter[0]!.orderIds).toEqual(['a', 'b']);
    expect(butter[0]!.exactGrams).toBeCloseTo((2 * 20 * 25 * 100) / 370, 6);
  });
});

describe('production days and times across the clock change (Directive 2000/84/EC)', () => {
  it('a Sunday 29 March service is UTC+2; the ice cream started Saturday is UTC+1', () => {
    const plan = planPrep(demo, [order('dst', '2026-03-29')], {
      from: '2026-03-29',
      to: '2026-03-29',
      settings,
    });
    expect(plan.orders[0]!.serviceAt).toBe('2026-03-29T19:30:00+02:00');
    const [vanilla] = rowFor(plan, 'rec-vanilla-base');
    expect(vanilla!.date).toBe('2026-03-28');
    expect(vanilla!.startAt.endsWith('+01:00')).toBe(true);
    expect(vanilla!.finishAt).toBe('2026-03-29T18:30:00+02:00');
  });

  it('an autumn Sunday 25 October service is UTC+1 again', () => {
    const plan = planPrep(demo, [order('dst', '2026-10-25')], {
      from: '2026-10-25',
      to: '2026-10-25',
      settings,
    });
    expect(plan.orders[0]!.serviceAt).toBe('2026-10-25T19:30:00+01:00');
    const [vanilla] = rowFor(plan, 'rec-vanilla-base');
    expect(vanilla!.startAt.endsWith('+02:00')).toBe(true);
  });
});

describe('lead time at confirmation', () => {
  it('a Garden Supper confirmed Tuesday 09:00 for Tuesday 19:30: the ice cream cannot rest 12 h in time', () => {
    const conflicts = checkOrderLeadTime(
      demo,
      order('late', '2026-03-24'),
      settings,
      '2026-03-24T09:00:00+01:00',
    );
    expect(conflicts.map((c) => (c.kind === 'lead_time' ? c.recipeId : c.kind))).toEqual([
      'rec-vanilla-base',
    ]);
    const c = conflicts[0]!;
    if (c.kind !== 'lead_time') throw new Error('expected a lead-time conflict');
    // Hand-worked: infuse 09:00–09:10 (+20), custard 09:30–09:45, cool 09:45–09:55 (+30), rest
    // 12 h until 22:25, churn at opening Wed 07:00–07:20, firm until 07:50.
    expect(c.readyAt).toBe('2026-03-25T07:50:00+01:00');
    expect(c.lateByMinutes).toBe(13 * 60 + 20);
    expect(c.message).toMatch(
      /^“Vanilla custard ice cream” for order late cannot be ready in time\. It needs 12 h for “Rest covered in the cold room overnight \(at least 6 hours\)”\./,
    );
    expect(c.message).toMatch(/for service at Tue 24 Mar 19:30\. It had to start by Mon 23 Mar /);
  });

  it('names the order by its reference when it has one, as the chef knows it', () => {
    const [c] = checkOrderLeadTime(
      demo,
      order('3f9c0a52-late', '2026-03-24', { reference: 'N-2026-0042' }),
      settings,
      '2026-03-24T09:00:00+01:00',
    );
    expect(c?.message).toMatch(
      /^“Vanilla custard ice cream” for order N-2026-0042 cannot be ready/,
    );
    expect(c?.message).not.toContain('3f9c0a52');
    // The order's id still travels with the conflict, for the screens to link to it.
    expect(c?.kind === 'lead_time' && c.orderId).toBe('3f9c0a52-late');
  });

  it('the same order confirmed the Friday before has no conflict', () => {
    expect(
      checkOrderLeadTime(demo, order('early', '2026-03-24'), settings, '2026-03-20T12:00:00+01:00'),
    ).toEqual([]);
  });
});

describe('input a chef gets wrong', () => {
  const opts = { from: '2026-03-23', to: '2026-03-29', settings };

  it('a change to a dessert not on the menu', () => {
    expect(() =>
      planPrep(
        demo,
        [
          order('x', '2026-03-24', {
            guestChanges: [
              {
                guest: 'Ann',
                dessertId: 'des-hazelnut-rum-cloud',
                changes: [{ componentRecipeId: 'rec-rum-syrup' }],
              },
            ],
          }),
        ],
        opts,
      ),
    ).toThrow(
      /Order x: Ann’s plate changes dessert des-hazelnut-rum-cloud, which is not on the menu “Garden Supper”/,
    );
  });

  it('a component the dessert does not have', () => {
    expect(() =>
      planPrep(
        demo,
        [
          order('x', '2026-03-24', {
            guestChanges: [
              {
                guest: 'Ann',
                dessertId: 'des-pistachio-frost',
                changes: [{ componentRecipeId: 'rec-rum-syrup' }],
              },
            ],
          }),
        ],
        opts,
      ),
    ).toThrow(/Order x: “Pistachio Frost” has no component with recipe id rec-rum-syrup/);
  });

  it('more changed plates than guests, a guest twice, an order twice', () => {
    const leaveOut = (guest: string) => ({
      guest,
      dessertId: 'des-pistachio-frost',
      changes: [{ componentRecipeId: 'rec-almond-crumble' }],
    });
    expect(() =>
      planPrep(
        demo,
        [order('x', '2026-03-24', { guestCount: 1, guestChanges: [leaveOut('A'), leaveOut('B')] })],
        opts,
      ),
    ).toThrow(/2 guests have a changed “Pistachio Frost”, more than the 1 guests booked/);
    expect(() =>
      planPrep(
        demo,
        [order('x', '2026-03-24', { guestChanges: [leaveOut('A'), leaveOut('a')] })],
        opts,
      ),
    ).toThrow(/two changed plates/);
    expect(() =>
      planPrep(demo, [order('x', '2026-03-24'), order('x', '2026-03-25')], opts),
    ).toThrow(/listed twice/);
  });

  it('bad dates, times, zones and ranges', () => {
    expect(() => planPrep(demo, [order('x', '2026-02-30')], opts)).toThrow(
      /Order x \(eventDate\): The event date is a calendar date/,
    );
    expect(() => planPrep(demo, [order('x', '2026-03-24', { serviceTime: '7pm' })], opts)).toThrow(
      /HH:MM/,
    );
    expect(() => planPrep(demo, [order('x', '2026-03-24', { timeZone: 'CET+1' })], opts)).toThrow(
      PrepInputError,
    );
    expect(() => planPrep(demo, [], { ...opts, from: '2026-03-29', to: '2026-03-23' })).toThrow(
      /before its first day/,
    );
    expect(() => planPrep(demo, [order('x', '2026-03-24', { menuId: 'menu-gone' })], opts)).toThrow(
      /no menu with id menu-gone/,
    );
  });

  it('a recipe loop is named', () => {
    const a = recipe('a', [subRecipe('b', 10)], { name: 'Praline' });
    const b = recipe('b', [subRecipe('a', 10)], { name: 'Crumble' });
    const index = createKitchenIndex({
      recipes: [a, b],
      desserts: [dessert('d', [{ recipeId: 'a', quantity: 10, unit: 'g' }])],
      menus: [
        {
          id: 'm',
          name: 'M',
          dessertIds: ['d'],
          pricePerGuestMinor: 100,
          minGuests: 1,
          maxGuests: 10,
          leadDays: 0,
          active: true,
        },
      ],
    });
    expect(() => planPrep(index, [order('x', '2026-03-24', { menuId: 'm' })], opts)).toThrow(
      RecipeCycleError,
    );
    expect(() => planPrep(index, [order('x', '2026-03-24', { menuId: 'm' })], opts)).toThrow(
      /Praline → Crumble → Praline/,
    );
  });

  it('leaves orders outside the range out, and says which', () => {
    const plan = planPrep(demo, [order('in', '2026-03-24'), order('out', '2026-04-02')], opts);
    expect(plan.orders.map((o) => o.orderId)).toEqual(['in']);
    expect(plan.skippedOrderIds).toEqual(['out']);
  });
});
