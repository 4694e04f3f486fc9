import { Role } from '@nappe/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  bearer,
  create,
  ingredientBody,
  ingredientLine,
  keyPaths,
  recipeBody,
  subRecipeLine,
} from './factories/kitchen.js';
import { createTestApp, makeSignedInUser, type TestApp } from './factories/test-app.js';

let t: TestApp;
let chef: string;
let staff: string;
let client: string;

beforeAll(async () => {
  t = await createTestApp();
  chef = (await makeSignedInUser(t, Role.Chef)).token;
  staff = (await makeSignedInUser(t, Role.Staff)).token;
  client = (await makeSignedInUser(t, Role.Client)).token;
});
afterAll(async () => t.close());

const NO_SUCH_ID = '00000000-0000-4000-8000-000000000000';

/** Ids of what the chef builds in the first test; the later tests read and change it. */
const ids = {
  hazelnuts: '',
  sugar: '',
  flour: '',
  eggs: '',
  milk: '',
  praline: '',
  crumble: '',
  dessert: '',
  menu: '',
};

describe('the chef builds a catalogue through the API', () => {
  it('creates ingredients, a sub-recipe, a recipe using it, a dessert and a menu (201, server ids)', async () => {
    // Prices are invented test data, in cents.
    ids.hazelnuts = await create(
      t,
      chef,
      '/api/ingredients',
      ingredientBody({
        name: 'Hazelnuts, roasted',
        purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 2000 },
        allergens: { contains: [{ food: 'hazelnut' }], mayContain: [] },
      }),
    );
    ids.sugar = await create(
      t,
      chef,
      '/api/ingredients',
      ingredientBody({
        name: 'Caster sugar',
        purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 150 },
      }),
    );
    ids.flour = await create(
      t,
      chef,
      '/api/ingredients',
      ingredientBody({
        name: 'Wheat flour T55',
        purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 120 },
        // The supplier's cross-contact statement (invented).
        allergens: { contains: [{ food: 'wheat' }], mayContain: ['sesame'] },
      }),
    );
    ids.eggs = await create(
      t,
      chef,
      '/api/ingredients',
      ingredientBody({
        name: 'Eggs, large',
        purchase: { packSize: 30, packUnit: 'piece', packPriceMinor: 690 },
        unitWeightG: 50,
        countUnit: 'piece',
        allergens: { contains: [{ food: 'egg' }], mayContain: [] },
      }),
    );
    ids.milk = await create(
      t,
      chef,
      '/api/ingredients',
      ingredientBody({
        name: 'Whole milk',
        purchase: { packSize: 1, packUnit: 'l', packPriceMinor: 115 },
        densityGPerMl: 1.03,
        allergens: { contains: [{ food: 'milk' }], mayContain: [] },
      }),
    );
    ids.praline = await create(
      t,
      chef,
      '/api/recipes',
      recipeBody([ingredientLine(ids.hazelnuts, 300), ingredientLine(ids.sugar, 200)], {
        name: 'Hazelnut praline paste',
        yieldG: 450,
        storage: 'dry',
        shelfLifeHours: 720,
      }),
    );
    ids.crumble = await create(
      t,
      chef,
      '/api/recipes',
      recipeBody(
        [
          subRecipeLine(ids.praline, 90),
          ingredientLine(ids.flour, 120),
          ingredientLine(ids.eggs, 2, 'piece'),
          ingredientLine(ids.milk, 100, 'ml'),
        ],
        {
          name: 'Praline crumble',
          yieldG: 400,
          steps: [
            {
              name: 'Bake, stirring',
              kind: 'bake',
              activeMinutes: 4,
              waitMinutes: 20,
              temperatureC: 160,
            },
          ],
        },
      ),
    );
    ids.dessert = await create(t, chef, '/api/desserts', {
      name: 'Praline plate',
      description: 'Crumble and a spoon of praline.',
      components: [
        { recipeId: ids.crumble, quantity: 40, unit: 'g' },
        { recipeId: ids.praline, quantity: 10, unit: 'g' },
      ],
      platingNotes: 'Crumble first, praline on top.',
    });
    ids.menu = await create(t, chef, '/api/menus', {
      name: 'Praline supper',
      description: 'One plated dessert.',
      dessertIds: [ids.dessert],
      pricePerGuestMinor: 950,
      minGuests: 8,
      maxGuests: 40,
      leadDays: 3,
      active: true,
    });
    for (const id of Object.values(ids)) expect(id).toMatch(/^[0-9a-f-]{36}$/);

    const recipe = await t.http.get(`/api/recipes/${ids.crumble}`).set(bearer(chef)).expect(200);
    expect(recipe.body.lines).toEqual([
      { kind: 'recipe', recipeId: ids.praline, quantity: 90, unit: 'g' },
      { kind: 'ingredient', ingredientId: ids.flour, quantity: 120, unit: 'g' },
      { kind: 'ingredient', ingredientId: ids.eggs, quantity: 2, unit: 'piece' },
      { kind: 'ingredient', ingredientId: ids.milk, quantity: 100, unit: 'ml' },
    ]);
    expect(recipe.body.referenceNames).toMatchObject({
      [ids.praline]: 'Hazelnut praline paste',
      [ids.milk]: 'Whole milk',
    });
    // The oven step gets the shared safety caution, deferring to the local food code.
    expect(recipe.body.suggestedCautions.steps[0]).toMatch(/160 °C.*local food code/s);
    expect(recipe.body.suggestedCautions.storage).toMatch(/5 °C or below/);
  });

  it('takes a GET response back as a PUT body once the server-owned fields are removed', async () => {
    const got = await t.http.get(`/api/recipes/${ids.crumble}`).set(bearer(chef)).expect(200);
    const {
      id: _id,
      createdAt: _c,
      updatedAt: _u,
      referenceNames: _r,
      suggestedCautions: _s,
      ...body
    } = got.body as Record<string, unknown>;
    const put = await t.http
      .put(`/api/recipes/${ids.crumble}`)
      .set(bearer(chef))
      .send(body)
      .expect(200);
    expect(put.body.lines).toEqual(got.body.lines);
  });
});

