import { z } from 'zod';
import {
  allergenicFoodSchema,
  derivedFormSchema,
  type AllergenicFood,
} from '../allergens/allergen-rules.js';
import { SUGAR_KINDS, type SugarKind } from '../mix-balance/sweeteners.js';
import { unitSchema } from '../units/units.js';

/**
 * The kitchen's domain shapes, one zod schema each: the API validates with them and stores the
 * result (ids are strings, money is integer minor units, weights are grams), the admin forms
 * validate with the same schemas before sending, and the computation reads the inferred types.
 */

export const KITCHEN_NAME_MAX = 120;
export const KITCHEN_TEXT_MAX = 2000;
/** Money ceiling for one price field: 10 million in minor units (100,000.00 EUR). */
export const MONEY_MINOR_MAX = 10_000_000;

export const kitchenIdSchema = z.string().trim().min(1, 'An id is required.').max(64);

export const kitchenNameSchema = z
  .string()
  .trim()
  .min(1, 'Give it a name.')
  .max(KITCHEN_NAME_MAX, `Keep the name under ${KITCHEN_NAME_MAX} characters.`)
  .refine((n) => !/[\r\n]/.test(n), { message: 'The name must fit on one line.' });

const optionalText = z.string().trim().max(KITCHEN_TEXT_MAX).optional();

const positiveNumber = (what: string) =>
  z
    .number({ error: `${what} must be a number.` })
    .positive({ error: `${what} must be more than 0.` })
    .finite();

const moneyMinor = (what: string) =>
  z
    .number({ error: `${what} must be a number.` })
    .int({ error: `${what} is in cents (whole minor units).` })
    .min(0, { error: `${what} cannot be negative.` })
    .max(MONEY_MINOR_MAX, { error: `${what} is too large.` });

const gramsPer100 = z.number().min(0, { error: 'Use 0–100 g per 100 g.' }).max(100, {
  error: 'Use 0–100 g per 100 g.',
});

// ---------------------------------------------------------------- ingredients

/** Composition per 100 g, for mix balance. Other solids are whatever is left over. */
export const compositionSchema = z
  .object({
    water: gramsPer100,
    /** Total fat. */
    fat: gramsPer100,
    /** The part of `fat` that is milkfat (21 CFR 135.110 counts milkfat only). */
    milkFat: gramsPer100.optional(),
    /** Milk solids non-fat (protein, lactose, minerals). Lactose inside it is not listed again under sugars. */
    msnf: gramsPer100.optional(),
    /** Sweetener solids by kind, on a dry-solids basis (the water of a syrup goes under `water`). */
    sugars: z
      .partialRecord(z.enum(SUGAR_KINDS as [SugarKind, ...SugarKind[]]), gramsPer100)
      .optional(),
    /** Egg-yolk solids (21 CFR 135.110: 1.4 % or more makes frozen custard). */
    eggYolkSolids: gramsPer100.optional(),
    /** Ethanol, grams per 100 g. */
    alcohol: gramsPer100.optional(),
    /** Where the figures come from, e.g. "USDA FDC 170859". */
    source: z.string().trim().max(200).optional(),
  })
  .superRefine((c, ctx) => {
    if ((c.milkFat ?? 0) > c.fat) {
      ctx.addIssue({
        code: 'custom',
        path: ['milkFat'],
        message: 'Milkfat cannot exceed total fat.',
      });
    }
    const sugars = Object.values(c.sugars ?? {}).reduce<number>((a, b) => a + (b ?? 0), 0);
    const total = c.water + c.fat + (c.msnf ?? 0) + sugars + (c.alcohol ?? 0);
    if (total > 100.5) {
      ctx.addIssue({
        code: 'custom',
        path: ['water'],
        message: `Water, fat, milk solids, sugars and alcohol add up to ${total.toFixed(1)} g per 100 g.`,
      });
    }
  });
export type Composition = z.infer<typeof compositionSchema>;

