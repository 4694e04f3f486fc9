import {
  cautionForStep,
  storageCaution,
  type Dessert,
  type Ingredient,
  type Menu,
  type Recipe,
} from '@nappe/shared';
import type {
  DessertResponse,
  IngredientResponse,
  MenuResponse,
  RecipeResponse,
} from '../features/kitchen/api/types';

/**
 * An invented studio catalogue for the Kitchen tests (names and prices ours, in EUR cents).
 * Compositions of the dairy, egg and sugar come from USDA FoodData Central (SR Legacy), the
 * record named beside each; densities from the same records' household portions.
 */

const STAMP = '2026-01-05T09:00:00.000Z';
const none = { contains: [], mayContain: [] };
const plant = { animalOrigins: [], alcohol: false };
const dairy = { contains: [{ food: 'milk' as const }], mayContain: [] };

export const INGREDIENTS: Ingredient[] = [
  {
    id: 'ing-milk',
    name: 'Whole milk',
    labelName: 'whole milk',
    purchase: { packSize: 1, packUnit: 'l', packPriceMinor: 115 },
    // USDA FDC 171265: 1 US cup = 244 g → 1.031 g/ml.
    densityGPerMl: 1.031,
    allergens: dairy,
    dietary: plant,
    composition: { water: 88.13, fat: 3.25, milkFat: 3.25, msnf: 8.62, source: 'USDA FDC 171265' },
  },
  {
    id: 'ing-cream',
    name: 'Whipping cream 36 %',
    labelName: 'cream',
    purchase: { packSize: 1, packUnit: 'l', packPriceMinor: 520 },
    // USDA FDC 170859: 1 US cup = 238 g → 1.006 g/ml.
    densityGPerMl: 1.006,
    allergens: dairy,
    dietary: plant,
    composition: {
      water: 57.71,
      fat: 36.08,
      milkFat: 36.08,
      msnf: 6.21,
      source: 'USDA FDC 170859',
    },
  },
  {
    id: 'ing-yolk',
    name: 'Egg yolks, pasteurised',
    labelName: 'egg yolk',
    purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 950 },
    allergens: { contains: [{ food: 'egg' }], mayContain: [] },
    dietary: plant,
    composition: { water: 52.31, fat: 26.54, eggYolkSolids: 47.69, source: 'USDA FDC 172184' },
  },
  {
    id: 'ing-sugar',
    name: 'Caster sugar',
    labelName: 'sugar',
    purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 145 },
    allergens: none,
    dietary: plant,
    composition: { water: 0.02, fat: 0, sugars: { sucrose: 99.98 }, source: 'USDA FDC 169655' },
  },
  {
    id: 'ing-glucose',
    name: 'Glucose syrup (wheat)',
    labelName: 'glucose syrup',
    purchase: { packSize: 1.4, packUnit: 'kg', packPriceMinor: 690 },
    allergens: { contains: [{ food: 'wheat', form: 'glucose_syrup' }], mayContain: [] },
    dietary: plant,
    composition: { water: 20, fat: 0, sugars: { glucose_syrup_de40: 80 }, source: 'typical' },
  },
  {
    id: 'ing-egg',
    name: 'Eggs, large',
    labelName: 'whole egg',
    purchase: { packSize: 30, packUnit: 'piece', packPriceMinor: 690 },
    // USDA FDC 171287: a large egg without its shell weighs 50 g.
    unitWeightG: 50,
    countUnit: 'piece',
    allergens: { contains: [{ food: 'egg' }], mayContain: [] },
    dietary: plant,
  },
  {
    id: 'ing-flour',
    name: 'Wheat flour T55',
    labelName: 'wheat flour',
    purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 120 },
    allergens: { contains: [{ food: 'wheat' }], mayContain: ['soybean'] },
    dietary: plant,
  },
  {
    id: 'ing-almond',
    name: 'Almond flour',
    labelName: 'ground almonds',
    purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 1390 },
    allergens: { contains: [{ food: 'almond' }], mayContain: ['hazelnut'] },
    dietary: plant,
  },
  {
    id: 'ing-butter',
    name: 'Butter 82 %',
    labelName: 'butter',
    purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 1090 },
    allergens: dairy,
    dietary: plant,
    composition: { water: 16, fat: 82, milkFat: 82, msnf: 2, source: 'typical' },
  },
];

