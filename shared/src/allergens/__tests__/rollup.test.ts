import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createKitchenIndex } from '../../kitchen/catalogue.js';
import type { AllergenSource, Ingredient, Recipe } from '../../kitchen/types.js';
import { dessert, ingredient, line, recipe, subRecipe } from '../../kitchen/__tests__/fixtures.js';
import {
  ALLERGENIC_FOODS,
  EU_ALLERGEN_GROUPS,
  US_MAJOR_ALLERGENS,
  euGroupOf,
  usAllergenOf,
  type AllergenicFood,
} from '../allergen-rules.js';
import {
  containedFoods,
  euContains,
  rollUpDessert,
  rollUpRecipe,
  traceFoods,
  usContains,
  type AllergenReport,
} from '../rollup.js';

/** Roll up a one-ingredient recipe. */
function single(ing: Ingredient): AllergenReport {
  const index = createKitchenIndex({
    ingredients: [ing],
    recipes: [recipe('r', [line(ing.id, 100)], { yieldG: 100 })],
  });
  return rollUpRecipe(index, 'r');
}

function withSource(id: string, name: string, ...contains: AllergenSource[]): Ingredient {
  return ingredient(id, { name, allergens: { contains, mayContain: [] } });
}

describe('the lists themselves', () => {
  it('EU: 14 groups (Regulation (EU) 1169/2011 Annex II)', () => {
    expect(EU_ALLERGEN_GROUPS).toHaveLength(14);
  });

  it('EU: exactly eight nuts (Annex II 8)', () => {
    const nuts = ALLERGENIC_FOODS.filter((f) => euGroupOf(f) === 'nuts');
    expect(nuts.sort()).toEqual(
      [
        'almond',
        'brazil_nut',
        'cashew',
        'hazelnut',
        'macadamia',
        'pecan',
        'pistachio',
        'walnut',
      ].sort(),
    );
  });

  it('US: 9 major food allergens (FD&C Act §201(qq), FASTER Act 2021 adds sesame)', () => {
    expect(US_MAJOR_ALLERGENS).toHaveLength(9);
    expect(US_MAJOR_ALLERGENS).toContain('sesame');
  });

  it('US: 12 tree nuts (FDA allergen guidance, Edition 5, January 2025)', () => {
    const treeNuts = ALLERGENIC_FOODS.filter((f) => usAllergenOf(f) === 'tree_nuts');
    expect(treeNuts.sort()).toEqual(
      [
        'almond',
        'black_walnut',
        'brazil_nut',
        'california_walnut',
        'cashew',
        'hazelnut',
        'heartnut',
        'macadamia',
        'pecan',
        'pine_nut',
        'pistachio',
        'walnut',
      ].sort(),
    );
  });
});

