import type { KitchenIndex } from '../kitchen/catalogue.js';
import {
  InvalidCompositionError,
  InvalidQuantityError,
  MissingCompositionError,
} from '../kitchen/errors.js';
import { roundHalfUp } from '../kitchen/rounding.js';
import type { Composition, Ingredient } from '../kitchen/types.js';
import { expandRecipe, forEachIngredientLine } from '../scaling/scaling.js';
import { POUND_G, US_GALLON_ML } from '../units/units.js';
import { ETHANOL_PAC, SUGAR_KINDS, SWEETENERS, type SugarKind } from './sweeteners.js';

/**
 * Mix balance for frozen recipes (DESIGN.md §9): the mix's fat, milkfat, milk solids non-fat,
 * sugars, other solids and total solids as per cent of the mix; sweetness (POD) and
 * freezing-point depression (PAC) on the sucrose = 100 scale, as grams of sucrose equivalent
 * per 100 g of mix; compared with target bands; and the 21 CFR 135.110 class.
 *
 * Stated assumptions:
 * - Lactose is 54 % of MSNF (Goff's convention) and counts towards POD and PAC; other milk
 *   solids (protein, minerals) are not counted in PAC.
 * - When a recipe's measured yield is less than the weight of its lines, the difference is
 *   water lost by evaporation (a custard cooked to 85 °C); a yield above it is ignored.
 */

export const LACTOSE_SHARE_OF_MSNF = 0.54;

export interface MixComposition {
  massG: number;
  water: number;
  fat: number;
  milkFat: number;
  msnf: number;
  lactose: number;
  /** Added sweetener solids (not the lactose inside MSNF). */
  sugars: number;
  sugarsByKind: Partial<Record<SugarKind, number>>;
  eggYolkSolids: number;
  alcohol: number;
  otherSolids: number;
  totalSolids: number;
  /** Sucrose-equivalent sweetness, g per 100 g of mix. */
  pod: number;
  /** Sucrose-equivalent freezing-point depression, g per 100 g of mix. */
  pac: number;
}

export type MixMeasure =
  | 'milkFat'
  | 'msnf'
  | 'sucrose'
  | 'sugars'
  | 'glucoseSyrupSolids'
  | 'totalSolids'
  | 'water'
  | 'pod'
  | 'pac';

export interface MixBand {
  measure: MixMeasure;
  label: string;
  min: number;
  max: number;
  source: string;
  /** Only checked when the mix has some of it (corn syrup solids are optional). */
  onlyWhenPresent?: boolean;
}

/** Target bands for an ice-cream mix. */
export const ICE_CREAM_MIX_BANDS: readonly MixBand[] = [
  {
    measure: 'milkFat',
    label: 'Milkfat',
    min: 10,
    max: 16,
    source: 'Goff, Ice Cream Technology e-Book, ch. 16',
  },
  { measure: 'msnf', label: 'Milk solids non-fat', min: 9, max: 12, source: 'Goff, ch. 16' },
  { measure: 'sucrose', label: 'Sucrose', min: 10, max: 14, source: 'Goff, ch. 16' },
  {
    measure: 'glucoseSyrupSolids',
    label: 'Corn/glucose syrup solids',
    min: 4,
    max: 5,
    source: 'Goff, ch. 16',
    onlyWhenPresent: true,
  },
  { measure: 'totalSolids', label: 'Total solids', min: 36, max: 45, source: 'Goff, ch. 16' },
  { measure: 'water', label: 'Water', min: 55, max: 64, source: 'Goff, ch. 16' },
  {
    measure: 'pod',
    label: 'Sweetness (POD)',
    min: 14,
    max: 20,
    source: 'common practice, no source',
  },
  {
    measure: 'pac',
    label: 'Freezing-point depression (PAC)',
    min: 22,
    max: 30,
    source: 'common practice, no source (for serving at about −12 °C)',
  },
];

