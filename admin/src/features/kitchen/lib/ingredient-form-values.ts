import {
  ALLERGENIC_FOODS,
  ANIMAL_ORIGINS,
  SUGAR_KINDS,
  type AllergenicFood,
  type AnimalOrigin,
  type DerivedForm,
  type GelatinOrigin,
  type Ingredient,
  type SugarKind,
  type Unit,
} from '@nappe/shared';
import { minorToInput, parseMoneyToMinor } from '../../../lib/money-input';
import type { IngredientResponse } from '../api/types';
import {
  numberToInput,
  optionalText,
  parseNumber,
  requiredNumber,
  type Conversion,
} from './form-resolver';

export interface FoodChoice {
  contains: boolean;
  mayContain: boolean;
  form: '' | DerivedForm;
  so2: string;
}

export interface IngredientFormValues {
  name: string;
  labelName: string;
  packSize: string;
  packUnit: Unit;
  /** In major units, as typed ("12.50"). */
  packPrice: string;
  density: string;
  unitWeight: string;
  countUnit: '' | 'piece' | 'leaf';
  foods: Record<AllergenicFood, FoodChoice>;
  animalOrigins: Record<AnimalOrigin, boolean>;
  gelatin: '' | GelatinOrigin;
  alcohol: boolean;
  hasComposition: boolean;
  composition: {
    water: string;
    fat: string;
    milkFat: string;
    msnf: string;
    eggYolkSolids: string;
    alcohol: string;
    source: string;
    sugars: Record<SugarKind, string>;
  };
  notes: string;
}

const record = <K extends string, T>(keys: readonly K[], value: (key: K) => T): Record<K, T> =>
  Object.fromEntries(keys.map((k) => [k, value(k)])) as Record<K, T>;

/** The form's values for a saved ingredient, or for a new one. */
export function ingredientToFormValues(
  ingredient: IngredientResponse | undefined,
  currency: string,
): IngredientFormValues {
  const contains = new Map(ingredient?.allergens.contains.map((s) => [s.food, s]));
  const traces = new Set(ingredient?.allergens.mayContain);
  const origins = new Set(ingredient?.dietary.animalOrigins);
  const c = ingredient?.composition;
  return {
    name: ingredient?.name ?? '',
    labelName: ingredient?.labelName ?? '',
    packSize: numberToInput(ingredient?.purchase.packSize),
    packUnit: ingredient?.purchase.packUnit ?? 'kg',
    packPrice: minorToInput(ingredient?.purchase.packPriceMinor, currency),
    density: numberToInput(ingredient?.densityGPerMl),
    unitWeight: numberToInput(ingredient?.unitWeightG),
    countUnit: ingredient?.countUnit ?? '',
    foods: record(ALLERGENIC_FOODS, (food) => {
      const source = contains.get(food);
      return {
        contains: source !== undefined,
        mayContain: traces.has(food),
        form: source?.form ?? '',
        so2: numberToInput(source?.so2MgPerKg),
      };
    }),
    animalOrigins: record(ANIMAL_ORIGINS, (o) => origins.has(o)),
    gelatin: ingredient?.dietary.gelatin ?? '',
    alcohol: ingredient?.dietary.alcohol ?? false,
    hasComposition: c !== undefined,
    composition: {
      water: numberToInput(c?.water),
      fat: numberToInput(c?.fat),
      milkFat: numberToInput(c?.milkFat),
      msnf: numberToInput(c?.msnf),
      eggYolkSolids: numberToInput(c?.eggYolkSolids),
      alcohol: numberToInput(c?.alcohol),
      source: c?.source ?? '',
      sugars: record(SUGAR_KINDS, (k) => numberToInput(c?.sugars?.[k])),
    },
    notes: ingredient?.notes ?? '',
  };
}

const withValue = <K extends string, T>(key: K, value: T | undefined) =>
  (value === undefined ? {} : { [key]: value }) as Partial<Record<K, T>>;