/** A food the ingredient is made from, and the form it takes when that matters to the law. */
export const allergenSourceSchema = z.object({
  food: allergenicFoodSchema,
  /** E.g. `glucose_syrup` for a wheat glucose syrup, `fully_refined_oil` for refined soybean oil. */
  form: derivedFormSchema.optional(),
  /** Total SO₂ in mg/kg as sold, for sulphites (declared above 10 mg/kg as consumed). */
  so2MgPerKg: z.number().min(0).max(100_000).optional(),
});
export type AllergenSource = z.infer<typeof allergenSourceSchema>;

export const ingredientAllergensSchema = z.object({
  /** What it is made from. */
  contains: z.array(allergenSourceSchema).max(40).default([]),
  /** Cross-contact the supplier declares ("may contain"). */
  mayContain: z.array(allergenicFoodSchema).max(40).default([]),
});
export type IngredientAllergens = z.infer<typeof ingredientAllergensSchema>;

export const ANIMAL_ORIGINS = [
  'milk',
  'egg',
  'honey',
  'fish',
  'crustacean',
  'mollusc',
  'pork',
  'beef',
  'other_meat',
  'insect',
] as const;
export type AnimalOrigin = (typeof ANIMAL_ORIGINS)[number];

export const GELATIN_ORIGINS = ['pork', 'beef', 'fish', 'unknown'] as const;
export type GelatinOrigin = (typeof GELATIN_ORIGINS)[number];

export const dietarySchema = z.object({
  /** Animal sources besides those implied by its allergens (milk, egg, fish… are added automatically). */
  animalOrigins: z.array(z.enum(ANIMAL_ORIGINS)).max(10).default([]),
  /** Set when the ingredient is or contains gelatin. */
  gelatin: z.enum(GELATIN_ORIGINS).optional(),
  /** Contains alcohol (also implied by an alcohol figure in the composition). */
  alcohol: z.boolean().default(false),
});
export type DietaryInfo = z.infer<typeof dietarySchema>;

export const COUNT_UNITS = ['piece', 'leaf'] as const;

export const purchaseSchema = z.object({
  packSize: positiveNumber('The pack size'),
  packUnit: unitSchema,
  packPriceMinor: moneyMinor('The pack price'),
});
export type Purchase = z.infer<typeof purchaseSchema>;

export const ingredientSchema = z
  .object({
    id: kitchenIdSchema,
    name: kitchenNameSchema,
    /** The name as it appears in an ingredient list, e.g. "emulsifier: soya lecithin". */
    labelName: z.string().trim().max(300).optional(),
    purchase: purchaseSchema,
    densityGPerMl: positiveNumber('The density').max(5).optional(),
    /** Weight of one piece or leaf, in grams. */
    unitWeightG: positiveNumber('The weight per piece').max(100_000).optional(),
    /** Set when the kitchen uses it in whole pieces or leaves (eggs, gelatin sheets). */
    countUnit: z.enum(COUNT_UNITS).optional(),
    allergens: ingredientAllergensSchema,
    dietary: dietarySchema,
    composition: compositionSchema.optional(),
    notes: optionalText,
  })
  .superRefine((i, ctx) => {
    if (i.countUnit && i.unitWeightG === undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['unitWeightG'],
        message: `Counted in ${i.countUnit === 'leaf' ? 'leaves' : 'pieces'}: add the weight of one.`,
      });
    }
  });
export type Ingredient = z.infer<typeof ingredientSchema>;

// ---------------------------------------------------------------- recipes

export const STORAGE_KINDS = ['dry', 'chilled', 'frozen'] as const;
export type StorageKind = (typeof STORAGE_KINDS)[number];

/**
 * What a step does, so the prep schedule can place it and safety cautions can be attached:
 * hot sugar, custard cooking, cooling, chilling and freezing carry a caution.
 */
export const STEP_KINDS = [
  'prep',
  'cook',
  'custard',
  'sugar_syrup',
  'caramel',
  'bake',
  'cool',
  'chill',
  'freeze',
  'churn',
  'temper',
  'whip',
  'rest',
  'assemble',
] as const;
export type StepKind = (typeof STEP_KINDS)[number];