describe('facts from REFERENCES.md, each with its source', () => {
  it('soy lecithin is soybeans in both (Annex II 6 exempts refined oil, tocopherols, sterols — not lecithin; §201(qq))', () => {
    const r = single(withSource('lec', 'Soy lecithin', { food: 'soybean' }));
    expect(euContains(r)).toEqual(['soybeans']);
    expect(usContains(r)).toEqual(['soybeans']);
  });

  it('wheat glucose syrup: exempt in the EU (Annex II 1(a)); declared as wheat in the US (no statutory exemption, §201(qq)(2)(A) covers only highly refined oils)', () => {
    const r = single(withSource('gs', 'Glucose syrup', { food: 'wheat', form: 'glucose_syrup' }));
    expect(euContains(r)).toEqual([]);
    expect(r.eu.exempt[0]?.citation).toBe('Regulation (EU) 1169/2011 Annex II 1(a)');
    expect(usContains(r)).toEqual(['wheat']);
  });

  it('wheat dextrose (Annex II 1(a)) and wheat maltodextrin (1(b)) are exempt in the EU', () => {
    expect(
      euContains(single(withSource('d', 'Dextrose', { food: 'wheat', form: 'dextrose' }))),
    ).toEqual([]);
    const md = single(withSource('m', 'Maltodextrin', { food: 'wheat', form: 'maltodextrin' }));
    expect(euContains(md)).toEqual([]);
    expect(md.eu.exempt[0]?.citation).toMatch(/1\(b\)$/);
  });

  it('barley glucose syrup is exempt (Annex II 1(c)) but barley maltodextrin is not', () => {
    expect(
      euContains(
        single(withSource('b', 'Barley glucose', { food: 'barley', form: 'glucose_syrup' })),
      ),
    ).toEqual([]);
    const md = single(
      withSource('bm', 'Barley maltodextrin', { food: 'barley', form: 'maltodextrin' }),
    );
    expect(euContains(md)).toEqual(['gluten']);
    expect(md.eu.contains[0]?.foods).toEqual(['barley']);
  });

  it('fully refined soybean oil is declared in neither (Annex II 6(a); §201(qq)(2)(A))', () => {
    const r = single(
      withSource('oil', 'Soybean oil', { food: 'soybean', form: 'fully_refined_oil' }),
    );
    expect(euContains(r)).toEqual([]);
    expect(usContains(r)).toEqual([]);
    expect(r.us.exempt[0]?.citation).toBe('FD&C Act §201(qq)(2)(A)');
  });

  it('fish gelatine in a dessert is fish; only as a wine or beer fining agent is it exempt in the EU (Annex II 4(b))', () => {
    const inDessert = single(
      ingredient('fg', {
        name: 'Fish gelatine',
        allergens: { contains: [{ food: 'fish' }], mayContain: [] },
        dietary: { animalOrigins: [], gelatin: 'fish', alcohol: false },
      }),
    );
    expect(euContains(inDessert)).toEqual(['fish']);
    expect(usContains(inDessert)).toEqual(['fish']);
    expect(inDessert.dietary.vegetarian).toBe(false);
    expect(inDessert.dietary.gelatin).toEqual(['fish']);

    const fining = single(
      withSource('w', 'Wine fined with isinglass', { food: 'fish', form: 'fining_agent' }),
    );
    expect(euContains(fining)).toEqual([]);
    expect(usContains(fining)).toEqual(['fish']);
  });

  it('pine nut is a US tree nut (FDA Edition 5) but not an EU nut (Annex II 8)', () => {
    const r = single(withSource('pn', 'Pine nuts', { food: 'pine_nut' }));
    expect(usContains(r)).toEqual(['tree_nuts']);
    expect(r.us.contains[0]?.foods).toEqual(['pine_nut']);
    expect(euContains(r)).toEqual([]);
  });

  it('coconut is neither (removed from the US list by Edition 5; never in Annex II)', () => {
    const r = single(withSource('co', 'Coconut', { food: 'coconut' }));
    expect(euContains(r)).toEqual([]);
    expect(usContains(r)).toEqual([]);
    expect(containedFoods(r)).toEqual(['coconut']); // still known, for a guest who names it
  });

  it('oats are EU gluten (Annex II 1) but not a US major allergen', () => {
    const r = single(withSource('oat', 'Rolled oats', { food: 'oats' }));
    expect(euContains(r)).toEqual(['gluten']);
    expect(r.eu.contains[0]?.foods).toEqual(['oats']);
    expect(usContains(r)).toEqual([]);
  });

  it('spelt is EU gluten named as spelt, and US wheat (Triticum; from memory of FDA Edition 5)', () => {
    const r = single(withSource('sp', 'Spelt flour', { food: 'spelt' }));
    expect(r.eu.contains[0]?.foods).toEqual(['spelt']);
    expect(usContains(r)).toEqual(['wheat']);
  });

  it('the label names the cereal and the nut: wheat and oats; almonds and hazelnuts', () => {
    const index = createKitchenIndex({
      ingredients: [
        withSource('w', 'Flour', { food: 'wheat' }),
        withSource('o', 'Oats', { food: 'oats' }),
        withSource('a', 'Almonds', { food: 'almond' }),
        withSource('h', 'Hazelnuts', { food: 'hazelnut' }),
      ],
      recipes: [recipe('r', [line('w', 10), line('o', 10), line('a', 10), line('h', 10)])],
    });
    const r = rollUpRecipe(index, 'r');
    expect(r.eu.contains.find((d) => d.group === 'gluten')?.foods).toEqual(['wheat', 'oats']);
    expect(r.eu.contains.find((d) => d.group === 'nuts')?.foods).toEqual(['almond', 'hazelnut']);
  });

  it('fennel is a celery-family advisory, never “contains celery” (REFERENCES.md: Apiaceae cross-reactivity)', () => {
    const r = single(withSource('f', 'Fennel seed', { food: 'fennel' }));
    expect(euContains(r)).toEqual([]);
    expect(r.advisories).toHaveLength(1);
    expect(r.advisories[0]?.kind).toBe('celery_cross_reactivity');
    expect(r.advisories[0]?.text).toMatch(/not a celery declaration/);
  });
});