describe('GET /api/recipes/:id/scaled (DESIGN.md §2 scaling and rounding)', () => {
  // Hand arithmetic for 880 g of "Praline crumble" (yield 400 g): factor 880 / 400 = 2.2.
  //   praline paste 90 g × 2.2 = 198 g → its own factor 198 / 450 = 0.44:
  //     hazelnuts 300 × 0.44 = 132 g; sugar 200 × 0.44 = 88 g (under 100 g: to 0.1 g)
  //   flour 120 × 2.2 = 264 g
  //   eggs 2 × 50 g × 2.2 = 220 g = 4.4 eggs → rounded up to 5 eggs = 250 g
  //   milk 100 ml × 1.03 g/ml × 2.2 = 226.6 g → 227 g (100 g and over: whole grams)
  // In purchase units: hazelnuts 0.132 kg, sugar 0.088 kg, flour 0.264 kg, eggs 5 pieces,
  // milk 227 g ÷ 1030 g/l = 0.2204 l → 0.22 l (three decimals).
  const expectTotals = (totals: Array<Record<string, unknown>>) => {
    const byName = Object.fromEntries(totals.map((x) => [x.name, x]));
    expect(byName['Hazelnuts, roasted']).toMatchObject({
      grams: 132,
      inPurchaseUnit: { quantity: 0.132, unit: 'kg' },
    });
    expect(byName['Caster sugar']).toMatchObject({
      grams: 88,
      inPurchaseUnit: { quantity: 0.088, unit: 'kg' },
    });
    expect(byName['Wheat flour T55']).toMatchObject({
      grams: 264,
      inPurchaseUnit: { quantity: 0.264, unit: 'kg' },
    });
    expect(byName['Eggs, large']).toMatchObject({
      exactGrams: 220,
      grams: 250,
      counted: { countUnit: 'piece', pieces: 5, unitWeightG: 50 },
      inPurchaseUnit: { quantity: 5, unit: 'piece' },
    });
    expect(byName['Whole milk']).toMatchObject({
      exactGrams: 226.6,
      grams: 227,
      inPurchaseUnit: { quantity: 0.22, unit: 'l' },
    });
  };

  it('scales to N grams, expanding the sub-recipe', async () => {
    const res = await t.http
      .get(`/api/recipes/${ids.crumble}/scaled?grams=880`)
      .set(bearer(chef))
      .expect(200);
    expect(res.body).toMatchObject({
      recipeId: ids.crumble,
      grams: 880,
      basis: { mode: 'grams', grams: 880 },
    });
    expect(res.body.tree.factor).toBe(2.2);
    const sub = res.body.tree.lines[0];
    expect(sub).toMatchObject({
      kind: 'recipe',
      recipe: { name: 'Hazelnut praline paste', grams: 198, factor: 0.44 },
    });
    expectTotals(res.body.totals);
  });

  it('scales to N plates of a dessert: 22 plates × 40 g = 880 g gives the same figures', async () => {
    const res = await t.http
      .get(`/api/recipes/${ids.crumble}/scaled?plates=22&dessertId=${ids.dessert}`)
      .set(bearer(staff))
      .expect(200);
    expect(res.body.basis).toEqual({
      mode: 'plates',
      plates: 22,
      dessertId: ids.dessert,
      dessertName: 'Praline plate',
      gramsPerPlate: 40,
    });
    expect(res.body.grams).toBe(880);
    expectTotals(res.body.totals);
  });

  it('counts a sub-recipe used both on the plate and inside a component', async () => {
    // Praline per plate: 10 g on the plate + 40 g of crumble × 90/400 = 9 g inside it = 19 g.
    // 22 plates → 418 g; hazelnuts 300 × 418/450 = 278.67 → 279 g; sugar 185.78 → 186 g.
    const res = await t.http
      .get(`/api/recipes/${ids.praline}/scaled?plates=22&dessertId=${ids.dessert}`)
      .set(bearer(chef))
      .expect(200);
    expect(res.body.basis.gramsPerPlate).toBe(19);
    expect(res.body.grams).toBe(418);
    const byName = Object.fromEntries(
      (res.body.totals as Array<{ name: string; grams: number }>).map((x) => [x.name, x.grams]),
    );
    expect(byName).toEqual({ 'Hazelnuts, roasted': 279, 'Caster sugar': 186 });
  });

  it('refuses an ambiguous, incomplete or impossible request with 400', async () => {
    const path = `/api/recipes/${ids.crumble}/scaled`;
    await t.http
      .get(`${path}?grams=880&plates=2&dessertId=${ids.dessert}`)
      .set(bearer(chef))
      .expect(400);
    await t.http.get(`${path}?plates=2`).set(bearer(chef)).expect(400);
    await t.http.get(path).set(bearer(chef)).expect(400);
    await t.http.get(`${path}?grams=-5`).set(bearer(chef)).expect(400);
    await t.http.get(`${path}?grams=1&grams=2`).set(bearer(chef)).expect(400);
    await t.http.get(`${path}?plates=2&dessertId=${NO_SUCH_ID}`).set(bearer(chef)).expect(400);
    const other = await create(t, chef, '/api/desserts', {
      name: 'Sugar only',
      components: [{ recipeId: ids.praline, quantity: 5, unit: 'g' }],
    });
    const res = await t.http
      .get(`${path}?plates=2&dessertId=${other}`)
      .set(bearer(chef))
      .expect(400);
    expect(res.body.message).toEqual(['“Sugar only” does not use “Praline crumble”.']);
    await t.http.delete(`/api/desserts/${other}`).set(bearer(chef)).expect(204);
  });
});

