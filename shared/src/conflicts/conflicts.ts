import { z } from 'zod';
import {
  ALLERGENIC_FOODS,
  EU_ALLERGEN_GROUPS,
  EU_GROUP_LABELS,
  advisoryOf,
  euGroupOf,
  exemptionFor,
  foodRule,
  usAllergenOf,
  type AllergenicFood,
  type EuAllergenGroup,
} from '../allergens/allergen-rules.js';
import { rollUpTrees, type Carrier, type DietaryCarrier } from '../allergens/rollup.js';
import type { KitchenIndex } from '../kitchen/catalogue.js';
import { InvalidSubstitutionError } from '../kitchen/errors.js';
import { kitchenIdSchema, type Dessert, type DessertComponent } from '../kitchen/types.js';
import { componentGramsPerPlate, expandRecipe, type ExpandedRecipe } from '../scaling/scaling.js';

/**
 * Guest conflicts (DESIGN.md §4): one guest's requirement against one dessert, naming the
 * allergens and diets that conflict, the components that carry them and the ingredient lines
 * inside those components, so the chef can leave a component out or replace it — and check the
 * changed plate again. "May contain" traces, EU-exempt derivatives and celery-family spices are
 * advisories, reported apart from conflicts.
 */

// ---------------------------------------------------------------- the guest requirement

/**
 * What a guest can say they cannot eat: an EU group ("nuts", "gluten"), "tree_nuts", or a
 * specific food ("pine_nut", "coconut", "almond").
 */
export const GUEST_ALLERGENS = [
  ...EU_ALLERGEN_GROUPS,
  'tree_nuts',
  ...ALLERGENIC_FOODS.filter((f) => !(EU_ALLERGEN_GROUPS as readonly string[]).includes(f)),
] as const;
export type GuestAllergen = EuAllergenGroup | 'tree_nuts' | AllergenicFood;

export const DIETS = [
  'vegetarian',
  'vegan',
  'no_gelatin',
  'no_alcohol',
  'no_pork',
  'no_beef',
] as const;
export type Diet = (typeof DIETS)[number];

export const DIET_LABELS: Record<Diet, string> = {
  vegetarian: 'Vegetarian',
  vegan: 'Vegan',
  no_gelatin: 'No gelatin',
  no_alcohol: 'No alcohol',
  no_pork: 'No pork',
  no_beef: 'No beef',
};

export const guestRequirementSchema = z.object({
  label: z
    .string()
    .trim()
    .min(1, 'Give the guest a name or a label (for example “Table 3, seat 2”).')
    .max(120)
    .refine((n) => !/[\r\n]/.test(n), { message: 'The label must fit on one line.' }),
  table: z.string().trim().max(40).optional(),
  allergens: z
    .array(z.enum(GUEST_ALLERGENS as unknown as [GuestAllergen, ...GuestAllergen[]]))
    .max(40)
    .default([]),
  diets: z.array(z.enum(DIETS)).max(DIETS.length).default([]),
  notes: z.string().trim().max(500).optional(),
});
export type GuestRequirement = z.infer<typeof guestRequirementSchema>;

export function guestAllergenLabel(a: GuestAllergen): string {
  if (a === 'tree_nuts') return 'Tree nuts';
  if ((EU_ALLERGEN_GROUPS as readonly string[]).includes(a))
    return EU_GROUP_LABELS[a as EuAllergenGroup];
  const label = foodRule(a as AllergenicFood).label;
  return label.charAt(0).toUpperCase() + label.slice(1);
}

/**
 * Whether a guest's stated allergen covers a food. "nuts" and "tree_nuts" both cover the EU's
 * eight nuts and FDA's tree nuts (the broader reading is the safe one for a guest).
 */
export function guestAllergenCovers(allergen: GuestAllergen, food: AllergenicFood): boolean {
  if (allergen === food) return true;
  if (allergen === 'nuts' || allergen === 'tree_nuts') {
    return euGroupOf(food) === 'nuts' || usAllergenOf(food) === 'tree_nuts';
  }
  return euGroupOf(food) === allergen;
}

// ---------------------------------------------------------------- substitutions

export const substitutionSchema = z.object({
  /** The component to change. */
  componentRecipeId: kitchenIdSchema,
  /** The recipe that takes its place at the same weight; absent = leave the component out. */
  replacementRecipeId: kitchenIdSchema.optional(),
});
export type Substitution = z.infer<typeof substitutionSchema>;