/**
 * Target bands for a sorbet (fruit, sugar and water; no milk). Common practice, no source: a
 * sorbet carries about 25–32 % sugars, 28–34 % total solids, and is sweeter and softer than an
 * ice cream at the same serving temperature (POD 20–28, PAC 26–34, serving at about −12 °C).
 */
export const SORBET_MIX_BANDS: readonly MixBand[] = [
  { measure: 'sugars', label: 'Sugars', min: 25, max: 32, source: 'common practice, no source' },
  {
    measure: 'totalSolids',
    label: 'Total solids',
    min: 28,
    max: 34,
    source: 'common practice, no source',
  },
  { measure: 'water', label: 'Water', min: 66, max: 72, source: 'common practice, no source' },
  {
    measure: 'pod',
    label: 'Sweetness (POD)',
    min: 20,
    max: 28,
    source: 'common practice, no source',
  },
  {
    measure: 'pac',
    label: 'Freezing-point depression (PAC)',
    min: 26,
    max: 34,
    source: 'common practice, no source (for serving at about −12 °C)',
  },
];

/** Which set of bands a frozen mix is judged against. */
export type MixStyle = 'ice_cream' | 'sorbet';

/**
 * Below these a mix carries too little milk to be judged as an ice cream: 21 CFR 135.140 asks a
 * sherbet for 1–2 % milkfat and 2–5 % total milk solids (from memory), so a mix under 1 % milkfat
 * and 2 % milk solids non-fat is a water ice or sorbet.
 */
export const SORBET_MAX_MILKFAT = 1;
export const SORBET_MAX_MSNF = 2;

/** Ice cream or sorbet, from the mix itself, with the reason in words. */
export function mixStyleOf(mix: MixComposition): { style: MixStyle; reason: string } {
  if (mix.milkFat < SORBET_MAX_MILKFAT && mix.msnf < SORBET_MAX_MSNF) {
    return {
      style: 'sorbet',
      reason: `Milkfat ${mix.milkFat.toFixed(1)} % and milk solids non-fat ${mix.msnf.toFixed(1)} % are under ${SORBET_MAX_MILKFAT} % and ${SORBET_MAX_MSNF} %: judged as a sorbet.`,
    };
  }
  return {
    style: 'ice_cream',
    reason: `Milkfat ${mix.milkFat.toFixed(1)} %, milk solids non-fat ${mix.msnf.toFixed(1)} %: judged as an ice cream.`,
  };
}

/** The bands for each style. */
export const MIX_BANDS_BY_STYLE: Readonly<Record<MixStyle, readonly MixBand[]>> = {
  ice_cream: ICE_CREAM_MIX_BANDS,
  sorbet: SORBET_MIX_BANDS,
};

const BAND_ADVICE: Record<MixMeasure, { low: string; high: string }> = {
  milkFat: {
    low: 'expect a coarser, icier texture',
    high: 'expect a heavy, buttery texture and churning that can turn to butter',
  },
  msnf: { low: 'body will be thin', high: 'lactose may crystallise and feel sandy' },
  sucrose: { low: 'it will taste flat and freeze hard', high: 'it will be very sweet and soft' },
  sugars: { low: 'it will freeze hard and icy', high: 'it will be very sweet and may not set' },
  glucoseSyrupSolids: { low: 'little effect', high: 'it may feel chewy' },
  totalSolids: { low: 'more water freezes to ice: icier', high: 'it may feel heavy or pasty' },
  water: { low: 'it may feel heavy or pasty', high: 'icier texture' },
  pod: { low: 'tastes under-sweet when frozen', high: 'tastes too sweet' },
  pac: { low: 'hard to scoop at serving temperature', high: 'too soft, melts fast' },
};

export interface BandCheck {
  measure: MixMeasure;
  label: string;
  value: number;
  min: number;
  max: number;
  status: 'below' | 'within' | 'above';
  source: string;
}

// ---------------------------------------------------------------- composition of the mix

