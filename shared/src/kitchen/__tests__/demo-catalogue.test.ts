import { describe, expect, it } from 'vitest';
import { rollUpDessert, rollUpRecipe } from '../../allergens/rollup.js';
import { recipeIngredientLabel } from '../../allergens/label.js';
import { costDessertPlate, costMenu, costRecipe } from '../../costing/costing.js';
import { computeMixBalance } from '../../mix-balance/mix-balance.js';
import { scaleDessert } from '../../scaling/scaling.js';
import { createKitchenIndex, findRecipeCycle } from '../catalogue.js';
import { DEMO_CATALOGUE } from '../demo-catalogue.js';
import { dessertSchema, ingredientSchema, menuSchema, recipeSchema } from '../types.js';
import { findCatalogueProblems } from '../validate-catalogue.js';

const index = createKitchenIndex(DEMO_CATALOGUE);

describe('the demo catalogue is consistent', () => {
  it('has about 20 ingredients, 8 recipes, 3 desserts and 2 menus', () => {
    expect(DEMO_CATALOGUE.ingredients.length).toBeGreaterThanOrEqual(20);
    expect(DEMO_CATALOGUE.recipes.length).toBeGreaterThanOrEqual(8);
    expect(DEMO_CATALOGUE.desserts).toHaveLength(3);
    expect(DEMO_CATALOGUE.menus).toHaveLength(2);
  });

  it('every item passes the schema the API stores it with, unchanged', () => {
    for (const i of DEMO_CATALOGUE.ingredients) expect(ingredientSchema.parse(i)).toEqual(i);
    for (const r of DEMO_CATALOGUE.recipes) expect(recipeSchema.parse(r)).toEqual(r);
    for (const d of DEMO_CATALOGUE.desserts) expect(dessertSchema.parse(d)).toEqual(d);
    for (const m of DEMO_CATALOGUE.menus) expect(menuSchema.parse(m)).toEqual(m);
  });

  it('all references resolve, every quantity converts, every pack prices, and there are no cycles', () => {
    expect(findCatalogueProblems(DEMO_CATALOGUE)).toEqual([]);
    expect(findRecipeCycle(DEMO_CATALOGUE.recipes)).toBeNull();
  });

  it('uses sub-recipes, at least two levels deep in places', () => {
    const withSubs = DEMO_CATALOGUE.recipes.filter((r) => r.lines.some((l) => l.kind === 'recipe'));
    expect(withSubs.map((r) => r.id).sort()).toEqual([
      'rec-almond-crumble',
      'rec-pistachio-parfait',
    ]);
  });

  it('every recipe costs, rolls up and has a label; every dessert and menu costs', () => {
    for (const r of DEMO_CATALOGUE.recipes) {
      const cost = costRecipe(index, r.id);
      expect(cost.batchCostMinor, r.name).toBeGreaterThan(0);
      expect(Number.isInteger(cost.costPerKgMinor)).toBe(true);
      expect(rollUpRecipe(index, r.id).subject.name).toBe(r.name);
      expect(recipeIngredientLabel(index, r.id).plainText).toMatch(/^Ingredients: /);
    }
    for (const d of DEMO_CATALOGUE.desserts) {
      expect(costDessertPlate(index, d.id).plateCostMinor).toBeGreaterThan(0);
      expect(scaleDessert(index, d.id, 40).totals.length).toBeGreaterThan(0);
    }
    for (const m of DEMO_CATALOGUE.menus) {
      const c = costMenu(index, m.id);
      expect(c.foodCostPercent).toBeGreaterThan(0);
      expect(c.foodCostPercent).toBeLessThan(35); // the usual ceiling (common practice, no source)
    }
  });

  it('every recipe has steps, a shelf life and a storage; batch equipment where there is a batch limit', () => {
    for (const r of DEMO_CATALOGUE.recipes) {
      expect(r.steps.length, r.name).toBeGreaterThan(0);
      expect(r.shelfLifeHours).toBeGreaterThan(0);
      if (r.equipment) expect(r.equipment.batchCapacityG).toBeGreaterThan(0);
    }
  });

  it('the vanilla custard base is a frozen custard in Goff’s fat, MSNF and solids bands; the frozen parfait is not an ice cream', () => {
    const base = computeMixBalance(index, 'rec-vanilla-base');
    expect(base.classification.class).toBe('frozen_custard');
    for (const m of ['milkFat', 'msnf', 'totalSolids'] as const) {
      expect(base.bands.find((b) => b.measure === m)?.status, m).toBe('within');
    }
    expect(computeMixBalance(index, 'rec-pistachio-parfait').classification.class).toBe('neither');
  });

  it('Pistachio Frost: tree nuts from the parfait and the crumble; pork gelatin; wheat from the crumble', () => {
    const r = rollUpDessert(index, 'des-pistachio-frost');
    expect(r.eu.contains.find((d) => d.group === 'nuts')?.foods).toEqual(['almond', 'pistachio']);
    expect(r.dietary).toMatchObject({ vegetarian: false, gelatin: ['pork'] });
    expect(r.us.contains.map((d) => d.group)).toEqual([
      'milk',
      'egg',
      'tree_nuts',
      'wheat',
      'soybeans',
    ]);
    expect(r.advisories.map((a) => a.foods)).toEqual([['fennel']]);
  });

  it('menu lead days cover the longest recipe chain of waits (custard base: overnight rest)', () => {
    const minutes = (id: string): number => {
      const r = index.recipe(id);
      const own = r.steps.reduce((s, st) => s + st.activeMinutes + st.waitMinutes, 0);
      const subs = r.lines.filter((l) => l.kind === 'recipe').map((l) => minutes(l.recipeId));
      return own + Math.max(0, ...subs);
    };
    for (const m of DEMO_CATALOGUE.menus) {
      const longest = Math.max(
        ...m.dessertIds.flatMap((d) => index.dessert(d).components.map((c) => minutes(c.recipeId))),
      );
      expect(m.leadDays * 24 * 60).toBeGreaterThan(longest);
    }
  });
});
