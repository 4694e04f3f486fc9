import type { KitchenIndex } from '../kitchen/catalogue.js';
import type { Dessert, Ingredient } from '../kitchen/types.js';
import { expandRecipe, type ExpandedRecipe } from '../scaling/scaling.js';
import {
  FOOD_RULES,
  euGroupOf,
  exemptionFor,
  foodRule,
  type AllergenicFood,
} from './allergen-rules.js';
import {
  expandDessertComponents,
  rollUpRecipe,
  rollUpTrees,
  type AllergenReport,
} from './rollup.js';

/**
 * Ingredient-list text (Regulation (EU) 1169/2011 Art. 18 and 21; UK SI 2019/1218 for food
 * prepacked for direct sale): ingredients in descending order of weight, compound ingredients
 * (our sub-recipes) with their own ingredients in brackets, allergens emphasised. The output is
 * structured segments so no HTML is ever produced; `plainText` shows emphasis in UPPER CASE.
 */

export interface LabelSegment {
  text: string;
  emphasis: boolean;
}

export interface IngredientLabel {
  segments: LabelSegment[];
  plainText: string;
  /** The EU "may contain" foods, by their label words. */
  mayContain: string[];
}

function escapeRegExp(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

function push(out: LabelSegment[], text: string, emphasis: boolean): void {
  if (text === '') return;
  const last = out[out.length - 1];
  if (last && last.emphasis === emphasis) last.text += text;
  else out.push({ text, emphasis });
}

/**
 * Segments for `name` with each of `foods` emphasised: where the name already says the food
 * ("whole milk", "soya lecithin") that word is emphasised; otherwise the food's label word is
 * added in brackets ("butter (milk)").
 */
export function emphasiseFoods(name: string, foods: readonly AllergenicFood[]): LabelSegment[] {
  const ranges: Array<[number, number]> = [];
  const missing: AllergenicFood[] = [];
  for (const food of foods) {
    let found = false;
    for (const stem of FOOD_RULES[food].stems) {
      const re = new RegExp(`(?<![\\p{L}\\p{N}])${escapeRegExp(stem)}[\\p{L}]*`, 'giu');
      for (const m of name.matchAll(re)) {
        ranges.push([m.index, m.index + m[0].length]);
        found = true;
      }
    }
    if (!found) missing.push(food);
  }
  ranges.sort((a, b) => a[0] - b[0]);
  const out: LabelSegment[] = [];
  let at = 0;
  for (const [start, end] of ranges) {
    if (end <= at) continue;
    push(out, name.slice(at, Math.max(at, start)), false);
    push(out, name.slice(Math.max(at, start), end), true);
    at = end;
  }
  push(out, name.slice(at), false);
  if (missing.length > 0) {
    push(out, ' (', false);
    missing.forEach((food, i) => {
      if (i > 0) push(out, ', ', false);
      push(out, foodRule(food).label, true);
    });
    push(out, ')', false);
  }
  return out;
}

/** Foods of an ingredient the EU label must emphasise (listed, not exempt; sulphites only if declared). */
function emphasisedFoods(ingredient: Ingredient, sulphitesDeclared: boolean): AllergenicFood[] {
  const foods: AllergenicFood[] = [];
  for (const s of ingredient.allergens.contains) {
    if (!euGroupOf(s.food)) continue;
    if (exemptionFor('eu', s.food, s.form)) continue;
    if (s.food === 'sulphites' && !sulphitesDeclared) continue;
    if (!foods.includes(s.food)) foods.push(s.food);
  }
  return foods;
}

type Entry =
  | { kind: 'ingredient'; key: string; grams: number; ingredient: Ingredient }
  | { kind: 'compound'; key: string; grams: number; name: string; node: ExpandedRecipe };

/** Lines of one recipe level, merged by item and sorted heaviest first. */
function entriesOf(node: ExpandedRecipe): Entry[] {
  const map = new Map<string, Entry>();
  for (const line of node.lines) {
    if (line.kind === 'ingredient') {
      const key = `i:${line.ingredient.id}`;
      const prev = map.get(key);
      if (prev) prev.grams += line.grams;
      else
        map.set(key, { kind: 'ingredient', key, grams: line.grams, ingredient: line.ingredient });
    } else {
      // Two lines of the same sub-recipe are one compound ingredient; their trees are identical in shape.
      const key = `r:${line.node.recipe.id}`;
      const prev = map.get(key);
      if (prev && prev.kind === 'compound') prev.grams += line.node.grams;
      else
        map.set(key, {
          kind: 'compound',
          key,
          grams: line.node.grams,
          name: line.node.recipe.name,
          node: line.node,
        });
    }
  }
  return [...map.values()].sort((a, b) => b.grams - a.grams);
}

function writeEntries(
  out: LabelSegment[],
  entries: readonly Entry[],
  sulphitesDeclared: boolean,
): void {
  entries.forEach((entry, i) => {
    if (i > 0) push(out, ', ', false);
    if (entry.kind === 'ingredient') {
      const name = entry.ingredient.labelName ?? entry.ingredient.name;
      for (const seg of emphasiseFoods(
        name,
        emphasisedFoods(entry.ingredient, sulphitesDeclared),
      )) {
        push(out, seg.text, seg.emphasis);
      }
    } else {
      push(out, `${entry.name} (`, false);
      writeEntries(out, entriesOf(entry.node), sulphitesDeclared);
      push(out, ')', false);
    }
  });
}

/** UPPER CASE for emphasised text: a rendering for plain-text channels (e-mail, thermal printers). */
export function renderLabelPlainText(segments: readonly LabelSegment[]): string {
  return segments.map((s) => (s.emphasis ? s.text.toLocaleUpperCase('en') : s.text)).join('');
}

function buildLabel(entries: readonly Entry[], report: AllergenReport): IngredientLabel {
  const sulphitesDeclared = report.sulphites?.declaredInEu ?? false;
  const segments: LabelSegment[] = [];
  push(segments, 'Ingredients: ', false);
  writeEntries(segments, entries, sulphitesDeclared);
  push(segments, '.', false);
  const mayContain = report.eu.mayContain.flatMap((d) => d.foods.map((f) => foodRule(f).label));
  if (mayContain.length > 0) push(segments, ` May contain ${mayContain.join(', ')}.`, false);
  return { segments, plainText: renderLabelPlainText(segments), mayContain };
}

/** The ingredient list of a recipe (a component label). */
export function recipeIngredientLabel(index: KitchenIndex, recipeId: string): IngredientLabel {
  const recipe = index.recipe(recipeId);
  const tree = expandRecipe(index, recipeId, recipe.yieldG);
  return buildLabel(entriesOf(tree), rollUpRecipe(index, recipeId));
}

/** The ingredient list of a plated dessert: its components as compound ingredients, by plate weight. */
export function dessertIngredientLabel(
  index: KitchenIndex,
  dessertOrId: string | Dessert,
): IngredientLabel {
  const dessert = typeof dessertOrId === 'string' ? index.dessert(dessertOrId) : dessertOrId;
  const trees = expandDessertComponents(index, dessert);
  const entries: Entry[] = trees
    .map((t): Entry => ({
      kind: 'compound',
      key: t.recipe.id,
      grams: t.grams,
      name: t.recipe.name,
      node: t,
    }))
    .sort((a, b) => b.grams - a.grams);
  const report = rollUpTrees(
    trees,
    { kind: 'dessert', id: dessert.id, name: dessert.name },
    trees.reduce((s, t) => s + t.grams, 0),
  );
  return buildLabel(entries, report);
}

const US_NAMES: Partial<Record<AllergenicFood, string>> = {
  wheat: 'wheat',
  spelt: 'wheat',
  khorasan: 'wheat',
  crustacean: 'crustacean shellfish',
  egg: 'egg',
  fish: 'fish',
  peanut: 'peanuts',
  soybean: 'soy',
  milk: 'milk',
  almond: 'almond',
  hazelnut: 'hazelnut',
  walnut: 'walnut',
  cashew: 'cashew',
  pecan: 'pecan',
  brazil_nut: 'Brazil nut',
  pistachio: 'pistachio',
  macadamia: 'macadamia',
  black_walnut: 'black walnut',
  california_walnut: 'California walnut',
  heartnut: 'heartnut',
  pine_nut: 'pine nut',
  sesame: 'sesame',
};

/**
 * The US "Contains" statement (FD&C Act §403(w)(1)(A)): each major allergen by its common name,
 * tree nuts by their kind. Fish and crustacean species are not modelled and are named generically.
 */
export function usContainsStatement(report: AllergenReport): string | null {
  const names: string[] = [];
  for (const d of report.us.contains) {
    for (const f of d.foods) {
      const n = US_NAMES[f] ?? foodRule(f).label;
      if (!names.includes(n)) names.push(n);
    }
  }
  return names.length > 0 ? `Contains: ${names.join(', ')}.` : null;
}
