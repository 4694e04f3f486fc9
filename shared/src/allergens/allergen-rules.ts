import { z } from 'zod';

/**
 * The law as data. Regulation (EU) No 1169/2011 Annex II (14 groups, with its exemptions) and
 * the US FD&C Act §201(qq) (9 major food allergens, FALCPA 2004 + FASTER Act 2021), with the
 * tree nuts of FDA's allergen guidance, Edition 5 (January 2025). Code never tests an
 * ingredient's name: an ingredient declares the foods it is made from and the form they take
 * (glucose syrup, fully refined oil…), and these tables decide what each jurisdiction declares.
 */

export const EU_ALLERGEN_GROUPS = [
  'gluten',
  'crustaceans',
  'eggs',
  'fish',
  'peanuts',
  'soybeans',
  'milk',
  'nuts',
  'celery',
  'mustard',
  'sesame',
  'sulphites',
  'lupin',
  'molluscs',
] as const;
export type EuAllergenGroup = (typeof EU_ALLERGEN_GROUPS)[number];

export const EU_GROUP_LABELS: Record<EuAllergenGroup, string> = {
  gluten: 'Cereals containing gluten',
  crustaceans: 'Crustaceans',
  eggs: 'Eggs',
  fish: 'Fish',
  peanuts: 'Peanuts',
  soybeans: 'Soybeans',
  milk: 'Milk',
  nuts: 'Nuts',
  celery: 'Celery',
  mustard: 'Mustard',
  sesame: 'Sesame',
  sulphites: 'Sulphur dioxide and sulphites',
  lupin: 'Lupin',
  molluscs: 'Molluscs',
};

export const US_MAJOR_ALLERGENS = [
  'milk',
  'egg',
  'fish',
  'crustacean_shellfish',
  'tree_nuts',
  'wheat',
  'peanuts',
  'soybeans',
  'sesame',
] as const;
export type UsMajorAllergen = (typeof US_MAJOR_ALLERGENS)[number];

export const US_ALLERGEN_LABELS: Record<UsMajorAllergen, string> = {
  milk: 'Milk',
  egg: 'Egg',
  fish: 'Fish',
  crustacean_shellfish: 'Crustacean shellfish',
  tree_nuts: 'Tree nuts',
  wheat: 'Wheat',
  peanuts: 'Peanuts',
  soybeans: 'Soybeans',
  sesame: 'Sesame',
};

/** Advice that is not an allergen declaration in either list. */
export const ADVISORY_KINDS = ['celery_cross_reactivity'] as const;
export type AdvisoryKind = (typeof ADVISORY_KINDS)[number];

interface FoodRule {
  /** The word a label uses for this food, in English as EU/UK labels write it. */
  label: string;
  /** Word starts that, found in an ingredient's label name, already name this food (for emphasis). */
  stems: readonly string[];
  eu?: EuAllergenGroup;
  us?: UsMajorAllergen;
  advisory?: AdvisoryKind;
}

/**
 * The foods an ingredient may be made from. Specific cereals and nuts are named because the
 * label must name them ("wheat", "almonds"), and because the EU and US nut lists differ.
 */