/** The allergen part of the form as the shared schema models it. */
export function allergensFromForm(foods: IngredientFormValues['foods']): Ingredient['allergens'] {
  return {
    contains: ALLERGENIC_FOODS.filter((f) => foods[f]?.contains).map((food) => ({
      food,
      ...withValue('form', foods[food]!.form || undefined),
      ...withValue('so2MgPerKg', food === 'sulphites' ? parseNumber(foods[food]!.so2) : undefined),
    })),
    mayContain: ALLERGENIC_FOODS.filter((f) => foods[f]?.mayContain && !foods[f]?.contains),
  };
}

/** The form's values as an ingredient, price in minor units parsed from the typed decimal. */
export function ingredientFromForm(
  values: IngredientFormValues,
  currency: string,
): Conversion & { candidate: Ingredient } {
  const errors: Record<string, string> = {};
  const price = parseMoneyToMinor(values.packPrice, currency);
  if (!price.ok) errors.packPrice = price.message;
  const c = values.composition;
  const sugars = Object.fromEntries(
    SUGAR_KINDS.flatMap((k) => {
      const v = parseNumber(c.sugars[k]);
      return v === undefined ? [] : [[k, v]];
    }),
  );
  const candidate: Ingredient = {
    id: 'draft',
    name: values.name,
    ...withValue('labelName', optionalText(values.labelName)),
    purchase: {
      packSize: requiredNumber(values.packSize),
      packUnit: values.packUnit,
      packPriceMinor: price.ok ? price.minor : 0,
    },
    ...withValue('densityGPerMl', parseNumber(values.density)),
    ...withValue('unitWeightG', parseNumber(values.unitWeight)),
    ...withValue('countUnit', values.countUnit || undefined),
    allergens: allergensFromForm(values.foods),
    dietary: {
      animalOrigins: ANIMAL_ORIGINS.filter((o) => values.animalOrigins[o]),
      ...withValue('gelatin', values.gelatin || undefined),
      alcohol: values.alcohol,
    },
    ...(values.hasComposition
      ? {
          composition: {
            water: requiredNumber(c.water),
            fat: requiredNumber(c.fat),
            ...withValue('milkFat', parseNumber(c.milkFat)),
            ...withValue('msnf', parseNumber(c.msnf)),
            ...(Object.keys(sugars).length > 0 ? { sugars } : {}),
            ...withValue('eggYolkSolids', parseNumber(c.eggYolkSolids)),
            ...withValue('alcohol', parseNumber(c.alcohol)),
            ...withValue('source', optionalText(c.source)),
          },
        }
      : {}),
    ...withValue('notes', optionalText(values.notes)),
  };
  return { candidate, errors };
}

/** Which form field a path of the ingredient schema belongs to. */
export function ingredientFieldOf(path: readonly PropertyKey[], candidate: unknown): string {
  const [head, second, third, fourth] = path;
  switch (head) {
    case 'purchase':
      return second === 'packSize' ? 'packSize' : second === 'packUnit' ? 'packUnit' : 'packPrice';
    case 'densityGPerMl':
      return 'density';
    case 'unitWeightG':
      return 'unitWeight';
    case 'allergens': {
      if (second === 'contains' && typeof third === 'number') {
        const food = (candidate as Ingredient).allergens.contains[third]?.food;
        if (food) return fourth === 'so2MgPerKg' ? `foods.${food}.so2` : `foods.${food}.form`;
      }
      return 'root.allergens';
    }
    case 'dietary':
      return second === 'gelatin' ? 'gelatin' : 'root.dietary';
    case 'composition':
      if (second === 'sugars' && typeof third === 'string') return `composition.sugars.${third}`;
      return typeof second === 'string' ? `composition.${second}` : 'composition.water';
    case 'name':
    case 'labelName':
    case 'countUnit':
    case 'notes':
      return head;
    default:
      return 'root.form';
  }
}

/** The body for POST/PUT: the schema's output without the server's `id`. */
export function ingredientBody(parsed: Ingredient): Omit<Ingredient, 'id'> {
  const { id: _id, ...body } = parsed;
  return body;
}
