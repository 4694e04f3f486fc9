import type { KitchenIndex } from '../kitchen/catalogue.js';
import { tidy } from '../kitchen/rounding.js';
import type { AnimalOrigin, Dessert, GelatinOrigin, Ingredient } from '../kitchen/types.js';
import { ANIMAL_ORIGINS, GELATIN_ORIGINS } from '../kitchen/types.js';
import {
  componentGramsPerPlate,
  expandRecipe,
  forEachIngredientLine,
  type ExpandedRecipe,
} from '../scaling/scaling.js';
import {
  ALLERGENIC_FOODS,
  EU_ALLERGEN_GROUPS,
  EU_GROUP_LABELS,
  EU_SULPHITE_THRESHOLD_MG_PER_KG,
  US_ALLERGEN_LABELS,
  US_MAJOR_ALLERGENS,
  advisoryOf,
  euGroupOf,
  exemptionFor,
  foodRule,
  usAllergenOf,
  type AdvisoryKind,
  type AllergenicFood,
  type DerivedForm,
  type EuAllergenGroup,
  type Jurisdiction,
  type UsMajorAllergen,
} from './allergen-rules.js';

/**
 * Allergen roll-up (DESIGN.md §3): the union through the recipe graph, weighed, with "contains"
 * kept apart from "may contain", then declared per jurisdiction: the EU's 14 groups (with its
 * exemptions and the sulphite threshold) and the US's 9 major allergens.
 */

/** Where an allergen, trace or dietary flag comes from. */
export interface Carrier {
  ingredientId: string;
  ingredientName: string;
  /** Recipe names from the outermost recipe (or the dessert's component) down to the one holding the line. */
  path: string[];
  /** The recipe whose line it is. */
  recipeId: string;
  /** Unrounded grams of the ingredient in what was rolled up. */
  grams: number;
}

export interface AllergenOccurrence extends Carrier {
  food: AllergenicFood;
  relation: 'contains' | 'may_contain';
  form?: DerivedForm;
  so2MgPerKg?: number;
}

export interface DeclaredAllergen<G extends string> {
  group: G;
  label: string;
  /** The specific foods, in list order ("wheat", "oats"; "almonds", "hazelnuts"). */
  foods: AllergenicFood[];
  carriers: Array<Carrier & { food: AllergenicFood }>;
}

export interface ExemptOccurrence {
  food: AllergenicFood;
  form?: DerivedForm;
  citation: string;
  summary: string;
  carrier: Carrier;
}

export interface AllergenDeclaration<G extends string> {
  jurisdiction: Jurisdiction;
  contains: DeclaredAllergen<G>[];
  /** Traces of foods not already contained. */
  mayContain: DeclaredAllergen<G>[];
  /** Present, but not declared in this jurisdiction, with the rule that says so. */
  exempt: ExemptOccurrence[];
}

export interface AdvisoryFinding {
  kind: AdvisoryKind;
  foods: AllergenicFood[];
  carriers: Array<Carrier & { food: AllergenicFood }>;
  text: string;
}

export interface DietaryCarrier extends Carrier {
  animalOrigins: AnimalOrigin[];
  gelatin?: GelatinOrigin;
  alcohol: boolean;
}

export interface DietarySummary {
  vegetarian: boolean;
  vegan: boolean;
  /** Gelatin origins present ("unknown" when an ingredient has gelatin of unstated origin). */
  gelatin: GelatinOrigin[];
  alcohol: boolean;
  animalOrigins: AnimalOrigin[];
  /** Every ingredient that carries an animal origin, gelatin or alcohol. */
  carriers: DietaryCarrier[];
}

export interface SulphiteFinding {
  /** Total SO₂ as consumed, mg/kg; null when a sulphite source gives no figure. */
  so2MgPerKg: number | null;
  declaredInEu: boolean;
}

export interface AllergenReport {
  subject: { kind: 'recipe' | 'dessert'; id: string; name: string };
  /** Grams rolled up (a recipe's yield, or one plate). */
  grams: number;
  occurrences: AllergenOccurrence[];
  eu: AllergenDeclaration<EuAllergenGroup>;
  us: AllergenDeclaration<UsMajorAllergen>;
  advisories: AdvisoryFinding[];
  dietary: DietarySummary;
  sulphites: SulphiteFinding | null;
}