describe('allergens (Regulation (EU) 1169/2011 Annex II; FD&C Act §201(qq), FDA Edition 5)', () => {
  it('rolls up through the sub-recipe: hazelnut from the praline is a nut in the EU and a tree nut in the US', async () => {
    const res = await t.http
      .get(`/api/recipes/${ids.crumble}/allergens`)
      .set(bearer(staff))
      .expect(200);
    const groups = (d: Array<{ group: string }>) => d.map((x) => x.group);
    // Annex II order: 1 gluten, 3 eggs, 7 milk, 8 nuts; hazelnut is Annex II 8 (Corylus avellana).
    expect(groups(res.body.eu.contains)).toEqual(['gluten', 'eggs', 'milk', 'nuts']);
    // §201(qq) order: milk, egg, tree nuts, wheat.
    expect(groups(res.body.us.contains)).toEqual(['milk', 'egg', 'tree_nuts', 'wheat']);
    // The flour's "may contain sesame" stays apart from "contains".
    expect(groups(res.body.eu.mayContain)).toEqual(['sesame']);
    expect(groups(res.body.us.mayContain)).toEqual(['sesame']);
    const nuts = res.body.eu.contains.find((d: { group: string }) => d.group === 'nuts');
    expect(nuts.foods).toEqual(['hazelnut']);
    expect(nuts.carriers[0]).toMatchObject({
      ingredientName: 'Hazelnuts, roasted',
      path: ['Praline crumble', 'Hazelnut praline paste'],
    });
    expect(res.body.dietary).toMatchObject({ vegetarian: true, vegan: false, alcohol: false });
    const emphasised = (res.body.label.segments as Array<{ text: string; emphasis: boolean }>)
      .filter((s) => s.emphasis)
      .map((s) => s.text);
    expect(emphasised).toEqual(expect.arrayContaining(['Hazelnuts', 'Wheat', 'milk', 'Eggs']));
    expect(res.body.label.plainText).toMatch(
      /Hazelnut praline paste \(HAZELNUTS, roasted, Caster sugar\)/,
    );
    expect(res.body.usContainsStatement).toBe('Contains: milk, egg, hazelnut, wheat.');
  });

  it('rolls up a plate of the dessert, with its dietary flags', async () => {
    const res = await t.http
      .get(`/api/desserts/${ids.dessert}/allergens`)
      .set(bearer(staff))
      .expect(200);
    expect(res.body.eu.contains.map((d: { group: string }) => d.group)).toEqual([
      'gluten',
      'eggs',
      'milk',
      'nuts',
    ]);
    expect(res.body.grams).toBe(50);
  });
});

describe('costs (chef only) — integer minor units, DESIGN.md §5', () => {
  // Cost per gram: hazelnuts 2000/1000 = 2 c; sugar 0.15 c; flour 0.12 c; eggs 690/(30 × 50) =
  // 0.46 c; milk 115/1030 c. Praline batch 300 × 2 + 200 × 0.15 = 630 c → 1.4 c/g.
  // Crumble batch 90 × 1.4 + 120 × 0.12 + 100 × 0.46 + 103 × 115/1030 = 126 + 14.4 + 46 + 11.5
  // = 197.9 c → 198 c; per kg 197.9 / 400 × 1000 = 494.75 → 495 c (half away from zero).
  it('gives the cost per batch and per kg', async () => {
    const res = await t.http.get(`/api/recipes/${ids.crumble}/cost`).set(bearer(chef)).expect(200);
    expect(res.body).toMatchObject({ batchCostMinor: 198, costPerKgMinor: 495, yieldG: 400 });
    expect(res.body.lines.map((l: { costMinor: number }) => l.costMinor)).toEqual([
      126, 14, 46, 12,
    ]);
  });

  // Plate: 40 g × 0.49475 c + 10 g × 1.4 c = 19.79 + 14 = 33.79 c → 34 c.
  it('gives the plate cost, allergens and dietary flags in the dessert summary', async () => {
    const res = await t.http
      .get(`/api/desserts/${ids.dessert}/summary`)
      .set(bearer(chef))
      .expect(200);
    expect(res.body).toMatchObject({ plateCostMinor: 34, plateGrams: 50, currency: 'EUR' });
    expect(res.body.allergens.eu.mayContain.map((d: { group: string }) => d.group)).toEqual([
      'sesame',
    ]);
    expect(res.body.dietary.vegetarian).toBe(true);
  });

  // Food cost 33.79 / 950 = 3.557 % → 3.6 %; for 30 %: 33.79 × 100 / 30 = 112.63 → 113 c,
  // in steps of 50 c → 150 c.
  it('gives the menu food-cost percent and the price for a target', async () => {
    const res = await t.http
      .get(`/api/menus/${ids.menu}/costing?targetPercent=30`)
      .set(bearer(chef))
      .expect(200);
    expect(res.body).toMatchObject({
      costPerGuestMinor: 34,
      pricePerGuestMinor: 950,
      foodCostPercent: 3.6,
      suggestion: { targetPercent: 30, stepMinor: 1, pricePerGuestMinor: 113 },
    });
    const stepped = await t.http
      .get(`/api/menus/${ids.menu}/costing?targetPercent=30&stepMinor=50`)
      .set(bearer(chef))
      .expect(200);
    expect(stepped.body.suggestion.pricePerGuestMinor).toBe(150);
    await t.http
      .get(`/api/menus/${ids.menu}/costing?targetPercent=100`)
      .set(bearer(chef))
      .expect(400);
  });

  it('refuses staff on every cost view (403) and hides pack prices from them', async () => {
    await t.http.get(`/api/recipes/${ids.crumble}/cost`).set(bearer(staff)).expect(403);
    await t.http.get(`/api/desserts/${ids.dessert}/summary`).set(bearer(staff)).expect(403);
    await t.http.get(`/api/menus/${ids.menu}/costing`).set(bearer(staff)).expect(403);
    const one = await t.http
      .get(`/api/ingredients/${ids.hazelnuts}`)
      .set(bearer(staff))
      .expect(200);
    expect(one.body.purchase).toEqual({ packSize: 1, packUnit: 'kg', packPriceMinor: null });
    const list = await t.http.get('/api/ingredients').set(bearer(staff)).expect(200);
    expect(
      list.body.items.every(
        (i: { purchase: { packPriceMinor: unknown } }) => i.purchase.packPriceMinor === null,
      ),
    ).toBe(true);
    const asChef = await t.http
      .get(`/api/ingredients/${ids.hazelnuts}`)
      .set(bearer(chef))
      .expect(200);
    expect(asChef.body.purchase.packPriceMinor).toBe(2000);
  });
});

