import { z } from 'zod';
import { InvalidQuantityError, MissingConversionError } from '../kitchen/errors.js';

export type UnitKind = 'mass' | 'volume' | 'count';

export interface UnitDefinition {
  kind: UnitKind;
  /** Grams per unit (mass), millilitres per unit (volume), or 1 (count: resolved by unit weight). */
  factor: number;
  /** Short label for screens and prep sheets. */
  label: string;
  /** Where the factor comes from. */
  basis: string;
}

const NIST = 'NIST Handbook 44, Appendix C (exact)';

/**
 * Every unit a recipe line or a pack size can use. US customary and metric spoons and cups are
 * different units with different names: a US cup is 236.5882365 ml, a metric cup 250 ml.
 * The nutrition-labelling cup (240 ml, 21 CFR 101.9(b)(5)(viii)) is for labels only and is not a
 * kitchen unit here.
 */
export const UNIT_DEFINITIONS = {
  mg: { kind: 'mass', factor: 0.001, label: 'mg', basis: 'SI' },
  g: { kind: 'mass', factor: 1, label: 'g', basis: 'SI' },
  kg: { kind: 'mass', factor: 1000, label: 'kg', basis: 'SI' },
  oz: { kind: 'mass', factor: 28.349523125, label: 'oz (avoirdupois)', basis: NIST },
  lb: { kind: 'mass', factor: 453.59237, label: 'lb', basis: NIST },

  ml: { kind: 'volume', factor: 1, label: 'ml', basis: 'SI' },
  cl: { kind: 'volume', factor: 10, label: 'cl', basis: 'SI' },
  dl: { kind: 'volume', factor: 100, label: 'dl', basis: 'SI' },
  l: { kind: 'volume', factor: 1000, label: 'l', basis: 'SI' },
  metric_tsp: { kind: 'volume', factor: 5, label: 'metric tsp (5 ml)', basis: 'common practice' },
  metric_tbsp: {
    kind: 'volume',
    factor: 15,
    label: 'metric tbsp (15 ml)',
    basis: 'common practice',
  },
  au_tbsp: {
    kind: 'volume',
    factor: 20,
    label: 'Australian tbsp (20 ml)',
    basis: 'common practice',
  },
  metric_cup: {
    kind: 'volume',
    factor: 250,
    label: 'metric cup (250 ml)',
    basis: 'common practice',
  },
  us_tsp: { kind: 'volume', factor: 4.92892159375, label: 'US tsp', basis: NIST },
  us_tbsp: { kind: 'volume', factor: 14.78676478125, label: 'US tbsp', basis: NIST },
  us_fl_oz: { kind: 'volume', factor: 29.5735295625, label: 'US fl oz', basis: NIST },
  us_cup: { kind: 'volume', factor: 236.5882365, label: 'US cup', basis: NIST },
  us_pint: { kind: 'volume', factor: 473.176473, label: 'US pint', basis: NIST },
  us_quart: { kind: 'volume', factor: 946.352946, label: 'US quart', basis: NIST },
  us_gal: { kind: 'volume', factor: 3785.411784, label: 'US gallon', basis: NIST },

  piece: { kind: 'count', factor: 1, label: 'piece', basis: 'weight per piece set on the item' },
  leaf: { kind: 'count', factor: 1, label: 'leaf', basis: 'sheet weight set on the item' },
} as const satisfies Record<string, UnitDefinition>;

export type Unit = keyof typeof UNIT_DEFINITIONS;
export const UNITS = Object.keys(UNIT_DEFINITIONS) as Unit[];
export type MassUnit = {
  [U in Unit]: (typeof UNIT_DEFINITIONS)[U]['kind'] extends 'mass' ? U : never;
}[Unit];
export type VolumeUnit = {
  [U in Unit]: (typeof UNIT_DEFINITIONS)[U]['kind'] extends 'volume' ? U : never;
}[Unit];
export type CountUnit = {
  [U in Unit]: (typeof UNIT_DEFINITIONS)[U]['kind'] extends 'count' ? U : never;
}[Unit];

export const unitSchema = z.enum(UNITS as [Unit, ...Unit[]], {
  error: 'Pick a unit from the list (g, kg, ml, US cup, metric cup, piece, leaf…).',
});

export function isUnit(value: unknown): value is Unit {
  return typeof value === 'string' && Object.hasOwn(UNIT_DEFINITIONS, value);
}

export function unitKind(unit: Unit): UnitKind {
  return UNIT_DEFINITIONS[unit].kind;
}

/** US liquid gallon in millilitres (231 cubic inches; NIST Handbook 44 App. C). */
export const US_GALLON_ML = UNIT_DEFINITIONS.us_gal.factor;
/** Avoirdupois pound in grams (NIST Handbook 44 App. C). */
export const POUND_G = UNIT_DEFINITIONS.lb.factor;

/**
 * Anything a quantity can be measured in: an ingredient, or a recipe used as a sub-recipe.
 * Volume needs a density, pieces and leaves need the weight of one.
 */
export interface Convertible {
  id: string;
  name: string;
  /** Grams per millilitre. */
  densityGPerMl?: number | null | undefined;
  /** Grams per piece (an egg without shell, a vanilla pod) or per leaf (a gelatin sheet). */
  unitWeightG?: number | null | undefined;
}

function assertQuantity(quantity: number, item: Convertible): void {
  if (!Number.isFinite(quantity) || quantity < 0) {
    throw new InvalidQuantityError(
      `The quantity of “${item.name}”`,
      quantity,
      'a number of 0 or more',
    );
  }
}

function gramsPerUnit(unit: Unit, item: Convertible): number {
  const def: UnitDefinition = UNIT_DEFINITIONS[unit];
  switch (def.kind) {
    case 'mass':
      return def.factor;
    case 'volume': {
      const density = item.densityGPerMl;
      if (density == null || !(density > 0)) {
        throw new MissingConversionError(item.id, item.name, def.label, 'density');
      }
      return def.factor * density;
    }
    case 'count': {
      const weight = item.unitWeightG;
      if (weight == null || !(weight > 0)) {
        throw new MissingConversionError(item.id, item.name, def.label, 'unit_weight');
      }
      return weight;
    }
  }
}

/** Grams in `quantity` `unit` of `item`. Throws MissingConversionError when the item lacks what the unit needs. */
export function toGrams(quantity: number, unit: Unit, item: Convertible): number {
  assertQuantity(quantity, item);
  return quantity * gramsPerUnit(unit, item);
}

/** The same amount expressed in `unit` (for example a purchase unit or the unit the chef wrote). */
export function fromGrams(grams: number, unit: Unit, item: Convertible): number {
  assertQuantity(grams, item);
  return grams / gramsPerUnit(unit, item);
}

/** Whether `unit` can be used for `item` without a MissingConversionError. */
export function canConvert(unit: Unit, item: Convertible): boolean {
  const kind = unitKind(unit);
  if (kind === 'mass') return true;
  if (kind === 'volume') return item.densityGPerMl != null && item.densityGPerMl > 0;
  return item.unitWeightG != null && item.unitWeightG > 0;
}

/** Millilitres in one unit of a volume unit. */
export function millilitresPer(unit: VolumeUnit): number {
  return UNIT_DEFINITIONS[unit].factor;
}