function assertComposition(ingredient: Ingredient, c: Composition): void {
  const sugars = Object.values(c.sugars ?? {}).reduce<number>((a, b) => a + (b ?? 0), 0);
  const parts = c.water + c.fat + (c.msnf ?? 0) + sugars + (c.alcohol ?? 0);
  if (parts > 100.5) {
    throw new InvalidCompositionError(
      ingredient.name,
      `water, fat, milk solids, sugars and alcohol come to ${parts.toFixed(1)} g per 100 g.`,
    );
  }
  if ((c.milkFat ?? 0) > c.fat + 1e-9) {
    throw new InvalidCompositionError(ingredient.name, 'milkfat is more than the total fat.');
  }
}

/** Composition of `grams` of a mix from ingredient grams (per cent values rounded to 0.01 for output). */
export function mixFromIngredients(
  parts: ReadonlyArray<{ ingredient: Ingredient; grams: number }>,
  options: { evaporatedWaterG?: number; recipeName?: string } = {},
): MixComposition {
  let mass = 0;
  const sum = { water: 0, fat: 0, milkFat: 0, msnf: 0, eggYolkSolids: 0, alcohol: 0 };
  const sugars: Partial<Record<SugarKind, number>> = {};
  for (const { ingredient, grams } of parts) {
    const c = ingredient.composition;
    if (!c)
      throw new MissingCompositionError(
        ingredient.id,
        ingredient.name,
        options.recipeName ?? 'this recipe',
      );
    assertComposition(ingredient, c);
    const k = grams / 100;
    mass += grams;
    sum.water += c.water * k;
    sum.fat += c.fat * k;
    sum.milkFat += (c.milkFat ?? 0) * k;
    sum.msnf += (c.msnf ?? 0) * k;
    sum.eggYolkSolids += (c.eggYolkSolids ?? 0) * k;
    sum.alcohol += (c.alcohol ?? 0) * k;
    for (const kind of SUGAR_KINDS) {
      const v = c.sugars?.[kind];
      if (v) sugars[kind] = (sugars[kind] ?? 0) + v * k;
    }
  }
  const evaporated = Math.min(Math.max(options.evaporatedWaterG ?? 0, 0), sum.water);
  sum.water -= evaporated;
  mass -= evaporated;
  if (!(mass > 0)) throw new InvalidQuantityError('The mix', mass, 'more than 0 g');

  const pct = (g: number) => (g / mass) * 100;
  const sugarTotal = Object.values(sugars).reduce<number>((a, b) => a + (b ?? 0), 0);
  const lactose = sum.msnf * LACTOSE_SHARE_OF_MSNF;
  let pod = lactose * SWEETENERS.lactose.pod;
  let pac = lactose * SWEETENERS.lactose.pac;
  for (const kind of SUGAR_KINDS) {
    const g = sugars[kind] ?? 0;
    pod += g * SWEETENERS[kind].pod;
    pac += g * SWEETENERS[kind].pac;
  }
  pac += sum.alcohol * ETHANOL_PAC;
  const totalSolids = mass - sum.water - sum.alcohol;
  const otherSolids = totalSolids - sum.fat - sum.msnf - sugarTotal;
  const r = (v: number) => roundHalfUp(v, 2);
  return {
    massG: roundHalfUp(mass, 1),
    water: r(pct(sum.water)),
    fat: r(pct(sum.fat)),
    milkFat: r(pct(sum.milkFat)),
    msnf: r(pct(sum.msnf)),
    lactose: r(pct(lactose)),
    sugars: r(pct(sugarTotal)),
    sugarsByKind: Object.fromEntries(
      Object.entries(sugars).map(([k, g]) => [k, r(pct(g ?? 0))]),
    ) as Partial<Record<SugarKind, number>>,
    eggYolkSolids: r(pct(sum.eggYolkSolids)),
    alcohol: r(pct(sum.alcohol)),
    otherSolids: r(pct(Math.max(otherSolids, 0))),
    totalSolids: r(pct(totalSolids)),
    // POD and PAC per 100 g of mix on the sucrose = 100 scale: Σ grams × factor ÷ mass.
    pod: r(pod / mass),
    pac: r(pac / mass),
  };
}