describe('GET /api/recipes/:id/mix-balance (21 CFR 135.110; Goff, Ice Cream Technology, ch. 16)', () => {
  it('classifies a frozen mix and checks it against the bands', async () => {
    // One ingredient standing for a finished custard mix: 12 % milkfat, 10 % MSNF, 15 % sucrose,
    // 2 % egg-yolk solids, 60 % water (test data). 21 CFR 135.110(a)(2): with 12 % milkfat the
    // MSNF minimum is 10 − 2 = 8 %, met; egg-yolk solids of 1.4 % or more make frozen custard.
    const mix = await create(
      t,
      chef,
      '/api/ingredients',
      ingredientBody({
        name: 'Custard mix (test)',
        allergens: { contains: [{ food: 'milk' }, { food: 'egg' }], mayContain: [] },
        composition: {
          water: 60,
          fat: 12,
          milkFat: 12,
          msnf: 10,
          sugars: { sucrose: 15 },
          eggYolkSolids: 2,
        },
      }),
    );
    const frozen = await create(
      t,
      chef,
      '/api/recipes',
      recipeBody([ingredientLine(mix, 1000)], { name: 'Custard ice (test)', storage: 'frozen' }),
    );
    const res = await t.http
      .get(`/api/recipes/${frozen}/mix-balance`)
      .set(bearer(staff))
      .expect(200);
    expect(res.body.classification.class).toBe('frozen_custard');
    expect(res.body.style).toBe('ice_cream');
    expect(res.body.composition).toMatchObject({ milkFat: 12, msnf: 10, totalSolids: 40 });
    // Goff's sucrose band is 10–14 %: 15 % is above it.
    expect(res.body.bands.find((b: { measure: string }) => b.measure === 'sucrose')).toMatchObject({
      value: 15,
      status: 'above',
    });
    const overrun = await t.http
      .get(`/api/recipes/${frozen}/mix-balance?overrunPercent=100&bulkyFlavours=true`)
      .set(bearer(chef))
      .expect(200);
    expect(overrun.body.classification.assumptions[0]).toBe('Overrun 100 % as entered.');
    await t.http
      .get(`/api/recipes/${frozen}/mix-balance?overrunPercent=400`)
      .set(bearer(chef))
      .expect(400);
  });

  it('refuses a recipe that is not frozen (400) and a frozen one missing compositions (409)', async () => {
    const chilled = await t.http
      .get(`/api/recipes/${ids.crumble}/mix-balance`)
      .set(bearer(chef))
      .expect(400);
    expect(chilled.body.message[0]).toMatch(/frozen recipes; “Praline crumble” is stored chilled/);
    const noComposition = await create(
      t,
      chef,
      '/api/recipes',
      recipeBody([ingredientLine(ids.sugar, 100)], { name: 'Sugar ice (test)', storage: 'frozen' }),
    );
    const res = await t.http
      .get(`/api/recipes/${noComposition}/mix-balance`)
      .set(bearer(chef))
      .expect(409);
    expect(res.body.message).toMatch(/“Caster sugar” in “Sugar ice \(test\)” has no composition/);
  });
});

describe('rules on writes', () => {
  it('refuses a recipe loop with 400 naming it, and changes nothing', async () => {
    const before = await t.http.get(`/api/recipes/${ids.praline}`).set(bearer(chef)).expect(200);
    const res = await t.http
      .put(`/api/recipes/${ids.praline}`)
      .set(bearer(chef))
      .send(
        recipeBody([ingredientLine(ids.hazelnuts, 300), subRecipeLine(ids.crumble, 50)], {
          name: 'Hazelnut praline paste',
          yieldG: 450,
        }),
      )
      .expect(400);
    expect(res.body).toMatchObject({ statusCode: 400, error: 'Bad Request' });
    expect(res.body.message[0]).toMatch(
      /loop: (Praline crumble → Hazelnut praline paste → Praline crumble|Hazelnut praline paste → Praline crumble → Hazelnut praline paste)/,
    );
    const after = await t.http.get(`/api/recipes/${ids.praline}`).set(bearer(chef)).expect(200);
    expect(after.body.lines).toEqual(before.body.lines);
  });

  it('refuses a recipe that uses itself', async () => {
    const res = await t.http
      .put(`/api/recipes/${ids.praline}`)
      .set(bearer(chef))
      .send(recipeBody([subRecipeLine(ids.praline, 10)], { name: 'Hazelnut praline paste' }))
      .expect(400);
    expect(res.body.message[0]).toMatch(/Hazelnut praline paste → Hazelnut praline paste/);
  });

  it('lets only one of two concurrent edits that together would make a loop through', async () => {
    const a = await create(
      t,
      chef,
      '/api/recipes',
      recipeBody([ingredientLine(ids.sugar, 10)], { name: 'Loop A' }),
    );
    const b = await create(
      t,
      chef,
      '/api/recipes',
      recipeBody([ingredientLine(ids.sugar, 10)], { name: 'Loop B' }),
    );
    const [ra, rb] = await Promise.all([
      t.http
        .put(`/api/recipes/${a}`)
        .set(bearer(chef))
        .send(recipeBody([subRecipeLine(b, 10)], { name: 'Loop A' })),
      t.http
        .put(`/api/recipes/${b}`)
        .set(bearer(chef))
        .send(recipeBody([subRecipeLine(a, 10)], { name: 'Loop B' })),
    ]);
    expect([ra.status, rb.status].sort()).toEqual([200, 400]);
  });

  it('refuses a line pointing at a missing ingredient or recipe with 400 naming it', async () => {
    const res = await t.http
      .post('/api/recipes')
      .set(bearer(chef))
      .send(
        recipeBody([ingredientLine(NO_SUCH_ID, 10), subRecipeLine(NO_SUCH_ID, 5)], {
          name: 'Ghost',
        }),
      )
      .expect(400);
    expect(res.body.message).toEqual([
      `“Ghost” uses an ingredient that no longer exists (id ${NO_SUCH_ID}). Remove that line or pick another ingredient.`,
      `“Ghost” uses a recipe that no longer exists (id ${NO_SUCH_ID}). Remove that line or pick another recipe.`,
    ]);
    const dessert = await t.http
      .post('/api/desserts')
      .set(bearer(chef))
      .send({ name: 'Ghost plate', components: [{ recipeId: NO_SUCH_ID, quantity: 1, unit: 'g' }] })
      .expect(400);
    expect(dessert.body.message[0]).toContain(NO_SUCH_ID);
    const menu = await t.http
      .post('/api/menus')
      .set(bearer(chef))
      .send({
        name: 'Ghost menu',
        dessertIds: [NO_SUCH_ID],
        pricePerGuestMinor: 100,
        minGuests: 1,
        maxGuests: 2,
        leadDays: 0,
        active: false,
      })
      .expect(400);
    expect(menu.body.message[0]).toContain(NO_SUCH_ID);
  });

  it('refuses a quantity that cannot become grams, naming the ingredient', async () => {
    const res = await t.http
      .post('/api/recipes')
      .set(bearer(chef))
      .send(recipeBody([ingredientLine(ids.flour, 2, 'us_cup')], { name: 'Cup of flour' }))
      .expect(400);
    expect(res.body.message[0]).toMatch(/“Wheat flour T55” has no density/);
  });

  it('refuses with 409 an ingredient change that would break a recipe using it', async () => {
    const res = await t.http
      .put(`/api/ingredients/${ids.milk}`)
      .set(bearer(chef))
      .send(
        ingredientBody({
          name: 'Whole milk',
          purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 115 },
          allergens: { contains: [{ food: 'milk' }], mayContain: [] },
        }),
      )
      .expect(409);
    expect(res.body.message).toMatch(
      /Saving “Whole milk” would break the recipe “Praline crumble”: “Whole milk” has no density/,
    );
    const milk = await t.http.get(`/api/ingredients/${ids.milk}`).set(bearer(chef)).expect(200);
    expect(milk.body.densityGPerMl).toBe(1.03);
  });

  it('replaces a whole ingredient with PUT', async () => {
    const res = await t.http
      .put(`/api/ingredients/${ids.sugar}`)
      .set(bearer(chef))
      .send(
        ingredientBody({
          name: 'Caster sugar',
          purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 150 },
          notes: 'Fine grain.',
        }),
      )
      .expect(200);
    expect(res.body).toMatchObject({ id: ids.sugar, notes: 'Fine grain.' });
  });
});