describe('sulphites: declared above 10 mg/kg total SO₂ as consumed (Annex II 12)', () => {
  const apricot = ingredient('apr', {
    name: 'Dried apricots',
    allergens: { contains: [{ food: 'sulphites', so2MgPerKg: 200 }], mayContain: [] },
  });
  const flour = ingredient('flour', { name: 'Flour' });
  const make = (apricotG: number, total: number) =>
    rollUpRecipe(
      createKitchenIndex({
        ingredients: [apricot, flour],
        recipes: [
          recipe('r', [line('apr', apricotG), line('flour', total - apricotG)], { yieldG: total }),
        ],
      }),
      'r',
    );

  it('10 % apricots at 200 mg/kg = 20 mg/kg: declared', () => {
    const r = make(100, 1000);
    expect(r.sulphites).toEqual({ so2MgPerKg: 20, declaredInEu: true });
    expect(euContains(r)).toEqual(['sulphites']);
  });

  it('exactly 10 mg/kg is not above 10: not declared, recorded as exempt', () => {
    const r = make(50, 1000);
    expect(r.sulphites?.so2MgPerKg).toBe(10);
    expect(euContains(r)).toEqual([]);
    expect(r.eu.exempt[0]?.citation).toBe('Regulation (EU) 1169/2011 Annex II 12');
  });

  it('an unknown SO₂ figure is declared (the safe side)', () => {
    const r = single(withSource('wine', 'Wine', { food: 'sulphites' }));
    expect(r.sulphites).toEqual({ so2MgPerKg: null, declaredInEu: true });
  });
});

describe('“contains” is kept apart from “may contain” through the recipe graph', () => {
  const almonds = ingredient('alm', {
    name: 'Almond flour',
    allergens: { contains: [{ food: 'almond' }], mayContain: ['hazelnut', 'almond', 'peanut'] },
  });
  const chocolate = ingredient('choc', {
    name: 'White chocolate',
    allergens: { contains: [{ food: 'milk' }, { food: 'soybean' }], mayContain: ['almond'] },
  });
  const gelatin = ingredient('gel', {
    name: 'Gelatin (pork)',
    unitWeightG: 1.65,
    dietary: { animalOrigins: [], gelatin: 'pork', alcohol: false },
  });
  const rum = ingredient('rum', { name: 'Rum', composition: { water: 64, fat: 0, alcohol: 33.2 } });
  const crumble = recipe('crumble', [line('alm', 100)], { name: 'Crumble', yieldG: 100 });
  const glaze = recipe('glaze', [line('choc', 100), line('gel', 1, 'leaf'), line('rum', 5)], {
    name: 'Glaze',
    yieldG: 100,
  });
  const cake = recipe('cake', [subRecipe('crumble', 50), subRecipe('glaze', 30)], {
    name: 'Cake',
    yieldG: 80,
  });
  const index = createKitchenIndex({
    ingredients: [almonds, chocolate, gelatin, rum],
    recipes: [crumble, glaze, cake],
    desserts: [dessert('d', [{ recipeId: 'cake', quantity: 80, unit: 'g' }])],
  });

  it('a sub-recipe’s allergen reaches the top, with the path that carries it', () => {
    const r = rollUpRecipe(index, 'cake');
    const nuts = r.eu.contains.find((d) => d.group === 'nuts');
    expect(nuts?.foods).toEqual(['almond']);
    expect(nuts?.carriers[0]?.path).toEqual(['Cake', 'Crumble']);
    expect(nuts?.carriers[0]?.ingredientName).toBe('Almond flour');
    expect(euContains(r)).toEqual(['soybeans', 'milk', 'nuts']);
  });

  it('a trace of something already contained is not repeated under “may contain”', () => {
    const r = rollUpRecipe(index, 'cake');
    expect(r.eu.mayContain.map((d) => [d.group, d.foods])).toEqual([
      ['peanuts', ['peanut']],
      ['nuts', ['hazelnut']],
    ]);
  });

  it('dietary flags roll up: gelatin origin, alcohol, vegetarian, vegan', () => {
    const r = rollUpDessert(index, 'd');
    expect(r.dietary).toMatchObject({
      vegetarian: false,
      vegan: false,
      gelatin: ['pork'],
      alcohol: true,
    });
    expect(r.dietary.animalOrigins).toEqual(['milk', 'pork']);
    const crumbleOnly = rollUpRecipe(index, 'crumble');
    expect(crumbleOnly.dietary).toMatchObject({
      vegetarian: true,
      vegan: true,
      gelatin: [],
      alcohol: false,
    });
  });

  it('milk makes a recipe vegetarian but not vegan, even when the ingredient forgot to say so', () => {
    const r = rollUpRecipe(
      createKitchenIndex({ ingredients: [chocolate], recipes: [recipe('r', [line('choc', 10)])] }),
      'r',
    );
    expect(r.dietary).toMatchObject({ vegetarian: true, vegan: false, animalOrigins: ['milk'] });
  });
});

// ---------------------------------------------------------------- the superset property

