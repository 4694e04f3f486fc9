import { describe, expect, it } from 'vitest';
import { createKitchenIndex } from '../../kitchen/catalogue.js';
import { DEMO_INGREDIENTS } from '../../kitchen/demo-catalogue.js';
import { InvalidCompositionError, MissingCompositionError } from '../../kitchen/errors.js';
import { roundHalfUp } from '../../kitchen/rounding.js';
import type { Composition, Ingredient } from '../../kitchen/types.js';
import { ingredient, line, recipe } from '../../kitchen/__tests__/fixtures.js';
import {
  CFR_MIN_TOTAL_SOLIDS_G_PER_L,
  CFR_MIN_WEIGHT_G_PER_L,
  LACTOSE_SHARE_OF_MSNF,
  cfrMinimumMsnf,
  checkBands,
  classifyFrozenDessert,
  computeMixBalance,
  ICE_CREAM_MIX_BANDS,
  mixFromIngredients,
  mixStyleOf,
  SORBET_MIX_BANDS,
  type MixComposition,
} from '../mix-balance.js';
import {
  ETHANOL_PAC,
  SWEETENERS,
  pacFromDextroseEquivalent,
  pacFromMolarMass,
} from '../sweeteners.js';

const withComposition = (id: string, composition: Composition): Ingredient =>
  ingredient(id, { name: id, composition });

// USDA FoodData Central, SR Legacy, per 100 g (REFERENCES.md), pinned by FDC ID.
const usda = {
  cream: { fdcId: 170859, water: 57.71, fat: 36.08, protein: 2.84, carbohydrate: 2.84 },
  milk: { fdcId: 171265, water: 88.13, fat: 3.25, protein: 3.15, carbohydrate: 4.8 },
  egg: { fdcId: 171287, water: 76.15, fat: 9.51, protein: 12.56, carbohydrate: 0.72 },
  yolk: { fdcId: 172184, water: 52.31, fat: 26.54, protein: 15.86, carbohydrate: 3.59 },
  sugar: { fdcId: 169655, water: 0.02, fat: 0, protein: 0, carbohydrate: 99.98 },
};
const msnfOf = (r: { water: number; fat: number }) => roundHalfUp(100 - r.water - r.fat, 2);

const cream = withComposition('cream', {
  water: usda.cream.water,
  fat: usda.cream.fat,
  milkFat: usda.cream.fat,
  msnf: msnfOf(usda.cream),
});
const milk = withComposition('milk', {
  water: usda.milk.water,
  fat: usda.milk.fat,
  milkFat: usda.milk.fat,
  msnf: msnfOf(usda.milk),
});
const sugar = withComposition('sugar', {
  water: usda.sugar.water,
  fat: 0,
  sugars: { sucrose: usda.sugar.carbohydrate },
});
// Skim milk powder ≈ 96–97 % solids, ≈ 1 % fat: from memory (REFERENCES.md), typical values.
const smp = withComposition('smp', { water: 3.2, fat: 0.8, milkFat: 0.8, msnf: 96 });
// Corn syrup solids, dry basis; stabiliser/emulsifier blend counted as other solids.
const css = withComposition('css', { water: 0, fat: 0, sugars: { glucose_syrup_de40: 100 } });
const stabiliser = withComposition('stab', { water: 0, fat: 0 });
const water = withComposition('water', { water: 100, fat: 0 });

describe('USDA FoodData Central records (pinned FDC IDs) in the demo catalogue', () => {
  const demo = (id: string) => DEMO_INGREDIENTS.find((i) => i.id === id)!.composition!;

  it.each([
    ['ing-cream-36', usda.cream.fdcId, usda.cream],
    ['ing-whole-milk', usda.milk.fdcId, usda.milk],
  ] as const)('%s: water, fat and MSNF = 100 − water − fat (FDC %s)', (id, _fdcId, rec) => {
    const c = demo(id);
    expect(c.source).toBe(`USDA FDC ${rec.fdcId}`);
    expect(c.water).toBe(rec.water);
    expect(c.fat).toBe(rec.fat);
    expect(c.msnf).toBe(msnfOf(rec));
  });

  it('whole milk uses SR Legacy 171265 (3.25 % fat), not Foundation 746782 (3.20 %)', () => {
    expect(demo('ing-whole-milk').fat).toBe(3.25);
  });

  it('egg yolk (FDC 172184): yolk solids = 100 − water; whole egg (FDC 171287) yolk solids from the 17 g of yolk in a 50 g egg', () => {
    expect(demo('ing-egg-yolk').eggYolkSolids).toBe(msnfOf({ water: usda.yolk.water, fat: 0 }));
    expect(demo('ing-egg-yolk').fat).toBe(usda.yolk.fat);
    expect(demo('ing-whole-egg').eggYolkSolids).toBe(
      roundHalfUp((17 / 50) * (100 - usda.yolk.water), 2),
    );
    expect(demo('ing-whole-egg').water).toBe(usda.egg.water);
  });

  it('sugar (FDC 169655) is sucrose', () => {
    expect(demo('ing-caster-sugar').sugars?.sucrose).toBe(usda.sugar.carbohydrate);
  });
});