describe('deleting something in use (409) — nothing is deleted', () => {
  it('names the recipe that uses an ingredient, and how many more', async () => {
    for (const name of ['Syrup A', 'Syrup B']) {
      await create(t, chef, '/api/recipes', recipeBody([ingredientLine(ids.sugar, 100)], { name }));
    }
    const res = await t.http.delete(`/api/ingredients/${ids.sugar}`).set(bearer(chef)).expect(409);
    expect(res.body.message).toMatch(
      /^“Caster sugar” cannot be deleted: used by the recipe “.+” and \d+ more\./,
    );
    expect(res.body.usedBy.length).toBeGreaterThanOrEqual(3);
    expect(res.body.usedBy.map((u: { name: string }) => u.name)).toEqual(
      expect.arrayContaining(['Hazelnut praline paste', 'Syrup A', 'Syrup B']),
    );
    await t.http.get(`/api/ingredients/${ids.sugar}`).set(bearer(chef)).expect(200);

    const hazelnuts = await t.http
      .delete(`/api/ingredients/${ids.hazelnuts}`)
      .set(bearer(chef))
      .expect(409);
    expect(hazelnuts.body.message).toBe(
      '“Hazelnuts, roasted” cannot be deleted: used by the recipe “Hazelnut praline paste”. Remove it from there first.',
    );
  });

  it('names what uses a recipe (recipes, then desserts) and the menu that serves a dessert', async () => {
    const recipe = await t.http.delete(`/api/recipes/${ids.praline}`).set(bearer(chef)).expect(409);
    expect(recipe.body.message).toMatch(/used by the recipe “Praline crumble” and 1 more/);
    expect(recipe.body.usedBy).toEqual([
      { kind: 'recipe', id: ids.crumble, name: 'Praline crumble' },
      { kind: 'dessert', id: ids.dessert, name: 'Praline plate' },
    ]);
    const dessert = await t.http
      .delete(`/api/desserts/${ids.dessert}`)
      .set(bearer(chef))
      .expect(409);
    expect(dessert.body.message).toMatch(/used by the menu “Praline supper”/);
    await t.http.get(`/api/recipes/${ids.praline}`).set(bearer(chef)).expect(200);
    await t.http.get(`/api/desserts/${ids.dessert}`).set(bearer(chef)).expect(200);
  });

  it('is enforced by the database as well (foreign keys, ON DELETE RESTRICT)', async () => {
    // A plain DELETE, past the service's own check (the query builder writes each database's SQL).
    const remove = (table: string, id: string) =>
      t.dataSource.createQueryBuilder().delete().from(table).where('id = :id', { id }).execute();
    await expect(remove('ingredients', ids.hazelnuts)).rejects.toThrow(/foreign key/i);
    await expect(remove('recipes', ids.praline)).rejects.toThrow(/foreign key/i);
    await expect(remove('desserts', ids.dessert)).rejects.toThrow(/foreign key/i);
  });

  it('deletes what nothing uses (204), then 404', async () => {
    const spare = await create(t, chef, '/api/ingredients', ingredientBody({ name: 'Spare salt' }));
    await t.http.delete(`/api/ingredients/${spare}`).set(bearer(chef)).expect(204);
    await t.http.get(`/api/ingredients/${spare}`).set(bearer(chef)).expect(404);
  });
});