// ---------------------------------------------------------------- dietary facts of one ingredient

const ORIGIN_OF_FOOD: Partial<Record<AllergenicFood, AnimalOrigin>> = {
  milk: 'milk',
  egg: 'egg',
  fish: 'fish',
  crustacean: 'crustacean',
  mollusc: 'mollusc',
};

const VEGETARIAN_ORIGINS: ReadonlySet<AnimalOrigin> = new Set(['milk', 'egg', 'honey']);

/** Animal origins of an ingredient: those stated, those its allergens imply, and its gelatin's. */
export function animalOriginsOf(ingredient: Ingredient): AnimalOrigin[] {
  const origins = new Set<AnimalOrigin>(ingredient.dietary.animalOrigins);
  for (const source of ingredient.allergens.contains) {
    const origin = ORIGIN_OF_FOOD[source.food];
    if (origin) origins.add(origin);
  }
  const gelatin = ingredient.dietary.gelatin;
  if (gelatin === 'pork' || gelatin === 'beef' || gelatin === 'fish') origins.add(gelatin);
  return ANIMAL_ORIGINS.filter((o) => origins.has(o));
}

export function containsAlcohol(ingredient: Ingredient): boolean {
  return ingredient.dietary.alcohol || (ingredient.composition?.alcohol ?? 0) > 0;
}

export function isVegetarianIngredient(ingredient: Ingredient): boolean {
  return (
    ingredient.dietary.gelatin === undefined &&
    animalOriginsOf(ingredient).every((o) => VEGETARIAN_ORIGINS.has(o))
  );
}

export function isVeganIngredient(ingredient: Ingredient): boolean {
  return ingredient.dietary.gelatin === undefined && animalOriginsOf(ingredient).length === 0;
}

// ---------------------------------------------------------------- the roll-up

function carrierOf(holder: ExpandedRecipe, ingredient: Ingredient, grams: number): Carrier {
  return {
    ingredientId: ingredient.id,
    ingredientName: ingredient.name,
    path: holder.path,
    recipeId: holder.recipe.id,
    grams,
  };
}

function foodOrder(a: AllergenicFood, b: AllergenicFood): number {
  return ALLERGENIC_FOODS.indexOf(a) - ALLERGENIC_FOODS.indexOf(b);
}

function declare<G extends string>(
  jurisdiction: Jurisdiction,
  occurrences: readonly AllergenOccurrence[],
  groupOf: (food: AllergenicFood) => G | undefined,
  order: readonly G[],
  labels: Record<G, string>,
  sulphitesDeclared: boolean,
): AllergenDeclaration<G> {
  const contains = new Map<G, DeclaredAllergen<G>>();
  const traces = new Map<G, DeclaredAllergen<G>>();
  const exempt: ExemptOccurrence[] = [];
  const containedFoods = new Set<AllergenicFood>();

  const add = (map: Map<G, DeclaredAllergen<G>>, group: G, occ: AllergenOccurrence) => {
    const entry = map.get(group) ?? { group, label: labels[group], foods: [], carriers: [] };
    if (!entry.foods.includes(occ.food)) entry.foods.push(occ.food);
    entry.carriers.push({ ...carrierFields(occ), food: occ.food });
    map.set(group, entry);
  };

  for (const occ of occurrences) {
    if (occ.relation !== 'contains') continue;
    const group = groupOf(occ.food);
    if (!group) continue;
    const rule = exemptionFor(jurisdiction, occ.food, occ.form);
    if (rule) {
      exempt.push({
        food: occ.food,
        ...(occ.form ? { form: occ.form } : {}),
        citation: rule.citation,
        summary: rule.summary,
        carrier: carrierFields(occ),
      });
      continue;
    }
    if (occ.food === 'sulphites' && jurisdiction === 'eu' && !sulphitesDeclared) {
      exempt.push({
        food: occ.food,
        citation: 'Regulation (EU) 1169/2011 Annex II 12',
        summary: `total SO₂ not above ${EU_SULPHITE_THRESHOLD_MG_PER_KG} mg/kg as consumed`,
        carrier: carrierFields(occ),
      });
      continue;
    }
    containedFoods.add(occ.food);
    add(contains, group, occ);
  }
  for (const occ of occurrences) {
    if (occ.relation !== 'may_contain' || containedFoods.has(occ.food)) continue;
    const group = groupOf(occ.food);
    if (group) add(traces, group, occ);
  }
  const sorted = (map: Map<G, DeclaredAllergen<G>>) =>
    order
      .filter((g) => map.has(g))
      .map((g) => {
        const entry = map.get(g)!;
        return { ...entry, foods: [...entry.foods].sort(foodOrder) };
      });
  return { jurisdiction, contains: sorted(contains), mayContain: sorted(traces), exempt };
}