const foodArb = fc.constantFrom<AllergenicFood>(
  ...ALLERGENIC_FOODS.filter((f) => f !== 'sulphites'),
);
const ingredientArb = fc.record({
  contains: fc.array(
    fc.record({
      food: foodArb,
      form: fc.constantFrom(undefined, 'glucose_syrup', 'fully_refined_oil'),
    }),
    {
      maxLength: 3,
    },
  ),
  mayContain: fc.array(foodArb, { maxLength: 3 }),
  gelatin: fc.constantFrom(undefined, 'pork', 'beef', 'fish', 'unknown'),
  alcohol: fc.boolean(),
});

describe('roll-up property (fast-check): a recipe’s roll-up contains each part’s', () => {
  it('for contains, may contain, EU and US declarations, advisories and dietary flags', () => {
    fc.assert(
      fc.property(
        fc.array(ingredientArb, { minLength: 1, maxLength: 6 }),
        fc.array(
          fc.array(fc.tuple(fc.nat(), fc.boolean(), fc.double({ min: 1, max: 500, noNaN: true })), {
            minLength: 1,
            maxLength: 4,
          }),
          {
            minLength: 2,
            maxLength: 5,
          },
        ),
        (ings, recipeShapes) => {
          const ingredients: Ingredient[] = ings.map((s, i) =>
            ingredient(`i${i}`, {
              allergens: {
                contains: s.contains.map((c) =>
                  c.form ? { food: c.food, form: c.form } : { food: c.food },
                ),
                mayContain: s.mayContain,
              },
              dietary: {
                animalOrigins: [],
                alcohol: s.alcohol,
                ...(s.gelatin ? { gelatin: s.gelatin } : {}),
              },
            }),
          );
          const recipes: Recipe[] = recipeShapes.map((lines, r) =>
            recipe(
              `r${r}`,
              lines.map(([t, sub, q]) =>
                sub && r > 0 ? subRecipe(`r${t % r}`, q) : line(`i${t % ingredients.length}`, q),
              ),
              { yieldG: 100 },
            ),
          );
          const index = createKitchenIndex({ ingredients, recipes });
          const root = recipes[recipes.length - 1]!;
          const whole = rollUpRecipe(index, root.id);
          for (const l of root.lines) {
            const part =
              l.kind === 'recipe'
                ? rollUpRecipe(index, l.recipeId)
                : rollUpRecipe(
                    createKitchenIndex({
                      ingredients,
                      recipes: [recipe('solo', [line(l.ingredientId, 1)])],
                    }),
                    'solo',
                  );
            const sup = <T>(big: readonly T[], small: readonly T[]) => {
              for (const x of small) expect(big).toContain(x);
            };
            sup(containedFoods(whole), containedFoods(part));
            sup(traceFoods(whole), traceFoods(part));
            sup(euContains(whole), euContains(part));
            sup(usContains(whole), usContains(part));
            sup(
              whole.eu.contains.flatMap((d) => d.foods),
              part.eu.contains.flatMap((d) => d.foods),
            );
            // A trace in the part is either a trace or contained in the whole.
            sup(
              [...whole.eu.mayContain, ...whole.eu.contains].flatMap((d) => d.foods),
              part.eu.mayContain.flatMap((d) => d.foods),
            );
            sup(
              whole.advisories.map((a) => a.kind),
              part.advisories.map((a) => a.kind),
            );
            sup(whole.dietary.gelatin, part.dietary.gelatin);
            sup(whole.dietary.animalOrigins, part.dietary.animalOrigins);
            if (!part.dietary.vegetarian) expect(whole.dietary.vegetarian).toBe(false);
            if (!part.dietary.vegan) expect(whole.dietary.vegan).toBe(false);
            if (part.dietary.alcohol) expect(whole.dietary.alcohol).toBe(true);
          }
        },
      ),
    );
  });

  it('holds for sulphite occurrences, while the declaration follows the concentration (it dilutes)', () => {
    const apricot = ingredient('apr', {
      allergens: { contains: [{ food: 'sulphites', so2MgPerKg: 200 }], mayContain: [] },
    });
    const flour = ingredient('flour');
    const filling = recipe('filling', [line('apr', 100)], { yieldG: 100 }); // 200 mg/kg
    const tart = recipe('tart', [subRecipe('filling', 20), line('flour', 980)], { yieldG: 1000 }); // 4 mg/kg
    const index = createKitchenIndex({ ingredients: [apricot, flour], recipes: [filling, tart] });
    expect(containedFoods(rollUpRecipe(index, 'tart'))).toContain('sulphites');
    expect(euContains(rollUpRecipe(index, 'filling'))).toEqual(['sulphites']);
    expect(euContains(rollUpRecipe(index, 'tart'))).toEqual([]);
  });
});