/** The dessert with components left out or replaced (same grams per plate). */
export function applySubstitutions(
  index: KitchenIndex,
  dessert: Dessert,
  substitutions: readonly Substitution[],
): Dessert {
  let components: DessertComponent[] = [...dessert.components];
  for (const sub of substitutions) {
    const at = components.findIndex((c) => c.recipeId === sub.componentRecipeId);
    if (at < 0) throw new InvalidSubstitutionError(dessert.name, sub.componentRecipeId);
    const original = components[at]!;
    if (sub.replacementRecipeId === undefined) {
      components = components.filter((_, i) => i !== at);
      continue;
    }
    const replacement = index.recipe(sub.replacementRecipeId, dessert.name);
    components[at] = {
      recipeId: replacement.id,
      quantity: componentGramsPerPlate(index, dessert, original),
      unit: 'g',
      note: `replaces ${index.recipe(original.recipeId).name}`,
    };
  }
  return { ...dessert, components };
}

// ---------------------------------------------------------------- the check

export interface ConflictLine {
  ingredientId: string;
  ingredientName: string;
  /** Recipes from the component down to the one holding the line. */
  path: string[];
  /** Allergenic foods of this line that matter here (empty for diet conflicts). */
  foods: AllergenicFood[];
}

export interface ComponentHit {
  recipeId: string;
  recipeName: string;
  lines: ConflictLine[];
}

export type GuestConflict =
  | {
      kind: 'allergen';
      allergen: GuestAllergen;
      foods: AllergenicFood[];
      components: ComponentHit[];
      message: string;
    }
  | { kind: 'diet'; diet: Diet; components: ComponentHit[]; message: string };

export interface GuestAdvisory {
  kind: 'may_contain' | 'exempt_derivative' | 'cross_reactivity';
  allergen: GuestAllergen;
  foods: AllergenicFood[];
  components: ComponentHit[];
  message: string;
  citation?: string;
}

export interface GuestConflictReport {
  guest: { label: string; table?: string };
  dessertId: string;
  dessertName: string;
  substitutions: Substitution[];
  /** True when nothing conflicts (advisories may still need a word with the guest). */
  clear: boolean;
  conflicts: GuestConflict[];
  advisories: GuestAdvisory[];
}

type Hit = { component: ExpandedRecipe; carrier: Carrier; food?: AllergenicFood };

function groupHits(hits: readonly Hit[]): ComponentHit[] {
  const byComponent = new Map<string, ComponentHit>();
  for (const h of hits) {
    const key = h.component.recipe.id;
    const entry = byComponent.get(key) ?? {
      recipeId: key,
      recipeName: h.component.recipe.name,
      lines: [],
    };
    const lineKey = `${h.carrier.path.join('/')}|${h.carrier.ingredientId}`;
    let line = entry.lines.find((l) => `${l.path.join('/')}|${l.ingredientId}` === lineKey);
    if (!line) {
      line = {
        ingredientId: h.carrier.ingredientId,
        ingredientName: h.carrier.ingredientName,
        path: h.carrier.path,
        foods: [],
      };
      entry.lines.push(line);
    }
    if (h.food && !line.foods.includes(h.food)) line.foods.push(h.food);
    byComponent.set(key, entry);
  }
  return [...byComponent.values()];
}

function where(components: readonly ComponentHit[]): string {
  return components
    .map(
      (c) => `${c.recipeName} (${[...new Set(c.lines.map((l) => l.ingredientName))].join(', ')})`,
    )
    .join('; ');
}

function foodList(foods: readonly AllergenicFood[]): string {
  return foods.map((f) => foodRule(f).label).join(', ');
}

const DIET_TEST: Record<Diet, (c: DietaryCarrier) => boolean> = {
  vegetarian: (c) =>
    c.gelatin !== undefined ||
    c.animalOrigins.some((o) => o !== 'milk' && o !== 'egg' && o !== 'honey'),
  vegan: (c) => c.gelatin !== undefined || c.animalOrigins.length > 0,
  no_gelatin: (c) => c.gelatin !== undefined,
  no_alcohol: (c) => c.alcohol,
  // Gelatin of unknown origin may be pork or beef: the safe answer is "conflict".
  no_pork: (c) => c.animalOrigins.includes('pork') || c.gelatin === 'unknown',
  no_beef: (c) => c.animalOrigins.includes('beef') || c.gelatin === 'unknown',
};

const DIET_REASON: Record<Diet, string> = {
  vegetarian: 'not vegetarian',
  vegan: 'not vegan',
  no_gelatin: 'contains gelatin',
  no_alcohol: 'contains alcohol',
  no_pork: 'contains pork or gelatin of unknown origin',
  no_beef: 'contains beef or gelatin of unknown origin',
};