function measureOf(mix: MixComposition, m: MixMeasure): number {
  switch (m) {
    case 'milkFat':
      return mix.milkFat;
    case 'msnf':
      return mix.msnf;
    case 'sucrose':
      return mix.sugarsByKind.sucrose ?? 0;
    case 'sugars':
      return mix.sugars;
    case 'glucoseSyrupSolids':
      return (
        (mix.sugarsByKind.glucose_syrup_de40 ?? 0) + (mix.sugarsByKind.glucose_syrup_de60 ?? 0)
      );
    case 'totalSolids':
      return mix.totalSolids;
    case 'water':
      return mix.water;
    case 'pod':
      return mix.pod;
    case 'pac':
      return mix.pac;
  }
}

export function checkBands(
  mix: MixComposition,
  bands: readonly MixBand[] = ICE_CREAM_MIX_BANDS,
): BandCheck[] {
  return bands
    .map((b) => ({ band: b, value: measureOf(mix, b.measure) }))
    .filter(({ band, value }) => !(band.onlyWhenPresent && value === 0))
    .map(({ band, value }) => ({
      measure: band.measure,
      label: band.label,
      value,
      min: band.min,
      max: band.max,
      status: value < band.min ? 'below' : value > band.max ? 'above' : 'within',
      source: band.source,
    }));
}

function warningFor(check: BandCheck): string | null {
  if (check.status === 'within') return null;
  const advice = BAND_ADVICE[check.measure][check.status === 'below' ? 'low' : 'high'];
  return `${check.label} ${check.value.toFixed(1)} % is ${check.status} the ${check.min}–${check.max} % band (${check.source}): ${advice}.`;
}

// ---------------------------------------------------------------- 21 CFR 135.110

/** 1.6 lb of total solids per US gallon, in g/L (21 CFR 135.110(a)(2)). */
export const CFR_MIN_TOTAL_SOLIDS_G_PER_L = (1.6 * POUND_G) / (US_GALLON_ML / 1000);
/** 4.5 lb per US gallon, in g/L (21 CFR 135.110(a)(2)). */
export const CFR_MIN_WEIGHT_G_PER_L = (4.5 * POUND_G) / (US_GALLON_ML / 1000);

/**
 * Minimum milk-derived non-fat solids for a milkfat content (21 CFR 135.110(a)(2)): 10 % at 10 %
 * milkfat; each whole 1 % of milkfat above 10 % lowers it by 1 %, down to 6 % at 14 % milkfat.
 * The regulation's table is in whole per cent, so credit is given per whole per cent only
 * (11.5 % milkfat counts as 11 %): the conservative reading. Null below 10 % milkfat.
 */
export function cfrMinimumMsnf(milkFatPercent: number): number | null {
  if (milkFatPercent < 10) return null;
  const credit = Math.min(4, Math.floor(Number((milkFatPercent - 10).toPrecision(12))));
  return 10 - credit;
}

/**
 * Density of a mix from its parts (g/ml), as the mass-weighted harmonic mean of component
 * densities: fat 0.93, milk solids non-fat 1.58, sugars 1.59, other solids 1.5, water 1.0,
 * ethanol 0.79. From memory (standard dairy-science approximation); used only for the per-gallon
 * limits of 21 CFR 135.110.
 */
export function estimateMixDensity(mix: MixComposition): number {
  const parts: Array<[number, number]> = [
    [mix.fat, 0.93],
    [mix.msnf, 1.58],
    [mix.sugars, 1.59],
    [mix.otherSolids, 1.5],
    [mix.water, 1.0],
    [mix.alcohol, 0.79],
  ];
  const mass = parts.reduce((s, [w]) => s + w, 0);
  const volume = parts.reduce((s, [w, d]) => s + w / d, 0);
  return mass / volume;
}

export type FrozenDessertClass = 'frozen_custard' | 'ice_cream' | 'neither';