describe('mass assignment and validation (OWASP API3:2023; QUALITY.md)', () => {
  it('refuses server-owned and unknown fields with 400 naming each, at any depth', async () => {
    const withId = await t.http
      .post('/api/ingredients')
      .set(bearer(chef))
      .send(ingredientBody({ id: NO_SUCH_ID, costMinor: 5 }))
      .expect(400);
    expect(withId.body).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: [
        'id: “id” is set by the server; leave it out.',
        'costMinor: Unknown field “costMinor”: it is not accepted.',
      ],
    });
    const nested = await t.http
      .post('/api/recipes')
      .set(bearer(chef))
      .send(recipeBody([{ ...ingredientLine(ids.sugar, 10), costMinor: 3 }], { name: 'Sneaky' }))
      .expect(400);
    expect(nested.body.message).toEqual([
      'lines[0].costMinor: Unknown field “costMinor”: it is not accepted.',
    ]);
    const photos = await t.http
      .post('/api/desserts')
      .set(bearer(chef))
      .send({
        name: 'Pic',
        components: [{ recipeId: ids.praline, quantity: 5, unit: 'g' }],
        photos: ['https://evil.example/x.svg'],
      })
      .expect(400);
    expect(photos.body.message).toEqual(['photos: “photos” is set by the server; leave it out.']);
    const menu = await t.http
      .put(`/api/menus/${ids.menu}`)
      .set(bearer(chef))
      .send({
        name: 'Praline supper',
        dessertIds: [ids.dessert],
        pricePerGuestMinor: 950,
        minGuests: 8,
        maxGuests: 40,
        leadDays: 3,
        active: true,
        costPerGuestMinor: 1,
      })
      .expect(400);
    expect(menu.body.message).toEqual([
      'costPerGuestMinor: Unknown field “costPerGuestMinor”: it is not accepted.',
    ]);
  });

  it('answers 400 with the shared schema messages, every problem at once', async () => {
    const res = await t.http
      .post('/api/ingredients')
      .set(bearer(chef))
      .send(
        ingredientBody({
          name: '',
          purchase: { packSize: 0, packUnit: 'kg', packPriceMinor: 12.5 },
        }),
      )
      .expect(400);
    expect(res.body.message).toEqual([
      'name: Give it a name.',
      'purchase.packSize: The pack size must be more than 0.',
      'purchase.packPriceMinor: The pack price is in cents (whole minor units).',
    ]);
    const menu = await t.http
      .post('/api/menus')
      .set(bearer(chef))
      .send({
        name: 'Upside down',
        dessertIds: [ids.dessert],
        pricePerGuestMinor: 950,
        minGuests: 40,
        maxGuests: 8,
        leadDays: 3,
        active: true,
      })
      .expect(400);
    expect(menu.body.message).toEqual([
      'maxGuests: The maximum number of guests must be at least the minimum.',
    ]);
    await t.http.post('/api/menus').set(bearer(chef)).send([1, 2]).expect(400);
  });
});

describe('lists: paginated, capped, searchable by name', () => {
  it('finds by part of the name in any case and pages', async () => {
    const res = await t.http
      .get('/api/recipes?q=PRALINE&pageSize=1')
      .set(bearer(staff))
      .expect(200);
    expect(res.body).toMatchObject({ total: 2, page: 1, pageSize: 1 });
    expect(res.body.items[0].name).toBe('Hazelnut praline paste');
    const second = await t.http
      .get('/api/recipes?q=praline&pageSize=1&page=2')
      .set(bearer(staff))
      .expect(200);
    expect(second.body.items[0].name).toBe('Praline crumble');
    const literal = await t.http.get('/api/ingredients?q=%25').set(bearer(staff)).expect(200);
    expect(literal.body.total).toBe(0);
    const desserts = await t.http.get('/api/desserts?q=plate').set(bearer(staff)).expect(200);
    expect(desserts.body.items.map((d: { name: string }) => d.name)).toEqual(['Praline plate']);
  });

  it('refuses a page size over 100 and repeated parameters', async () => {
    for (const path of ['/api/ingredients', '/api/recipes', '/api/desserts', '/api/menus/admin']) {
      await t.http.get(`${path}?pageSize=101`).set(bearer(chef)).expect(400);
      await t.http.get(`${path}?page=1&page=2`).set(bearer(chef)).expect(400);
    }
    await t.http.get('/api/menus?pageSize=101').expect(400);
  });
});