export const RECIPES: Recipe[] = [
  {
    id: 'rec-base',
    name: 'Vanilla ice-cream base',
    lines: [
      { kind: 'ingredient', ingredientId: 'ing-milk', quantity: 500, unit: 'g' },
      { kind: 'ingredient', ingredientId: 'ing-cream', quantity: 250, unit: 'g' },
      { kind: 'ingredient', ingredientId: 'ing-yolk', quantity: 80, unit: 'g' },
      { kind: 'ingredient', ingredientId: 'ing-sugar', quantity: 150, unit: 'g' },
    ],
    yieldG: 980,
    steps: [
      {
        name: 'Cook the custard',
        kind: 'custard',
        activeMinutes: 20,
        waitMinutes: 0,
        temperatureC: 84,
      },
      { name: 'Cool over ice', kind: 'cool', activeMinutes: 10, waitMinutes: 60 },
      { name: 'Churn', kind: 'churn', activeMinutes: 25, waitMinutes: 0 },
      {
        name: 'Firm in the freezer',
        kind: 'freeze',
        activeMinutes: 0,
        waitMinutes: 30,
        temperatureC: -18,
      },
    ],
    storage: 'frozen',
    shelfLifeHours: 168,
    equipment: { name: 'Batch freezer', batchCapacityG: 3000 },
  },
  {
    id: 'rec-crumble',
    name: 'Almond crumble',
    lines: [
      { kind: 'ingredient', ingredientId: 'ing-flour', quantity: 100, unit: 'g' },
      { kind: 'ingredient', ingredientId: 'ing-almond', quantity: 100, unit: 'g' },
      { kind: 'ingredient', ingredientId: 'ing-butter', quantity: 100, unit: 'g' },
      { kind: 'ingredient', ingredientId: 'ing-sugar', quantity: 100, unit: 'g' },
    ],
    yieldG: 380,
    steps: [
      {
        name: 'Bake, stirring',
        kind: 'bake',
        activeMinutes: 5,
        waitMinutes: 20,
        temperatureC: 160,
      },
    ],
    storage: 'dry',
    shelfLifeHours: 72,
  },
  {
    id: 'rec-sable',
    name: 'Sablé dough',
    lines: [
      { kind: 'ingredient', ingredientId: 'ing-flour', quantity: 250, unit: 'g' },
      { kind: 'ingredient', ingredientId: 'ing-butter', quantity: 150, unit: 'g' },
      { kind: 'ingredient', ingredientId: 'ing-sugar', quantity: 100, unit: 'g' },
      { kind: 'ingredient', ingredientId: 'ing-egg', quantity: 1, unit: 'piece' },
    ],
    yieldG: 540,
    steps: [],
    storage: 'chilled',
    shelfLifeHours: 48,
  },
  {
    id: 'rec-tartlet',
    name: 'Crumble tartlet',
    lines: [
      { kind: 'recipe', recipeId: 'rec-sable', quantity: 300, unit: 'g' },
      { kind: 'recipe', recipeId: 'rec-crumble', quantity: 100, unit: 'g' },
    ],
    yieldG: 400,
    steps: [],
    storage: 'dry',
    shelfLifeHours: 24,
  },
];

export const DESSERTS: Dessert[] = [
  {
    id: 'des-tartlet-plate',
    name: 'Tartlet and vanilla ice',
    components: [
      { recipeId: 'rec-tartlet', quantity: 80, unit: 'g' },
      { recipeId: 'rec-base', quantity: 60, unit: 'g' },
    ],
    platingNotes: 'Quenelle on the tartlet, at the last moment.',
    photos: [],
  },
];

export const MENUS: Menu[] = [
  {
    id: 'menu-garden',
    name: 'Garden supper',
    dessertIds: ['des-tartlet-plate'],
    pricePerGuestMinor: 1800,
    minGuests: 8,
    maxGuests: 40,
    leadDays: 5,
    active: true,
  },
];

// ---------------------------------------------------------------- as the API answers

export function ingredientResponse(i: Ingredient, chef = true): IngredientResponse {
  return {
    ...i,
    purchase: { ...i.purchase, packPriceMinor: chef ? i.purchase.packPriceMinor : null },
    createdAt: STAMP,
    updatedAt: STAMP,
  };
}

export function recipeResponse(r: Recipe, names: ReadonlyMap<string, string>): RecipeResponse {
  const referenceNames: Record<string, string> = {};
  for (const line of r.lines) {
    const ref = line.kind === 'ingredient' ? line.ingredientId : line.recipeId;
    referenceNames[ref] = names.get(ref) ?? ref;
  }
  return {
    ...r,
    referenceNames,
    suggestedCautions: {
      steps: r.steps.map((s) => cautionForStep(s) ?? null),
      storage: storageCaution(r.storage) ?? null,
    },
    createdAt: STAMP,
    updatedAt: STAMP,
  };
}

export function dessertResponse(d: Dessert, names: ReadonlyMap<string, string>): DessertResponse {
  return {
    ...d,
    photos: d.photos.map((id) => ({
      id,
      url: `/api/files/${id}-1200.webp`,
      thumbnailUrl: `/api/files/${id}-400.webp`,
      width: 1200,
      height: 800,
    })),
    referenceNames: Object.fromEntries(
      d.components.map((c) => [c.recipeId, names.get(c.recipeId) ?? c.recipeId]),
    ),
    createdAt: STAMP,
    updatedAt: STAMP,
  };
}

export function menuResponse(m: Menu, names: ReadonlyMap<string, string>): MenuResponse {
  return {
    ...m,
    photos: [],
    referenceNames: Object.fromEntries(m.dessertIds.map((id) => [id, names.get(id) ?? id])),
    createdAt: STAMP,
    updatedAt: STAMP,
  };
}