export const methodStepSchema = z.object({
  name: kitchenNameSchema,
  kind: z.enum(STEP_KINDS).default('prep'),
  /** Hands-on minutes. */
  activeMinutes: z
    .number()
    .int()
    .min(0)
    .max(24 * 60),
  /** Minutes of waiting afterwards: resting, chilling, freezing, baking unattended. */
  waitMinutes: z
    .number()
    .int()
    .min(0)
    .max(14 * 24 * 60),
  /** The temperature the step reaches or holds, °C. */
  temperatureC: z.number().min(-60).max(300).optional(),
  caution: optionalText,
});
export type MethodStep = z.infer<typeof methodStepSchema>;

export const recipeLineSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('ingredient'),
    ingredientId: kitchenIdSchema,
    quantity: positiveNumber('The quantity'),
    unit: unitSchema,
    note: z.string().trim().max(200).optional(),
  }),
  z.object({
    kind: z.literal('recipe'),
    recipeId: kitchenIdSchema,
    quantity: positiveNumber('The quantity'),
    unit: unitSchema,
    note: z.string().trim().max(200).optional(),
  }),
]);
export type RecipeLine = z.infer<typeof recipeLineSchema>;

export const equipmentSchema = z.object({
  name: kitchenNameSchema,
  /** The most one batch can hold, in grams of this recipe. */
  batchCapacityG: positiveNumber('The batch capacity'),
});
export type Equipment = z.infer<typeof equipmentSchema>;

export const recipeSchema = z.object({
  id: kitchenIdSchema,
  name: kitchenNameSchema,
  lines: z.array(recipeLineSchema).min(1, 'Add at least one line.').max(200),
  /** Measured yield of one batch as written, in grams. */
  yieldG: positiveNumber('The yield'),
  steps: z.array(methodStepSchema).max(100).default([]),
  storage: z.enum(STORAGE_KINDS),
  shelfLifeHours: positiveNumber('The shelf life').max(24 * 365),
  equipment: equipmentSchema.optional(),
  /** For use as a sub-recipe by volume. */
  densityGPerMl: positiveNumber('The density').max(5).optional(),
  /** For use by the piece (a shard, a disc of sponge). */
  unitWeightG: positiveNumber('The weight per piece').optional(),
  notes: optionalText,
});
export type Recipe = z.infer<typeof recipeSchema>;

// ---------------------------------------------------------------- desserts and menus

export const dessertComponentSchema = z.object({
  recipeId: kitchenIdSchema,
  quantity: positiveNumber('The portion'),
  unit: z.enum(['g', 'piece']),
  /** Weight of one piece when the recipe does not set one. */
  pieceWeightG: positiveNumber('The weight per piece').optional(),
  note: z.string().trim().max(200).optional(),
});
export type DessertComponent = z.infer<typeof dessertComponentSchema>;

export const dessertSchema = z.object({
  id: kitchenIdSchema,
  name: kitchenNameSchema,
  description: optionalText,
  components: z.array(dessertComponentSchema).min(1, 'Add at least one component.').max(20),
  platingNotes: optionalText,
  photos: z.array(z.string().trim().max(300)).max(12).default([]),
});
export type Dessert = z.infer<typeof dessertSchema>;

export const menuSchema = z
  .object({
    id: kitchenIdSchema,
    name: kitchenNameSchema,
    description: optionalText,
    dessertIds: z.array(kitchenIdSchema).min(1, 'Add at least one dessert.').max(10),
    pricePerGuestMinor: moneyMinor('The price per guest'),
    minGuests: z.number().int().min(1, { error: 'At least one guest.' }).max(5000),
    maxGuests: z.number().int().min(1).max(5000),
    leadDays: z.number().int().min(0).max(365),
    active: z.boolean(),
  })
  .refine((m) => m.maxGuests >= m.minGuests, {
    path: ['maxGuests'],
    message: 'The maximum number of guests must be at least the minimum.',
  });
export type Menu = z.infer<typeof menuSchema>;

/** Everything the computation needs, as loaded from the database or the demo catalogue. */
export interface KitchenCatalogue {
  /** ISO 4217 code of every price in minor units. */
  currency: string;
  ingredients: readonly Ingredient[];
  recipes: readonly Recipe[];
  desserts: readonly Dessert[];
  menus: readonly Menu[];
}

export type { AllergenicFood };