describe("Goff's conventions against USDA (Goff, Ice Cream Technology e-Book, ch. 16)", () => {
  it('MSNF of a dairy liquid ≈ (100 − fat) × 0.09: within 0.2 for milk, 0.5 for cream', () => {
    expect(Math.abs(msnfOf(usda.milk) - (100 - usda.milk.fat) * 0.09)).toBeLessThan(0.2);
    expect(Math.abs(msnfOf(usda.cream) - (100 - usda.cream.fat) * 0.09)).toBeLessThan(0.5);
  });

  it('lactose ≈ 54 % of MSNF: USDA milk carbohydrate ÷ MSNF lies in 50–58 %', () => {
    const share = usda.milk.carbohydrate / msnfOf(usda.milk);
    expect(share).toBeGreaterThan(0.5);
    expect(share).toBeLessThan(0.58);
    expect(LACTOSE_SHARE_OF_MSNF).toBe(0.54);
  });
});

describe("Goff's formulation table, reproduced from USDA cream and milk", () => {
  // fat / MSNF / sucrose / CSS / TS (Goff ch. 16). Stabiliser = TS − the four columns.
  const rows = [
    [10, 11, 10, 5, 36.5],
    [12, 10.5, 12, 4, 38.95],
    [14, 10, 14, 3, 41.38],
    [16, 9.5, 15, 0, 40.75],
  ] as const;

  /** Cream, milk and milk powder for the fat and MSNF targets in 100 g (Cramer's rule). */
  function formulate([fat, msnf, sucrose, cornSolids, ts]: readonly number[]) {
    const stab = ts! - (fat! + msnf! + sucrose! + cornSolids!);
    const rest = 100 - sucrose! - cornSolids! - stab;
    const f = [cream, milk, smp].map((i) => i.composition!.fat / 100);
    const s = [cream, milk, smp].map((i) => (i.composition!.msnf ?? 0) / 100);
    const det = (m: number[][]) =>
      m[0]![0]! * (m[1]![1]! * m[2]![2]! - m[1]![2]! * m[2]![1]!) -
      m[0]![1]! * (m[1]![0]! * m[2]![2]! - m[1]![2]! * m[2]![0]!) +
      m[0]![2]! * (m[1]![0]! * m[2]![1]! - m[1]![1]! * m[2]![0]!);
    const A = [f, s, [1, 1, 1]];
    const b = [fat!, msnf!, rest];
    const d = det(A);
    const [c, m, p] = [0, 1, 2].map(
      (col) => det(A.map((row, r) => row.map((v, j) => (j === col ? b[r]! : v)))) / d,
    );
    const sugarG = sucrose! / (usda.sugar.carbohydrate / 100);
    return [
      { ingredient: cream, grams: c! },
      { ingredient: milk, grams: m! },
      { ingredient: smp, grams: p! },
      { ingredient: sugar, grams: sugarG },
      { ingredient: css, grams: cornSolids! },
      { ingredient: stabiliser, grams: stab },
    ];
  }

  it.each(rows)(
    'row %s / %s / %s / %s / %s: every column within ±0.05 and total solids within ±0.1',
    (fat, msnf, sucrose, cornSolids, ts) => {
      const parts = formulate([fat, msnf, sucrose, cornSolids, ts]);
      for (const p of parts) expect(p.grams).toBeGreaterThanOrEqual(-1e-9); // attainable with real ingredients
      const mix = mixFromIngredients(parts);
      expect(mix.milkFat).toBeCloseTo(fat, 1);
      expect(mix.msnf).toBeCloseTo(msnf, 1);
      expect(mix.sugarsByKind.sucrose ?? 0).toBeCloseTo(sucrose, 1);
      expect(mix.sugarsByKind.glucose_syrup_de40 ?? 0).toBeCloseTo(cornSolids, 1);
      expect(Math.abs(mix.totalSolids - ts)).toBeLessThanOrEqual(0.1);
    },
  );

  it('rows 1 and 2 sit inside every one of Goff’s own ranges (fat, MSNF, sucrose, CSS, total solids, water)', () => {
    for (const row of rows.slice(0, 2)) {
      const goff = checkBands(mixFromIngredients(formulate(row))).filter((b) =>
        b.source.startsWith('Goff'),
      );
      expect(goff.length).toBeGreaterThanOrEqual(6);
      expect(goff.filter((b) => b.status !== 'within')).toEqual([]);
    }
  });
});