/** One guest against one dessert, with optional substitutions applied first. */
export function checkGuestAgainstDessert(
  index: KitchenIndex,
  dessertOrId: string | Dessert,
  guest: GuestRequirement,
  substitutions: readonly Substitution[] = [],
): GuestConflictReport {
  const original = typeof dessertOrId === 'string' ? index.dessert(dessertOrId) : dessertOrId;
  const dessert = applySubstitutions(index, original, substitutions);

  const components = dessert.components.map((c) =>
    expandRecipe(index, c.recipeId, componentGramsPerPlate(index, dessert, c), [], dessert.name),
  );
  const perComponent = components.map((tree) => ({
    tree,
    report: rollUpTrees(
      [tree],
      { kind: 'recipe', id: tree.recipe.id, name: tree.recipe.name },
      tree.grams,
    ),
  }));

  const conflicts: GuestConflict[] = [];
  const advisories: GuestAdvisory[] = [];

  for (const allergen of guest.allergens) {
    const contains: Hit[] = [];
    const exempt: Array<Hit & { citation: string }> = [];
    const traces: Hit[] = [];
    for (const { tree, report } of perComponent) {
      for (const occ of report.occurrences) {
        if (!guestAllergenCovers(allergen, occ.food)) continue;
        const hit: Hit = { component: tree, carrier: occ, food: occ.food };
        if (occ.relation === 'may_contain') traces.push(hit);
        else {
          const rule = exemptionFor('eu', occ.food, occ.form);
          if (rule) exempt.push({ ...hit, citation: rule.citation });
          else contains.push(hit);
        }
      }
    }
    const label = guestAllergenLabel(allergen);
    if (contains.length > 0) {
      const foods = uniqueFoods(contains);
      const hits = groupHits(contains);
      conflicts.push({
        kind: 'allergen',
        allergen,
        foods,
        components: hits,
        message: `${label} (${foodList(foods)}): in ${where(hits)}.`,
      });
    }
    if (exempt.length > 0) {
      const foods = uniqueFoods(exempt);
      const hits = groupHits(exempt);
      advisories.push({
        kind: 'exempt_derivative',
        allergen,
        foods,
        components: hits,
        citation: exempt[0]!.citation,
        message: `${label}: ${where(hits)} is made from ${foodList(foods)} but processed so far that EU law does not require it to be declared (${exempt[0]!.citation}). Confirm with the guest.`,
      });
    }
    const containedFoods = new Set(contains.map((h) => h.food));
    const onlyTraces = traces.filter((h) => !containedFoods.has(h.food));
    if (onlyTraces.length > 0) {
      const foods = uniqueFoods(onlyTraces);
      const hits = groupHits(onlyTraces);
      advisories.push({
        kind: 'may_contain',
        allergen,
        foods,
        components: hits,
        message: `${label}: may contain ${foodList(foods)} (cross-contact) — ${where(hits)}.`,
      });
    }
    if (allergen === 'celery') {
      const spices: Hit[] = [];
      for (const { tree, report } of perComponent) {
        for (const occ of report.occurrences) {
          if (occ.relation === 'contains' && advisoryOf(occ.food) === 'celery_cross_reactivity') {
            spices.push({ component: tree, carrier: occ, food: occ.food });
          }
        }
      }
      if (spices.length > 0) {
        const foods = uniqueFoods(spices);
        const hits = groupHits(spices);
        advisories.push({
          kind: 'cross_reactivity',
          allergen,
          foods,
          components: hits,
          message: `Celery: ${where(hits)} has ${foodList(foods)}, a celery-family spice some people with a celery allergy react to. Not celery itself — ask the guest.`,
        });
      }
    }
  }

  for (const diet of guest.diets) {
    const hits: Hit[] = [];
    for (const { tree, report } of perComponent) {
      for (const c of report.dietary.carriers) {
        if (DIET_TEST[diet](c)) hits.push({ component: tree, carrier: c });
      }
    }
    if (hits.length > 0) {
      const grouped = groupHits(hits);
      conflicts.push({
        kind: 'diet',
        diet,
        components: grouped,
        message: `${DIET_LABELS[diet]}: ${where(grouped)} — ${DIET_REASON[diet]}.`,
      });
    }
  }

  return {
    guest: { label: guest.label, ...(guest.table ? { table: guest.table } : {}) },
    dessertId: dessert.id,
    dessertName: dessert.name,
    substitutions: [...substitutions],
    clear: conflicts.length === 0,
    conflicts,
    advisories,
  };
}

function uniqueFoods(hits: ReadonlyArray<Hit>): AllergenicFood[] {
  const set = new Set(hits.flatMap((h) => (h.food ? [h.food] : [])));
  return ALLERGENIC_FOODS.filter((f) => set.has(f));
}

/** Every guest against every dessert (an order's allergy notes). */
export function checkGuestsAgainstDesserts(
  index: KitchenIndex,
  dessertIds: readonly string[],
  guests: readonly GuestRequirement[],
): GuestConflictReport[] {
  return guests.flatMap((g) => dessertIds.map((d) => checkGuestAgainstDessert(index, d, g)));
}