export interface CfrClassification {
  class: FrozenDessertClass;
  /** Why, in order: each threshold met or missed. */
  reasons: string[];
  /** What the per-gallon limits rest on. */
  assumptions: string[];
  /** Highest overrun (per cent) at which both per-gallon limits still hold. */
  maxOverrunPercent: number;
}

export interface ClassificationOptions {
  /** Air whipped in, per cent of mix volume. Default 30 (an assumption; measure yours). */
  overrunPercent?: number;
  /** Mix density g/ml; estimated from the composition when absent. */
  mixDensityGPerMl?: number;
  /** Bulky flavours (nuts, fruit, chocolate pieces): the egg-yolk threshold drops to 1.12 %. */
  bulkyFlavours?: boolean;
}

export const DEFAULT_OVERRUN_PERCENT = 30;

const fmt = (v: number) => `${roundHalfUp(v, 2)} %`;

/** The 21 CFR 135.110 class of a mix: ice cream, frozen custard, or neither, with the reasons. */
export function classifyFrozenDessert(
  mix: MixComposition,
  options: ClassificationOptions = {},
): CfrClassification {
  const reasons: string[] = [];
  const assumptions: string[] = [];
  let meetsIceCream = true;

  const minMsnf = cfrMinimumMsnf(mix.milkFat);
  if (minMsnf === null) {
    meetsIceCream = false;
    reasons.push(`Milkfat ${fmt(mix.milkFat)} is below the 10 % minimum (21 CFR 135.110(a)(2)).`);
  } else if (mix.msnf < minMsnf) {
    meetsIceCream = false;
    reasons.push(
      `Milk solids non-fat ${fmt(mix.msnf)} is below the ${minMsnf} % required with ${fmt(mix.milkFat)} milkfat (21 CFR 135.110(a)(2)).`,
    );
  } else {
    reasons.push(
      `Milkfat ${fmt(mix.milkFat)} and milk solids non-fat ${fmt(mix.msnf)} meet the ${minMsnf} % minimum for that milkfat (21 CFR 135.110(a)(2)).`,
    );
  }

  const overrun = options.overrunPercent ?? DEFAULT_OVERRUN_PERCENT;
  if (!(overrun >= 0 && overrun <= 300)) {
    throw new InvalidQuantityError('The overrun', overrun, 'a percentage from 0 to 300');
  }
  const mixDensity = options.mixDensityGPerMl ?? estimateMixDensity(mix);
  if (options.overrunPercent === undefined) {
    assumptions.push(
      `Overrun assumed to be ${DEFAULT_OVERRUN_PERCENT} %; enter the measured overrun.`,
    );
  } else {
    assumptions.push(`Overrun ${overrun} % as entered.`);
  }
  assumptions.push(
    options.mixDensityGPerMl === undefined
      ? `Mix density ${roundHalfUp(mixDensity, 3)} g/ml, estimated from the composition.`
      : `Mix density ${mixDensity} g/ml as entered.`,
  );
  assumptions.push(
    'The mix must be pasteurised (21 CFR 135.110); this check does not see the method.',
  );
  assumptions.push(
    'Bulky-flavour reductions of the milkfat and milk-solids minimums are not applied.',
  );

  const frozenGPerL = (mixDensity * 1000) / (1 + overrun / 100);
  const solidsGPerL = (frozenGPerL * mix.totalSolids) / 100;
  const maxOverrunWeight = ((mixDensity * 1000) / CFR_MIN_WEIGHT_G_PER_L - 1) * 100;
  const maxOverrunSolids =
    ((mixDensity * 1000 * mix.totalSolids) / 100 / CFR_MIN_TOTAL_SOLIDS_G_PER_L - 1) * 100;
  const maxOverrunPercent = roundHalfUp(
    Math.max(0, Math.min(maxOverrunWeight, maxOverrunSolids)),
    1,
  );

  if (solidsGPerL < CFR_MIN_TOTAL_SOLIDS_G_PER_L) {
    meetsIceCream = false;
    reasons.push(
      `Total solids ${roundHalfUp(solidsGPerL, 1)} g/L at ${overrun} % overrun are below 1.6 lb per gallon (${roundHalfUp(CFR_MIN_TOTAL_SOLIDS_G_PER_L, 1)} g/L).`,
    );
  } else {
    reasons.push(
      `Total solids ${roundHalfUp(solidsGPerL, 1)} g/L at ${overrun} % overrun meet 1.6 lb per gallon.`,
    );
  }
  if (frozenGPerL < CFR_MIN_WEIGHT_G_PER_L) {
    meetsIceCream = false;
    reasons.push(
      `It would weigh ${roundHalfUp(frozenGPerL, 1)} g/L at ${overrun} % overrun, under 4.5 lb per gallon (${roundHalfUp(CFR_MIN_WEIGHT_G_PER_L, 1)} g/L).`,
    );
  } else {
    reasons.push(
      `It weighs ${roundHalfUp(frozenGPerL, 1)} g/L at ${overrun} % overrun, meeting 4.5 lb per gallon.`,
    );
  }

  const yolkMin = options.bulkyFlavours ? 1.12 : 1.4;
  if (!meetsIceCream) {
    return { class: 'neither', reasons, assumptions, maxOverrunPercent };
  }
  if (mix.eggYolkSolids >= yolkMin) {
    reasons.push(
      `Egg-yolk solids ${fmt(mix.eggYolkSolids)} reach ${yolkMin} %: frozen custard (21 CFR 135.110).`,
    );
    return { class: 'frozen_custard', reasons, assumptions, maxOverrunPercent };
  }
  if (mix.eggYolkSolids > 0) {
    reasons.push(
      `Egg-yolk solids ${fmt(mix.eggYolkSolids)} are under ${yolkMin} %: ice cream, not frozen custard.`,
    );
  }
  return { class: 'ice_cream', reasons, assumptions, maxOverrunPercent };
}