describe('ice cream or sorbet: which bands a mix is judged against', () => {
  const water = withComposition('water', { water: 100, fat: 0 });

  it("every row of Goff's formulation table is judged as an ice cream", () => {
    // Goff, Ice Cream Technology e-Book, ch. 16: 10–16 % milkfat, 9.5–11 % MSNF.
    const rows: Array<[number, number]> = [
      [10, 11],
      [12, 10.5],
      [14, 10],
      [16, 9.5],
    ];
    for (const [fat, msnf] of rows) {
      expect(mixStyleOf({ milkFat: fat, msnf } as MixComposition).style).toBe('ice_cream');
    }
  });

  it('a sherbet’s 1 % milkfat and 2 % milk solids (21 CFR 135.140, from memory) are the edge', () => {
    expect(mixStyleOf({ milkFat: 0.99, msnf: 1.99 } as MixComposition).style).toBe('sorbet');
    expect(mixStyleOf({ milkFat: 1, msnf: 1.5 } as MixComposition).style).toBe('ice_cream');
    expect(mixStyleOf({ milkFat: 0.5, msnf: 2 } as MixComposition).style).toBe('ice_cream');
  });

  it('a syrup of 270 g sugar (FDC 169655) in 730 g water: a sorbet, sugars in band, solids just under', () => {
    const idx = createKitchenIndex({
      ingredients: [sugar, water],
      recipes: [recipe('syrup', [line('sugar', 270), line('water', 730)], { yieldG: 1000 })],
    });
    const r = computeMixBalance(idx, 'syrup');
    expect(r.style).toBe('sorbet');
    expect(r.styleReason).toMatch(/Milkfat 0\.0 % and milk solids non-fat 0\.0 %/);
    expect(r.bands.map((b) => b.measure)).toEqual(SORBET_MIX_BANDS.map((b) => b.measure));
    const by = Object.fromEntries(r.bands.map((b) => [b.measure, b]));
    // 270 × 99.98 % = 269.95 g sucrose per kg: 27.0 % sugars; POD and PAC 27 (sucrose = 100).
    expect(by.sugars!.value).toBeCloseTo(27, 1);
    expect(by.sugars!.status).toBe('within'); // 25–32 %, common practice, no source
    expect(by.totalSolids!.status).toBe('below'); // 28–34 %
    expect(by.pac!.status).toBe('within'); // 26–34
    expect(r.warnings.join(' ')).toMatch(/Total solids 27\.0 % is below the 28–34 % band/);
  });

  it('a custard of milk, cream and sugar keeps the ice-cream bands', () => {
    const idx = createKitchenIndex({
      ingredients: [milk, cream, sugar],
      recipes: [recipe('base', [line('milk', 600), line('cream', 250), line('sugar', 150)])],
    });
    const r = computeMixBalance(idx, 'base');
    expect(r.style).toBe('ice_cream');
    expect(r.bands.map((b) => b.measure)).toContain('milkFat');
    expect(ICE_CREAM_MIX_BANDS.map((b) => b.measure)).not.toContain('sugars');
  });
});

