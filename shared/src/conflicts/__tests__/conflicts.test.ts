import { describe, expect, it } from 'vitest';
import { createKitchenIndex } from '../../kitchen/catalogue.js';
import { DEMO_CATALOGUE } from '../../kitchen/demo-catalogue.js';
import { InvalidSubstitutionError, UnknownReferenceError } from '../../kitchen/errors.js';
import { dessert, ingredient, line, recipe } from '../../kitchen/__tests__/fixtures.js';
import {
  applySubstitutions,
  checkGuestAgainstDessert,
  checkGuestsAgainstDesserts,
  guestAllergenCovers,
  guestRequirementSchema,
  type GuestRequirement,
} from '../conflicts.js';

const guest = (over: Partial<GuestRequirement>): GuestRequirement =>
  guestRequirementSchema.parse({ label: 'Guest', ...over });

// A nut-free crumble to substitute, added to the demo catalogue for these tests.
const oatCrumble = recipe(
  'rec-nut-free-crumble',
  [line('ing-butter', 100), line('ing-demerara', 100)],
  {
    name: 'Nut-free butter crumble',
    yieldG: 180,
    storage: 'dry',
  },
);
const index = createKitchenIndex({
  ...DEMO_CATALOGUE,
  recipes: [...DEMO_CATALOGUE.recipes, oatCrumble],
});