// ---------------------------------------------------------------- the whole check for a recipe

export interface MixBalance {
  recipeId: string;
  name: string;
  composition: MixComposition;
  /** The style the bands are for, from the mix (or `custom` when the caller gave its own bands). */
  style: MixStyle | 'custom';
  styleReason: string;
  bands: BandCheck[];
  warnings: string[];
  classification: CfrClassification;
}

/** Mix balance of one batch of a recipe as written, sub-recipes included. */
export function computeMixBalance(
  index: KitchenIndex,
  recipeId: string,
  options: ClassificationOptions & { bands?: readonly MixBand[] } = {},
): MixBalance {
  const recipe = index.recipe(recipeId);
  const tree = expandRecipe(index, recipeId, recipe.yieldG);
  const parts: Array<{ ingredient: Ingredient; grams: number }> = [];
  forEachIngredientLine(tree, (line) =>
    parts.push({ ingredient: line.ingredient, grams: line.grams }),
  );
  const input = parts.reduce((s, p) => s + p.grams, 0);
  const composition = mixFromIngredients(parts, {
    evaporatedWaterG: Math.max(0, input - recipe.yieldG),
    recipeName: recipe.name,
  });
  const judged = mixStyleOf(composition);
  const style = options.bands ? 'custom' : judged.style;
  const styleReason = options.bands ? 'Checked against the bands given.' : judged.reason;
  const bands = checkBands(composition, options.bands ?? MIX_BANDS_BY_STYLE[judged.style]);
  const warnings = bands.map(warningFor).filter((w): w is string => w !== null);
  if (input - recipe.yieldG > 0.5) {
    warnings.push(
      `The lines weigh ${roundHalfUp(input, 1)} g and the yield is ${recipe.yieldG} g: the difference is counted as evaporated water.`,
    );
  }
  return {
    recipeId: recipe.id,
    name: recipe.name,
    composition,
    style,
    styleReason,
    bands,
    warnings,
    classification: classifyFrozenDessert(composition, options),
  };
}