describe('sweetness (POD) and freezing-point depression (PAC), sucrose = 100', () => {
  it('PAC = 342.30 / M × 100: dextrose (M 180.16) 190, sorbitol (M 182.17) 187.9, lactose 100 (REFERENCES.md)', () => {
    expect(roundHalfUp(SWEETENERS.dextrose.pac, 1)).toBe(190);
    expect(roundHalfUp(SWEETENERS.sorbitol.pac, 1)).toBe(187.9);
    expect(SWEETENERS.lactose.pac).toBe(100);
    expect(SWEETENERS.sucrose.pac).toBe(100);
    expect(pacFromMolarMass(180.16)).toBe(SWEETENERS.fructose.pac);
  });

  it('POD: dextrose 70, lactose 16 (REFERENCES.md)', () => {
    expect(SWEETENERS.dextrose.pod).toBe(70);
    expect(SWEETENERS.lactose.pod).toBe(16);
  });

  it('a starch hydrolysate of DE 100 is dextrose; ethanol (M 46.07) by the same rule is about 743', () => {
    expect(pacFromDextroseEquivalent(100)).toBeCloseTo(SWEETENERS.dextrose.pac, 10);
    expect(roundHalfUp(ETHANOL_PAC, 0)).toBe(743);
  });

  it('in a mix: 15 % sucrose gives POD 15 and PAC 15; trading 5 g for dextrose gives POD 13.5, PAC 19.5', () => {
    const sucroseOnly = withComposition('s', { water: 0, fat: 0, sugars: { sucrose: 100 } });
    const dextrose = withComposition('d', { water: 0, fat: 0, sugars: { dextrose: 100 } });
    const a = mixFromIngredients([
      { ingredient: sucroseOnly, grams: 15 },
      { ingredient: water, grams: 85 },
    ]);
    expect([a.pod, a.pac]).toEqual([15, 15]);
    const b = mixFromIngredients([
      { ingredient: sucroseOnly, grams: 10 },
      { ingredient: dextrose, grams: 5 },
      { ingredient: water, grams: 85 },
    ]);
    expect(b.pod).toBe(13.5);
    expect(b.pac).toBe(19.5);
  });

  it('lactose from milk solids counts: milk powder in water', () => {
    const m = mixFromIngredients([
      { ingredient: smp, grams: 10 },
      { ingredient: water, grams: 90 },
    ]);
    expect(m.lactose).toBe(roundHalfUp(9.6 * 0.54, 2));
    expect(m.pac).toBe(roundHalfUp(9.6 * 0.54, 2));
    expect(m.pod).toBe(roundHalfUp(9.6 * 0.54 * 0.16, 2));
  });
});

// ---------------------------------------------------------------- 21 CFR 135.110

function mix(values: Partial<MixComposition>): MixComposition {
  const base: MixComposition = {
    massG: 100,
    water: 62,
    fat: 10,
    milkFat: 10,
    msnf: 10,
    lactose: 5.4,
    sugars: 15,
    sugarsByKind: { sucrose: 15 },
    eggYolkSolids: 0,
    alcohol: 0,
    otherSolids: 0.5,
    totalSolids: 38,
    pod: 15.9,
    pac: 20.4,
  };
  return { ...base, ...values };
}
const at = { mixDensityGPerMl: 1.1, overrunPercent: 50 };