describe('a guest requirement against a dessert', () => {
  it('tree nuts: names the components and the ingredient lines that carry them', () => {
    const report = checkGuestAgainstDessert(
      index,
      'des-pistachio-frost',
      guest({ label: 'Ana', table: '4', allergens: ['tree_nuts'] }),
    );
    expect(report.clear).toBe(false);
    expect(report.guest).toEqual({ label: 'Ana', table: '4' });
    const nuts = report.conflicts[0]!;
    expect(nuts.kind).toBe('allergen');
    if (nuts.kind !== 'allergen') return;
    expect(nuts.foods).toEqual(['almond', 'pistachio']);
    expect(nuts.components.map((c) => c.recipeName)).toEqual([
      'Frozen pistachio parfait',
      'Brown-butter almond crumble',
    ]);
    const crumble = nuts.components.find((c) => c.recipeId === 'rec-almond-crumble')!;
    expect(crumble.lines).toEqual([
      {
        ingredientId: 'ing-almond-flour',
        ingredientName: 'Almond flour, blanched',
        path: ['Brown-butter almond crumble'],
        foods: ['almond'],
      },
    ]);
    expect(nuts.message).toBe(
      'Tree nuts (almonds, pistachios): in Frozen pistachio parfait (Pistachio paste, pure); Brown-butter almond crumble (Almond flour, blanched).',
    );
  });

  it('reports “may contain” separately, as an advisory', () => {
    const report = checkGuestAgainstDessert(
      index,
      'des-pistachio-frost',
      guest({ allergens: ['nuts'] }),
    );
    const traces = report.advisories.filter((a) => a.kind === 'may_contain');
    expect(traces).toHaveLength(1);
    expect(traces[0]!.foods).toEqual(['hazelnut']); // almonds are contained, so only hazelnut is a trace
    expect(traces[0]!.components.map((c) => c.recipeName)).toContain('White chocolate shards');
  });

  it('re-checks the plate with components left out and replaced', () => {
    const subs = [
      { componentRecipeId: 'rec-almond-crumble', replacementRecipeId: 'rec-nut-free-crumble' },
      { componentRecipeId: 'rec-pistachio-parfait' },
    ];
    const report = checkGuestAgainstDessert(
      index,
      'des-pistachio-frost',
      guest({ allergens: ['tree_nuts'] }),
      subs,
    );
    expect(report.conflicts).toEqual([]);
    expect(report.clear).toBe(true);
    expect(report.substitutions).toEqual(subs);
    // The white chocolate still may contain almonds and hazelnuts: the advisory stays.
    expect(report.advisories.map((a) => [a.kind, a.foods])).toEqual([
      ['may_contain', ['almond', 'hazelnut']],
    ]);
  });

  it('keeps the replaced component’s weight on the plate', () => {
    const d = applySubstitutions(index, index.dessert('des-pistachio-frost'), [
      { componentRecipeId: 'rec-pistachio-parfait', replacementRecipeId: 'rec-vanilla-base' },
    ]);
    expect(d.components[0]).toMatchObject({
      recipeId: 'rec-vanilla-base',
      quantity: 70,
      unit: 'g',
    });
  });

  it('refuses a substitution for a component the dessert does not have, or a recipe that does not exist', () => {
    const g = guest({ allergens: ['milk'] });
    expect(() =>
      checkGuestAgainstDessert(index, 'des-pistachio-frost', g, [
        { componentRecipeId: 'rec-rum-syrup' },
      ]),
    ).toThrowError(InvalidSubstitutionError);
    expect(() =>
      checkGuestAgainstDessert(index, 'des-pistachio-frost', g, [
        { componentRecipeId: 'rec-almond-crumble', replacementRecipeId: 'rec-nope' },
      ]),
    ).toThrowError(UnknownReferenceError);
  });

  it('diets: vegetarian and no pork meet the pork gelatin in the parfait', () => {
    const report = checkGuestAgainstDessert(
      index,
      'des-pistachio-frost',
      guest({ diets: ['vegetarian', 'no_pork', 'no_gelatin'] }),
    );
    expect(report.conflicts.map((c) => (c.kind === 'diet' ? c.diet : c.allergen))).toEqual([
      'vegetarian',
      'no_pork',
      'no_gelatin',
    ]);
    for (const c of report.conflicts) {
      expect(c.components.map((x) => x.recipeName)).toEqual(['Frozen pistachio parfait']);
      expect(c.components[0]!.lines.map((l) => l.ingredientName)).toEqual([
        'Gelatin leaves (pork)',
      ]);
    }
  });

  it('vegan: everything with milk, egg or gelatin', () => {
    const report = checkGuestAgainstDessert(
      index,
      'des-vanilla-crumble-bowl',
      guest({ diets: ['vegan'] }),
    );
    const vegan = report.conflicts[0]!;
    expect(vegan.components.map((c) => c.recipeName)).toEqual([
      'Vanilla custard ice cream',
      'Brown-butter almond crumble',
      'Piped crème fraîche cream',
    ]);
    expect(vegan.components[1]!.lines[0]!.path).toEqual([
      'Brown-butter almond crumble',
      'Brown butter',
    ]);
  });

  it('no alcohol: the rum syrup', () => {
    const report = checkGuestAgainstDessert(
      index,
      'des-hazelnut-rum-cloud',
      guest({ diets: ['no_alcohol'] }),
    );
    expect(report.conflicts[0]?.message).toBe(
      'No alcohol: Rum soaking syrup (Aged rum 40 % vol) — contains alcohol.',
    );
  });

  it('gelatin of unknown origin conflicts with no pork and no beef (the safe side)', () => {
    const gel = ingredient('gel', {
      name: 'Gelatin',
      unitWeightG: 2,
      dietary: { animalOrigins: [], gelatin: 'unknown', alcohol: false },
    });
    const idx = createKitchenIndex({
      ingredients: [gel],
      recipes: [recipe('jelly', [line('gel', 10)], { name: 'Jelly' })],
      desserts: [dessert('d', [{ recipeId: 'jelly', quantity: 50, unit: 'g' }])],
    });
    const report = checkGuestAgainstDessert(idx, 'd', guest({ diets: ['no_pork', 'no_beef'] }));
    expect(report.conflicts).toHaveLength(2);
  });

  it('gluten: wheat flour conflicts; wheat glucose syrup is an advisory citing Annex II 1(a)', () => {
    const flour = ingredient('flour', {
      name: 'Wheat flour',
      allergens: { contains: [{ food: 'wheat' }], mayContain: [] },
    });
    const glucose = ingredient('glu', {
      name: 'Glucose syrup',
      allergens: { contains: [{ food: 'wheat', form: 'glucose_syrup' }], mayContain: [] },
    });
    const idx = createKitchenIndex({
      ingredients: [flour, glucose],
      recipes: [
        recipe('sponge', [line('flour', 100)], { name: 'Sponge' }),
        recipe('glaze', [line('glu', 100)], { name: 'Glaze' }),
      ],
      desserts: [
        dessert('d', [
          { recipeId: 'sponge', quantity: 40, unit: 'g' },
          { recipeId: 'glaze', quantity: 10, unit: 'g' },
        ]),
      ],
    });
    const report = checkGuestAgainstDessert(idx, 'd', guest({ allergens: ['gluten'] }));
    expect(report.conflicts.map((c) => c.components.map((x) => x.recipeName))).toEqual([
      ['Sponge'],
    ]);
    expect(report.advisories[0]).toMatchObject({
      kind: 'exempt_derivative',
      citation: 'Regulation (EU) 1169/2011 Annex II 1(a)',
    });
    // Leaving the sponge out clears the conflict; the advisory remains for the chef to discuss.
    const after = checkGuestAgainstDessert(idx, 'd', guest({ allergens: ['gluten'] }), [
      { componentRecipeId: 'sponge' },
    ]);
    expect(after.clear).toBe(true);
    expect(after.advisories).toHaveLength(1);
  });

  it('celery: fennel in the crumble is a cross-reactivity advisory, never a conflict', () => {
    const report = checkGuestAgainstDessert(
      index,
      'des-vanilla-crumble-bowl',
      guest({ allergens: ['celery'] }),
    );
    expect(report.conflicts).toEqual([]);
    expect(report.advisories.map((a) => a.kind).sort()).toEqual([
      'cross_reactivity',
      'may_contain',
    ]);
  });

  it('a guest may name a food outside both lists (coconut) or a US-only tree nut (pine nut)', () => {
    expect(guestAllergenCovers('coconut', 'coconut')).toBe(true);
    expect(guestAllergenCovers('nuts', 'coconut')).toBe(false);
    expect(guestAllergenCovers('nuts', 'pine_nut')).toBe(true); // the broader reading, for safety
    expect(guestAllergenCovers('tree_nuts', 'almond')).toBe(true);
    expect(guestAllergenCovers('gluten', 'oats')).toBe(true);
    expect(guestAllergenCovers('wheat', 'oats')).toBe(false);
    expect(guestAllergenCovers('peanuts', 'almond')).toBe(false);
  });

  it('a guest with no requirements is clear for every dessert', () => {
    const reports = checkGuestsAgainstDesserts(
      index,
      ['des-pistachio-frost', 'des-hazelnut-rum-cloud'],
      [guest({})],
    );
    expect(reports.every((r) => r.clear && r.advisories.length === 0)).toBe(true);
  });
});

describe('guest requirement validation', () => {
  it('accepts groups, specific foods and diets', () => {
    const parsed = guestRequirementSchema.parse({
      label: ' Table 3, seat 2 ',
      allergens: ['nuts', 'pine_nut', 'sesame'],
      diets: ['vegan'],
    });
    expect(parsed.label).toBe('Table 3, seat 2');
  });

  it('refuses unknown allergens and a missing label with readable messages', () => {
    expect(
      guestRequirementSchema.safeParse({ label: 'A', allergens: ['peanut butter'] }).success,
    ).toBe(false);
    const noLabel = guestRequirementSchema.safeParse({ label: '  ' });
    expect(noLabel.error?.issues[0]?.message).toMatch(/Give the guest a name or a label/);
  });
});