describe('public menus (QUALITY.md: never costs or internal notes)', () => {
  const PUBLIC_MENU_KEYS = [
    'allergens',
    'allergens.advisories',
    'allergens.eu',
    'allergens.eu.contains',
    'allergens.eu.contains[].foods',
    'allergens.eu.contains[].group',
    'allergens.eu.contains[].label',
    'allergens.eu.mayContain',
    'allergens.eu.mayContain[].foods',
    'allergens.eu.mayContain[].group',
    'allergens.eu.mayContain[].label',
    'allergens.us',
    'allergens.us.contains',
    'allergens.us.contains[].foods',
    'allergens.us.contains[].group',
    'allergens.us.contains[].label',
    'allergens.us.mayContain',
    'allergens.us.mayContain[].foods',
    'allergens.us.mayContain[].group',
    'allergens.us.mayContain[].label',
    'currency',
    'description',
    'desserts',
  ];
  const dessertKeys = (p: string) =>
    [
      '',
      '.allergens',
      '.allergens.advisories',
      '.allergens.eu',
      '.allergens.eu.contains',
      '.allergens.eu.contains[].foods',
      '.allergens.eu.contains[].group',
      '.allergens.eu.contains[].label',
      '.allergens.eu.mayContain',
      '.allergens.eu.mayContain[].foods',
      '.allergens.eu.mayContain[].group',
      '.allergens.eu.mayContain[].label',
      '.allergens.us',
      '.allergens.us.contains',
      '.allergens.us.contains[].foods',
      '.allergens.us.contains[].group',
      '.allergens.us.contains[].label',
      '.allergens.us.mayContain',
      '.allergens.us.mayContain[].foods',
      '.allergens.us.mayContain[].group',
      '.allergens.us.mayContain[].label',
      '.components',
      '.components[].grams',
      '.components[].name',
      '.components[].quantity',
      '.components[].unit',
      '.description',
      '.dietary',
      '.dietary.alcohol',
      '.dietary.animalOrigins',
      '.dietary.gelatin',
      '.dietary.vegan',
      '.dietary.vegetarian',
      '.id',
      '.name',
      '.photos',
    ]
      .filter((k) => k !== '')
      .map((k) => `${p}${k}`);
  const menuKeys = (p: string) =>
    [
      ...PUBLIC_MENU_KEYS.map((k) => `${p}${k}`),
      ...dessertKeys(`${p}desserts[]`),
      ...[
        'dietary',
        'dietary.alcohol',
        'dietary.animalOrigins',
        'dietary.gelatin',
        'dietary.vegan',
        'dietary.vegetarian',
        'id',
        'leadDays',
        'maxGuests',
        'minGuests',
        'name',
        'photos',
        'pricePerGuestMinor',
      ].map((k) => `${p}${k}`),
    ].sort();

  it('lets anyone — no token, or a client — list active menus with exactly the public keys', async () => {
    const inactive = await create(t, chef, '/api/menus', {
      name: 'Winter tasting (draft)',
      dessertIds: [ids.dessert],
      pricePerGuestMinor: 1800,
      minGuests: 2,
      maxGuests: 12,
      leadDays: 7,
      active: false,
    });
    for (const headers of [{}, bearer(client)]) {
      const res = await t.http.get('/api/menus').set(headers).expect(200);
      expect(res.body.items.map((m: { name: string }) => m.name)).toEqual(['Praline supper']);
      expect(keyPaths(res.body)).toEqual(
        ['items', 'page', 'pageSize', 'total', ...menuKeys('items[].')].sort(),
      );
      const text = JSON.stringify(res.body);
      for (const secret of [
        'costMinor',
        'packPriceMinor',
        'platingNotes',
        'notes',
        'Crumble first',
        'Hazelnuts, roasted',
        'Winter tasting',
      ]) {
        expect(text).not.toContain(secret);
      }
      const [menu] = res.body.items;
      expect(menu).toMatchObject({
        id: ids.menu,
        pricePerGuestMinor: 950,
        currency: 'EUR',
        minGuests: 8,
        maxGuests: 40,
        leadDays: 3,
        dietary: { vegetarian: true, vegan: false, alcohol: false, gelatin: [] },
      });
      expect(menu.allergens.eu.contains.map((a: { label: string }) => a.label)).toEqual([
        'Cereals containing gluten',
        'Eggs',
        'Milk',
        'Nuts',
      ]);
      expect(menu.allergens.eu.contains[3].foods).toEqual(['hazelnuts']);
      expect(menu.allergens.eu.mayContain).toEqual([
        { group: 'sesame', label: 'Sesame', foods: ['sesame'] },
      ]);
      expect(menu.allergens.us.contains.map((a: { group: string }) => a.group)).toEqual([
        'milk',
        'egg',
        'tree_nuts',
        'wheat',
      ]);
      expect(menu.desserts[0].components).toEqual([
        { name: 'Praline crumble', quantity: 40, unit: 'g', grams: 40 },
        { name: 'Hazelnut praline paste', quantity: 10, unit: 'g', grams: 10 },
      ]);
    }
    const one = await t.http.get(`/api/menus/${ids.menu}`).expect(200);
    expect(keyPaths(one.body)).toEqual(menuKeys(''));
    await t.http.get(`/api/menus/${inactive}`).expect(404);
    await t.http.get(`/api/menus/${NO_SUCH_ID}`).expect(404);
    // The kitchen sees every menu, inactive ones too.
    const all = await t.http.get('/api/menus/admin').set(bearer(staff)).expect(200);
    expect(all.body.items.map((m: { name: string }) => m.name)).toEqual([
      'Praline supper',
      'Winter tasting (draft)',
    ]);
    const draft = await t.http.get(`/api/menus/admin/${inactive}`).set(bearer(chef)).expect(200);
    expect(draft.body).toMatchObject({
      active: false,
      dessertIds: [ids.dessert],
      referenceNames: { [ids.dessert]: 'Praline plate' },
    });
  });

  it('shows a menu change at once, though the public cards are cached between changes', async () => {
    const menuBody = {
      name: 'Praline supper',
      description: 'One plated dessert.',
      dessertIds: [ids.dessert],
      pricePerGuestMinor: 950,
      minGuests: 8,
      maxGuests: 40,
      leadDays: 3,
      active: true,
    };
    const names = async () =>
      ((await t.http.get('/api/menus').expect(200)).body as { items: { id: string }[] }).items.map(
        (m) => m.id,
      );
    expect(await names()).toContain(ids.menu); // warms the cache
    await t.http
      .put(`/api/menus/${ids.menu}`)
      .set(bearer(chef))
      .send({ ...menuBody, active: false })
      .expect(200);
    expect(await names()).not.toContain(ids.menu);
    await t.http.get(`/api/menus/${ids.menu}`).expect(404);
    await t.http
      .put(`/api/menus/${ids.menu}`)
      .set(bearer(chef))
      .send({ ...menuBody, pricePerGuestMinor: 1050 })
      .expect(200);
    const back = await t.http.get(`/api/menus/${ids.menu}`).expect(200);
    expect(back.body.pricePerGuestMinor).toBe(1050);
    await t.http.put(`/api/menus/${ids.menu}`).set(bearer(chef)).send(menuBody).expect(200);
  });

  it('merges allergens over a menu’s desserts: contains wins over may contain', async () => {
    const sesameSeeds = await create(
      t,
      chef,
      '/api/ingredients',
      ingredientBody({
        name: 'Sesame seeds',
        allergens: { contains: [{ food: 'sesame' }], mayContain: [] },
      }),
    );
    const tuile = await create(
      t,
      chef,
      '/api/recipes',
      recipeBody([ingredientLine(sesameSeeds, 50)], {
        name: 'Sesame tuile',
        yieldG: 50,
        storage: 'dry',
      }),
    );
    const second = await create(t, chef, '/api/desserts', {
      name: 'Sesame crisp',
      components: [{ recipeId: tuile, quantity: 5, unit: 'g' }],
    });
    const menu = await create(t, chef, '/api/menus', {
      name: 'Two plates',
      dessertIds: [ids.dessert, second],
      pricePerGuestMinor: 1500,
      minGuests: 2,
      maxGuests: 20,
      leadDays: 2,
      active: true,
    });
    const res = await t.http.get(`/api/menus/${menu}`).expect(200);
    expect(res.body.allergens.eu.contains.map((a: { group: string }) => a.group)).toEqual([
      'gluten',
      'eggs',
      'milk',
      'nuts',
      'sesame',
    ]);
    expect(res.body.allergens.eu.mayContain).toEqual([]);
    expect(
      res.body.desserts[0].allergens.eu.mayContain.map((a: { group: string }) => a.group),
    ).toEqual(['sesame']);
    expect(res.body.dietary).toMatchObject({ vegetarian: true, vegan: false });
    expect(res.body.desserts[1].dietary).toMatchObject({ vegetarian: true, vegan: true });
  });
});