export const FOOD_RULES = {
  // Annex II 1: wheat (such as spelt and khorasan wheat), rye, barley, oats. FDA: "wheat" is any
  // Triticum species, so spelt and khorasan are US wheat too (Edition 5 — from memory).
  wheat: { label: 'wheat', stems: ['wheat'], eu: 'gluten', us: 'wheat' },
  spelt: { label: 'spelt (wheat)', stems: ['spelt'], eu: 'gluten', us: 'wheat' },
  khorasan: { label: 'khorasan wheat', stems: ['khorasan'], eu: 'gluten', us: 'wheat' },
  rye: { label: 'rye', stems: ['rye'], eu: 'gluten' },
  barley: { label: 'barley', stems: ['barley'], eu: 'gluten' },
  oats: { label: 'oats', stems: ['oat'], eu: 'gluten' },
  crustacean: {
    label: 'crustaceans',
    stems: ['crustacean', 'prawn', 'shrimp', 'crab', 'lobster', 'crayfish', 'langoustine'],
    eu: 'crustaceans',
    us: 'crustacean_shellfish',
  },
  egg: { label: 'egg', stems: ['egg'], eu: 'eggs', us: 'egg' },
  fish: { label: 'fish', stems: ['fish'], eu: 'fish', us: 'fish' },
  peanut: { label: 'peanuts', stems: ['peanut', 'groundnut'], eu: 'peanuts', us: 'peanuts' },
  soybean: { label: 'soya', stems: ['soy'], eu: 'soybeans', us: 'soybeans' },
  milk: { label: 'milk', stems: ['milk', 'lactose'], eu: 'milk', us: 'milk' },
  // Annex II 8: exactly these eight nuts.
  almond: { label: 'almonds', stems: ['almond'], eu: 'nuts', us: 'tree_nuts' },
  hazelnut: { label: 'hazelnuts', stems: ['hazelnut', 'filbert'], eu: 'nuts', us: 'tree_nuts' },
  walnut: { label: 'walnuts', stems: ['walnut'], eu: 'nuts', us: 'tree_nuts' },
  cashew: { label: 'cashews', stems: ['cashew'], eu: 'nuts', us: 'tree_nuts' },
  pecan: { label: 'pecan nuts', stems: ['pecan'], eu: 'nuts', us: 'tree_nuts' },
  brazil_nut: { label: 'Brazil nuts', stems: ['brazil'], eu: 'nuts', us: 'tree_nuts' },
  pistachio: { label: 'pistachios', stems: ['pistachio'], eu: 'nuts', us: 'tree_nuts' },
  macadamia: { label: 'macadamia nuts', stems: ['macadamia'], eu: 'nuts', us: 'tree_nuts' },
  // FDA Edition 5's other tree nuts: not in Annex II (which names Juglans regia for walnuts).
  black_walnut: { label: 'black walnuts', stems: ['black walnut'], us: 'tree_nuts' },
  california_walnut: { label: 'California walnuts', stems: ['california walnut'], us: 'tree_nuts' },
  heartnut: { label: 'heartnuts', stems: ['heartnut'], us: 'tree_nuts' },
  pine_nut: { label: 'pine nuts', stems: ['pine nut', 'pignoli'], us: 'tree_nuts' },
  // Neither list (removed from the US list by Edition 5; never in Annex II).
  coconut: { label: 'coconut', stems: ['coconut'] },
  chestnut: { label: 'chestnuts', stems: ['chestnut'] },
  shea: { label: 'shea', stems: ['shea'] },
  celery: { label: 'celery', stems: ['celery', 'celeriac'], eu: 'celery' },
  mustard: { label: 'mustard', stems: ['mustard'], eu: 'mustard' },
  sesame: { label: 'sesame', stems: ['sesame'], eu: 'sesame', us: 'sesame' },
  sulphites: {
    label: 'sulphites',
    stems: ['sulphite', 'sulfite', 'sulphur dioxide', 'metabisulphite'],
    eu: 'sulphites',
  },
  lupin: { label: 'lupin', stems: ['lupin'], eu: 'lupin' },
  mollusc: {
    label: 'molluscs',
    stems: ['mollusc', 'oyster', 'mussel', 'squid', 'clam', 'scallop', 'octopus'],
    eu: 'molluscs',
  },
  // Apiaceae spices: cross-react with celery in some people. Advice only, never "contains celery".
  fennel: { label: 'fennel', stems: ['fennel'], advisory: 'celery_cross_reactivity' },
  anise: { label: 'anise', stems: ['anise', 'aniseed'], advisory: 'celery_cross_reactivity' },
  coriander: { label: 'coriander', stems: ['coriander'], advisory: 'celery_cross_reactivity' },
  cumin: { label: 'cumin', stems: ['cumin'], advisory: 'celery_cross_reactivity' },
} as const satisfies Record<string, FoodRule>;

export type AllergenicFood = keyof typeof FOOD_RULES;
export const ALLERGENIC_FOODS = Object.keys(FOOD_RULES) as AllergenicFood[];

export function foodRule(food: AllergenicFood): FoodRule {
  return FOOD_RULES[food];
}

export function euGroupOf(food: AllergenicFood): EuAllergenGroup | undefined {
  return foodRule(food).eu;
}

export function usAllergenOf(food: AllergenicFood): UsMajorAllergen | undefined {
  return foodRule(food).us;
}

export function advisoryOf(food: AllergenicFood): AdvisoryKind | undefined {
  return foodRule(food).advisory;
}

/**
 * How a food is present in an ingredient, when it is not simply the food itself. A fact about
 * the ingredient (what the supplier's specification says), not a legal conclusion: the tables
 * below decide which forms each jurisdiction exempts.
 */
export const DERIVED_FORMS = [
  'glucose_syrup',
  'dextrose',
  'maltodextrin',
  'fully_refined_oil',
  'tocopherols',
  'phytosterols',
  'plant_stanol_ester',
  'distillate',
  'lactitol',
  'vitamin_carrier',
  'fining_agent',
] as const;
export type DerivedForm = (typeof DERIVED_FORMS)[number];

export type Jurisdiction = 'eu' | 'us';

export interface ExemptionRule {
  jurisdiction: Jurisdiction;
  /** Foods the rule covers. */
  foods: readonly AllergenicFood[];
  forms: readonly DerivedForm[];
  citation: string;
  summary: string;
}

const GLUTEN_CEREALS: readonly AllergenicFood[] = [
  'wheat',
  'spelt',
  'khorasan',
  'rye',
  'barley',
  'oats',
];
const EU_NUTS: readonly AllergenicFood[] = [
  'almond',
  'hazelnut',
  'walnut',
  'cashew',
  'pecan',
  'brazil_nut',
  'pistachio',
  'macadamia',
];