describe('21 CFR 135.110(a)(2): ice cream, frozen custard or neither', () => {
  it('the per-gallon limits in g/L: 1.6 lb/gal = 191.7 g/L, 4.5 lb/gal = 539.2 g/L', () => {
    expect(roundHalfUp(CFR_MIN_TOTAL_SOLIDS_G_PER_L, 1)).toBe(191.7);
    expect(roundHalfUp(CFR_MIN_WEIGHT_G_PER_L, 1)).toBe(539.2);
  });

  it('MSNF minimum: 10 % at 10 % milkfat, one for one down to 6 % at 14 %, whole per cent steps', () => {
    expect(cfrMinimumMsnf(9.99)).toBeNull();
    expect(cfrMinimumMsnf(10)).toBe(10);
    expect(cfrMinimumMsnf(10.99)).toBe(10);
    expect(cfrMinimumMsnf(11)).toBe(9);
    expect(cfrMinimumMsnf(12)).toBe(8);
    expect(cfrMinimumMsnf(13)).toBe(7);
    expect(cfrMinimumMsnf(14)).toBe(6);
    expect(cfrMinimumMsnf(18)).toBe(6);
    expect(cfrMinimumMsnf(10.1 + 0.9)).toBe(9); // 11.000000000000002 is 11
  });

  it.each([
    [10, 10, 'ice_cream'],
    [10, 9.99, 'neither'],
    [9.99, 12, 'neither'],
    [12, 8, 'ice_cream'],
    [11.5, 8.6, 'neither'], // 11.5 % earns one whole step only: 9 % needed
    [14, 6, 'ice_cream'],
    [16, 5.99, 'neither'],
  ] as const)('milkfat %s, MSNF %s → %s', (milkFat, msnf, expected) => {
    const result = classifyFrozenDessert(mix({ milkFat, fat: milkFat, msnf }), at);
    expect(result.class).toBe(expected);
    expect(result.reasons[0]).toMatch(/21 CFR 135\.110\(a\)\(2\)/);
  });

  it('counts milkfat, not egg or nut fat', () => {
    expect(classifyFrozenDessert(mix({ fat: 14, milkFat: 9, msnf: 10 }), at).class).toBe('neither');
  });

  it('egg-yolk solids: 1.4 % makes frozen custard, 1.39 % does not; 1.12 % with bulky flavours', () => {
    expect(classifyFrozenDessert(mix({ eggYolkSolids: 1.4 }), at).class).toBe('frozen_custard');
    expect(classifyFrozenDessert(mix({ eggYolkSolids: 1.39 }), at).class).toBe('ice_cream');
    expect(
      classifyFrozenDessert(mix({ eggYolkSolids: 1.12 }), { ...at, bulkyFlavours: true }).class,
    ).toBe('frozen_custard');
    expect(
      classifyFrozenDessert(mix({ eggYolkSolids: 1.11 }), { ...at, bulkyFlavours: true }).class,
    ).toBe('ice_cream');
  });

  it('frozen custard must first be ice cream', () => {
    const r = classifyFrozenDessert(mix({ eggYolkSolids: 3, milkFat: 8, fat: 8 }), at);
    expect(r.class).toBe('neither');
  });

  it('weight per gallon limits the overrun: mix 1.1 g/ml holds to 104 % overrun', () => {
    // 1100 g/L ÷ 2.00 = 550 g/L ≥ 539.2; ÷ 2.05 = 536.6 g/L < 539.2.
    expect(
      classifyFrozenDessert(mix({ totalSolids: 36.5 }), {
        mixDensityGPerMl: 1.1,
        overrunPercent: 100,
      }).class,
    ).toBe('ice_cream');
    const over = classifyFrozenDessert(mix({ totalSolids: 36.5 }), {
      mixDensityGPerMl: 1.1,
      overrunPercent: 105,
    });
    expect(over.class).toBe('neither');
    expect(over.reasons.join(' ')).toMatch(/under 4\.5 lb per gallon/);
    expect(over.maxOverrunPercent).toBe(104);
  });

  it('total solids per gallon limit a thin mix first: 30 % solids at 1.08 g/ml hold to 69 % overrun', () => {
    // 1080 × 0.30 = 324 g/L of solids in the mix; ÷ 1.69 = 191.7 g/L.
    const thin = mix({ totalSolids: 30 });
    expect(classifyFrozenDessert(thin, { mixDensityGPerMl: 1.08, overrunPercent: 68 }).class).toBe(
      'ice_cream',
    );
    const r = classifyFrozenDessert(thin, { mixDensityGPerMl: 1.08, overrunPercent: 70 });
    expect(r.class).toBe('neither');
    expect(r.reasons.join(' ')).toMatch(/below 1\.6 lb per gallon/);
    expect(r.maxOverrunPercent).toBe(69);
  });

  it('states its assumptions when the overrun and density are not given', () => {
    const r = classifyFrozenDessert(mix({}));
    expect(r.assumptions.join(' ')).toMatch(/Overrun assumed to be 30 %/);
    expect(r.assumptions.join(' ')).toMatch(/estimated from the composition/);
    expect(r.assumptions.join(' ')).toMatch(/pasteurised/);
  });
});

describe('mix balance of a recipe', () => {
  it('counts the weight lost in cooking as evaporated water', () => {
    const idx = createKitchenIndex({
      ingredients: [milk],
      recipes: [recipe('r', [line('milk', 1000)], { yieldG: 900 })],
    });
    const r = computeMixBalance(idx, 'r');
    expect(r.composition.massG).toBe(900);
    expect(r.composition.fat).toBe(roundHalfUp((32.5 / 900) * 100, 2));
    expect(r.warnings.join(' ')).toMatch(/counted as evaporated water/);
  });

  it('warns in words when a measure is outside its band, naming the source', () => {
    const idx = createKitchenIndex({
      ingredients: [milk, sugar],
      recipes: [recipe('r', [line('milk', 850), line('sugar', 150)])],
    });
    const r = computeMixBalance(idx, 'r');
    const fat = r.bands.find((b) => b.measure === 'milkFat')!;
    expect(fat.status).toBe('below');
    expect(r.warnings.find((w) => w.startsWith('Milkfat'))).toMatch(
      /below the 10–16 % band \(Goff/,
    );
    expect(r.classification.class).toBe('neither');
  });

  it('needs every ingredient’s composition, and names the one missing', () => {
    const vanilla = ingredient('v', { name: 'Vanilla extract' });
    const idx = createKitchenIndex({
      ingredients: [milk, vanilla],
      recipes: [recipe('r', [line('milk', 100), line('v', 1)], { name: 'Vanilla base' })],
    });
    expect(() => computeMixBalance(idx, 'r')).toThrowError(MissingCompositionError);
    expect(() => computeMixBalance(idx, 'r')).toThrowError(
      /“Vanilla extract” in “Vanilla base” has no composition/,
    );
  });

  it('refuses a composition over 100 g per 100 g', () => {
    const odd = withComposition('odd', { water: 80, fat: 30 });
    expect(() => mixFromIngredients([{ ingredient: odd, grams: 10 }])).toThrowError(
      InvalidCompositionError,
    );
  });
});