describe('roles: chef writes, staff reads, clients see the public menus only', () => {
  it('lets staff read every kitchen resource and refuses their writes (403)', async () => {
    for (const path of ['/api/ingredients', '/api/recipes', '/api/desserts', '/api/menus/admin']) {
      await t.http.get(path).set(bearer(staff)).expect(200);
    }
    await t.http.get(`/api/recipes/${ids.crumble}`).set(bearer(staff)).expect(200);
    await t.http.get(`/api/desserts/${ids.dessert}`).set(bearer(staff)).expect(200);
    const writes: Array<[string, string]> = [
      ['post', '/api/ingredients'],
      ['put', `/api/ingredients/${ids.sugar}`],
      ['delete', `/api/ingredients/${ids.sugar}`],
      ['post', '/api/recipes'],
      ['put', `/api/recipes/${ids.crumble}`],
      ['delete', `/api/recipes/${ids.crumble}`],
      ['post', '/api/desserts'],
      ['put', `/api/desserts/${ids.dessert}`],
      ['delete', `/api/desserts/${ids.dessert}`],
      ['post', '/api/menus'],
      ['put', `/api/menus/${ids.menu}`],
      ['delete', `/api/menus/${ids.menu}`],
      ['post', `/api/desserts/${ids.dessert}/photo`],
      ['post', `/api/menus/${ids.menu}/photo`],
    ];
    for (const [method, path] of writes) {
      const res = await t.http[method as 'post'](path).set(bearer(staff)).send({ name: 'x' });
      expect(res.status, `${method} ${path}`).toBe(403);
    }
    await t.http.get(`/api/ingredients/${ids.sugar}`).set(bearer(chef)).expect(200);
  });

  it('refuses clients everything but the public menus (403)', async () => {
    for (const path of [
      '/api/ingredients',
      '/api/recipes',
      `/api/recipes/${ids.crumble}`,
      `/api/recipes/${ids.crumble}/allergens`,
      '/api/desserts',
      '/api/menus/admin',
      `/api/menus/${ids.menu}/costing`,
    ]) {
      const res = await t.http.get(path).set(bearer(client));
      expect(res.status, path).toBe(403);
    }
    await t.http.post('/api/menus').set(bearer(client)).send({}).expect(403);
  });

  it('answers 401 without a token on every kitchen route except the public ones', async () => {
    const id = NO_SUCH_ID;
    const routes: Array<[string, string]> = [
      ['get', '/api/ingredients'],
      ['get', `/api/ingredients/${id}`],
      ['post', '/api/ingredients'],
      ['put', `/api/ingredients/${id}`],
      ['delete', `/api/ingredients/${id}`],
      ['get', '/api/recipes'],
      ['get', `/api/recipes/${id}`],
      ['get', `/api/recipes/${id}/scaled`],
      ['get', `/api/recipes/${id}/allergens`],
      ['get', `/api/recipes/${id}/cost`],
      ['get', `/api/recipes/${id}/mix-balance`],
      ['post', '/api/recipes'],
      ['put', `/api/recipes/${id}`],
      ['delete', `/api/recipes/${id}`],
      ['get', '/api/desserts'],
      ['get', `/api/desserts/${id}`],
      ['get', `/api/desserts/${id}/allergens`],
      ['get', `/api/desserts/${id}/summary`],
      ['post', '/api/desserts'],
      ['put', `/api/desserts/${id}`],
      ['delete', `/api/desserts/${id}`],
      ['post', `/api/desserts/${id}/photo`],
      ['delete', `/api/desserts/${id}/photo/${id}`],
      ['get', '/api/menus/admin'],
      ['get', `/api/menus/admin/${id}`],
      ['get', `/api/menus/${id}/costing`],
      ['post', '/api/menus'],
      ['put', `/api/menus/${id}`],
      ['delete', `/api/menus/${id}`],
      ['post', `/api/menus/${id}/photo`],
      ['delete', `/api/menus/${id}/photo/${id}`],
    ];
    for (const [method, path] of routes) {
      const res = await t.http[method as 'get'](path);
      expect(res.status, `${method} ${path}`).toBe(401);
    }
    await t.http.get('/api/menus').expect(200);
    await t.http.get(`/api/menus/${ids.menu}`).expect(200);
  });

  it('answers 404 for unknown ids', async () => {
    for (const path of ['ingredients', 'recipes', 'desserts', 'menus/admin']) {
      await t.http.get(`/api/${path}/${NO_SUCH_ID}`).set(bearer(chef)).expect(404);
    }
    for (const path of ['ingredients', 'recipes', 'desserts', 'menus']) {
      await t.http.delete(`/api/${path}/${NO_SUCH_ID}`).set(bearer(chef)).expect(404);
    }
    await t.http
      .put(`/api/ingredients/${NO_SUCH_ID}`)
      .set(bearer(chef))
      .send(ingredientBody())
      .expect(404);
    for (const view of ['scaled?grams=10', 'allergens', 'cost', 'mix-balance']) {
      await t.http.get(`/api/recipes/${NO_SUCH_ID}/${view}`).set(bearer(chef)).expect(404);
    }
    await t.http.get(`/api/desserts/${NO_SUCH_ID}/summary`).set(bearer(chef)).expect(404);
    await t.http.get(`/api/menus/${NO_SUCH_ID}/costing`).set(bearer(chef)).expect(404);
  });
});

describe('one shared SQLite connection (STACK.md)', () => {
  it('creates 30 ingredients concurrently without a collision', async () => {
    const results = await Promise.all(
      Array.from({ length: 30 }, (_, i) =>
        t.http
          .post('/api/ingredients')
          .set(bearer(chef))
          .send(ingredientBody({ name: `Concurrent ${i}` })),
      ),
    );
    expect(results.map((r) => r.status)).toEqual(Array(30).fill(201));
    const res = await t.http
      .get('/api/ingredients?q=concurrent&pageSize=100')
      .set(bearer(chef))
      .expect(200);
    expect(res.body.total).toBe(30);
  });

  it('deletes a menu, then its dessert, then the recipes, in order', async () => {
    await t.http.delete(`/api/menus/${ids.menu}`).set(bearer(chef)).expect(204);
    const others = await t.http.get('/api/menus/admin?pageSize=100').set(bearer(chef)).expect(200);
    for (const m of others.body.items as Array<{ id: string; dessertIds: string[] }>) {
      if (m.dessertIds.includes(ids.dessert)) {
        await t.http.delete(`/api/menus/${m.id}`).set(bearer(chef)).expect(204);
      }
    }
    await t.http.delete(`/api/desserts/${ids.dessert}`).set(bearer(chef)).expect(204);
    await t.http.delete(`/api/recipes/${ids.crumble}`).set(bearer(chef)).expect(204);
    const lines = await t.dataSource
      .createQueryBuilder()
      .select('*')
      .from('recipe_lines', 'l')
      .where('l.recipe_id = :id', { id: ids.crumble })
      .getRawMany();
    expect(lines).toEqual([]);
  });
});