export const EXEMPTION_RULES: readonly ExemptionRule[] = [
  {
    jurisdiction: 'eu',
    foods: ['wheat', 'spelt', 'khorasan'],
    forms: ['glucose_syrup', 'dextrose'],
    citation: 'Regulation (EU) 1169/2011 Annex II 1(a)',
    summary: 'wheat-based glucose syrups including dextrose',
  },
  {
    jurisdiction: 'eu',
    foods: ['wheat', 'spelt', 'khorasan'],
    forms: ['maltodextrin'],
    citation: 'Regulation (EU) 1169/2011 Annex II 1(b)',
    summary: 'wheat-based maltodextrins',
  },
  {
    jurisdiction: 'eu',
    foods: ['barley'],
    forms: ['glucose_syrup'],
    citation: 'Regulation (EU) 1169/2011 Annex II 1(c)',
    summary: 'glucose syrups based on barley',
  },
  {
    jurisdiction: 'eu',
    foods: GLUTEN_CEREALS,
    forms: ['distillate'],
    citation: 'Regulation (EU) 1169/2011 Annex II 1(d)',
    summary: 'cereals used for making alcoholic distillates',
  },
  {
    jurisdiction: 'eu',
    foods: ['fish'],
    forms: ['vitamin_carrier'],
    citation: 'Regulation (EU) 1169/2011 Annex II 4(a)',
    summary: 'fish gelatine used as a carrier for vitamin or carotenoid preparations',
  },
  {
    jurisdiction: 'eu',
    foods: ['fish'],
    forms: ['fining_agent'],
    citation: 'Regulation (EU) 1169/2011 Annex II 4(b)',
    summary: 'fish gelatine or isinglass used as a fining agent in beer and wine',
  },
  {
    jurisdiction: 'eu',
    foods: ['soybean'],
    forms: ['fully_refined_oil'],
    citation: 'Regulation (EU) 1169/2011 Annex II 6(a)',
    summary: 'fully refined soybean oil and fat',
  },
  {
    jurisdiction: 'eu',
    foods: ['soybean'],
    forms: ['tocopherols'],
    citation: 'Regulation (EU) 1169/2011 Annex II 6(b)',
    summary: 'natural mixed tocopherols and their derivatives from soybean sources',
  },
  {
    jurisdiction: 'eu',
    foods: ['soybean'],
    forms: ['phytosterols'],
    citation: 'Regulation (EU) 1169/2011 Annex II 6(c)',
    summary: 'vegetable oils derived phytosterols and phytosterol esters from soybean sources',
  },
  {
    jurisdiction: 'eu',
    foods: ['soybean'],
    forms: ['plant_stanol_ester'],
    citation: 'Regulation (EU) 1169/2011 Annex II 6(d)',
    summary: 'plant stanol ester produced from vegetable oil sterols from soybean sources',
  },
  {
    jurisdiction: 'eu',
    foods: ['milk'],
    forms: ['distillate'],
    citation: 'Regulation (EU) 1169/2011 Annex II 7(a)',
    summary: 'whey used for making alcoholic distillates',
  },
  {
    jurisdiction: 'eu',
    foods: ['milk'],
    forms: ['lactitol'],
    citation: 'Regulation (EU) 1169/2011 Annex II 7(b)',
    summary: 'lactitol',
  },
  {
    jurisdiction: 'eu',
    foods: EU_NUTS,
    forms: ['distillate'],
    citation: 'Regulation (EU) 1169/2011 Annex II 8',
    summary: 'nuts used for making alcoholic distillates',
  },
  {
    // The only statutory exclusion. Wheat glucose syrup, dextrose and maltodextrin, and fish
    // gelatine as a fining agent, have no statutory exemption in the US: they are declared
    // unless FDA grants a petition or notification (FD&C Act §403(w)(6)–(7)).
    jurisdiction: 'us',
    foods: ALLERGENIC_FOODS.filter((f) => usAllergenOf(f) !== undefined),
    forms: ['fully_refined_oil'],
    citation: 'FD&C Act §201(qq)(2)(A)',
    summary: 'highly refined oil derived from a major food allergen',
  },
];

/** The rule that exempts `food` in `form` from declaration in `jurisdiction`, if any. */
export function exemptionFor(
  jurisdiction: Jurisdiction,
  food: AllergenicFood,
  form: DerivedForm | undefined,
): ExemptionRule | undefined {
  if (!form) return undefined;
  return EXEMPTION_RULES.find(
    (r) => r.jurisdiction === jurisdiction && r.foods.includes(food) && r.forms.includes(form),
  );
}

/**
 * Sulphur dioxide and sulphites are declared above 10 mg/kg or 10 mg/L as total SO₂, as
 * consumed (Regulation (EU) 1169/2011 Annex II 12).
 */
export const EU_SULPHITE_THRESHOLD_MG_PER_KG = 10;

export const euAllergenGroupSchema = z.enum(EU_ALLERGEN_GROUPS);
export const usMajorAllergenSchema = z.enum(US_MAJOR_ALLERGENS);
export const allergenicFoodSchema = z.enum(
  ALLERGENIC_FOODS as [AllergenicFood, ...AllergenicFood[]],
  {
    error: 'Pick the allergenic food from the list.',
  },
);
export const derivedFormSchema = z.enum(DERIVED_FORMS);