function carrierFields(c: Carrier): Carrier {
  return {
    ingredientId: c.ingredientId,
    ingredientName: c.ingredientName,
    path: c.path,
    recipeId: c.recipeId,
    grams: c.grams,
  };
}

const ADVISORY_TEXT: Record<AdvisoryKind, (foods: string) => string> = {
  celery_cross_reactivity: (foods) =>
    `Contains ${foods}, from the celery family (Apiaceae): some people allergic to celery also react to these spices. This is advice, not a celery declaration.`,
};

/**
 * Roll up expanded recipe trees (a recipe, or a dessert's components at their plate weights)
 * into one report. `grams` is the weight as consumed, for the sulphite threshold.
 */
export function rollUpTrees(
  trees: readonly ExpandedRecipe[],
  subject: AllergenReport['subject'],
  grams: number,
): AllergenReport {
  const occurrences: AllergenOccurrence[] = [];
  const dietaryCarriers: DietaryCarrier[] = [];
  for (const tree of trees) {
    forEachIngredientLine(tree, (line, holder) => {
      const ing = line.ingredient;
      const carrier = carrierOf(holder, ing, line.grams);
      for (const s of ing.allergens.contains) {
        occurrences.push({
          ...carrier,
          food: s.food,
          relation: 'contains',
          ...(s.form ? { form: s.form } : {}),
          ...(s.so2MgPerKg !== undefined ? { so2MgPerKg: s.so2MgPerKg } : {}),
        });
      }
      for (const food of ing.allergens.mayContain) {
        occurrences.push({ ...carrier, food, relation: 'may_contain' });
      }
      const origins = animalOriginsOf(ing);
      const alcohol = containsAlcohol(ing);
      if (origins.length > 0 || ing.dietary.gelatin || alcohol) {
        dietaryCarriers.push({
          ...carrier,
          animalOrigins: origins,
          ...(ing.dietary.gelatin ? { gelatin: ing.dietary.gelatin } : {}),
          alcohol,
        });
      }
    });
  }

  // Sulphites: total SO₂ as consumed. An unknown figure is declared (the safe side).
  const sulphiteOccs = occurrences.filter(
    (o) => o.relation === 'contains' && o.food === 'sulphites',
  );
  let sulphites: SulphiteFinding | null = null;
  if (sulphiteOccs.length > 0) {
    const unknown = sulphiteOccs.some((o) => o.so2MgPerKg === undefined) || !(grams > 0);
    const mg = sulphiteOccs.reduce((sum, o) => sum + ((o.so2MgPerKg ?? 0) * o.grams) / 1000, 0);
    const perKg = unknown ? null : tidy((mg / grams) * 1000, 3);
    sulphites = {
      so2MgPerKg: perKg,
      declaredInEu: perKg === null || perKg > EU_SULPHITE_THRESHOLD_MG_PER_KG,
    };
  }

  const advisoryMap = new Map<AdvisoryKind, AdvisoryFinding>();
  for (const occ of occurrences) {
    const kind = occ.relation === 'contains' ? advisoryOf(occ.food) : undefined;
    if (!kind) continue;
    const entry = advisoryMap.get(kind) ?? { kind, foods: [], carriers: [], text: '' };
    if (!entry.foods.includes(occ.food)) entry.foods.push(occ.food);
    entry.carriers.push({ ...carrierFields(occ), food: occ.food });
    advisoryMap.set(kind, entry);
  }
  const advisories = [...advisoryMap.values()].map((a) => ({
    ...a,
    text: ADVISORY_TEXT[a.kind](a.foods.map((f) => foodRule(f).label).join(', ')),
  }));

  const origins = new Set(dietaryCarriers.flatMap((c) => c.animalOrigins));
  const gelatin = new Set(dietaryCarriers.flatMap((c) => (c.gelatin ? [c.gelatin] : [])));
  const dietary: DietarySummary = {
    vegetarian: gelatin.size === 0 && [...origins].every((o) => VEGETARIAN_ORIGINS.has(o)),
    vegan: gelatin.size === 0 && origins.size === 0,
    gelatin: GELATIN_ORIGINS.filter((g) => gelatin.has(g)),
    alcohol: dietaryCarriers.some((c) => c.alcohol),
    animalOrigins: ANIMAL_ORIGINS.filter((o) => origins.has(o)),
    carriers: dietaryCarriers,
  };

  const sulphitesDeclared = sulphites?.declaredInEu ?? false;
  return {
    subject,
    grams: tidy(grams),
    occurrences,
    eu: declare(
      'eu',
      occurrences,
      euGroupOf,
      EU_ALLERGEN_GROUPS,
      EU_GROUP_LABELS,
      sulphitesDeclared,
    ),
    us: declare('us', occurrences, usAllergenOf, US_MAJOR_ALLERGENS, US_ALLERGEN_LABELS, true),
    advisories,
    dietary,
    sulphites,
  };
}

/** The roll-up of one batch of a recipe as written (weights at its measured yield). */
export function rollUpRecipe(index: KitchenIndex, recipeId: string): AllergenReport {
  const recipe = index.recipe(recipeId);
  const tree = expandRecipe(index, recipeId, recipe.yieldG);
  return rollUpTrees([tree], { kind: 'recipe', id: recipe.id, name: recipe.name }, recipe.yieldG);
}

/** The dessert's components as they stand, each at its per-plate weight. */
export function expandDessertComponents(index: KitchenIndex, dessert: Dessert): ExpandedRecipe[] {
  return dessert.components.map((c) =>
    expandRecipe(index, c.recipeId, componentGramsPerPlate(index, dessert, c), [], dessert.name),
  );
}

/** The roll-up of one plate of a dessert. */
export function rollUpDessert(index: KitchenIndex, dessertOrId: string | Dessert): AllergenReport {
  const dessert = typeof dessertOrId === 'string' ? index.dessert(dessertOrId) : dessertOrId;
  const trees = expandDessertComponents(index, dessert);
  const grams = trees.reduce((sum, t) => sum + t.grams, 0);
  return rollUpTrees(trees, { kind: 'dessert', id: dessert.id, name: dessert.name }, grams);
}

/** EU groups declared as "contains", in Annex II order. */
export function euContains(report: AllergenReport): EuAllergenGroup[] {
  return report.eu.contains.map((d) => d.group);
}

/** US major allergens declared as "contains", in §201(qq) order. */
export function usContains(report: AllergenReport): UsMajorAllergen[] {
  return report.us.contains.map((d) => d.group);
}

/** All foods present as "contains" (whatever the law says about them), in list order. */
export function containedFoods(report: AllergenReport): AllergenicFood[] {
  const foods = new Set(
    report.occurrences.filter((o) => o.relation === 'contains').map((o) => o.food),
  );
  return ALLERGENIC_FOODS.filter((f) => foods.has(f));
}

/** All foods named as traces, in list order. */
export function traceFoods(report: AllergenReport): AllergenicFood[] {
  const foods = new Set(
    report.occurrences.filter((o) => o.relation === 'may_contain').map((o) => o.food),
  );
  return ALLERGENIC_FOODS.filter((f) => foods.has(f));
}
