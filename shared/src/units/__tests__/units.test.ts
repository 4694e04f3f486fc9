import convert from 'convert';
import { describe, expect, it } from 'vitest';
import { InvalidQuantityError, MissingConversionError } from '../../kitchen/errors.js';
import {
  UNIT_DEFINITIONS,
  canConvert,
  fromGrams,
  toGrams,
  unitSchema,
  type Unit,
} from '../units.js';

// Exact decimal arithmetic with BigInt, 10^-20 resolution: enough for every NIST definition here.
const SCALE = 10n ** 20n;
const dec = (s: string): bigint => {
  const [int = '0', frac = ''] = s.split('.');
  return BigInt(int) * SCALE + BigInt((frac + '0'.repeat(20)).slice(0, 20));
};
const mul = (a: bigint, b: bigint) => (a * b) / SCALE;
const div = (a: bigint, n: bigint) => {
  expect(a % n).toBe(0n); // the definitions divide exactly
  return a / n;
};
const show = (v: bigint): string => {
  const int = v / SCALE;
  const frac = (v % SCALE).toString().padStart(20, '0').replace(/0+$/, '');
  return frac ? `${int}.${frac}` : `${int}`;
};

describe('NIST Handbook 44 App. C: US customary and avoirdupois units are exact', () => {
  // 1 in = 2.54 cm exactly; 1 US gallon = 231 in³; 1 lb = 0.45359237 kg exactly.
  const cubicInchMl = mul(mul(dec('2.54'), dec('2.54')), dec('2.54'));
  const gallon = mul(dec('231'), cubicInchMl);
  const exact: Partial<Record<Unit, bigint>> = {
    us_gal: gallon,
    us_quart: div(gallon, 4n),
    us_pint: div(gallon, 8n),
    us_cup: div(gallon, 16n),
    us_fl_oz: div(gallon, 128n),
    us_tbsp: div(gallon, 256n),
    us_tsp: div(gallon, 768n),
    lb: dec('453.59237'),
    oz: div(dec('453.59237'), 16n),
  };

  it.each(Object.entries(exact))('%s equals its definition digit for digit', (unit, value) => {
    expect(String(UNIT_DEFINITIONS[unit as Unit].factor)).toBe(show(value!));
  });

  it('matches the REFERENCES.md figures (NIST Handbook 44 App. C)', () => {
    expect(UNIT_DEFINITIONS.us_cup.factor).toBe(236.5882365);
    expect(UNIT_DEFINITIONS.us_tbsp.factor).toBe(14.78676478125);
    expect(UNIT_DEFINITIONS.us_tsp.factor).toBe(4.92892159375);
    expect(UNIT_DEFINITIONS.us_fl_oz.factor).toBe(29.5735295625);
    expect(UNIT_DEFINITIONS.us_gal.factor).toBe(3785.411784);
    expect(UNIT_DEFINITIONS.oz.factor).toBe(28.349523125);
    expect(UNIT_DEFINITIONS.lb.factor).toBe(453.59237);
  });
});

describe('every factor agrees with the `convert` package (NIST factors)', () => {
  // convert multiplies binary floats, so it can differ from the decimal literal in the last bit:
  // we allow 4 units in the last place, i.e. the same double to within rounding.
  const oracle: Record<string, [string, 'g' | 'mL']> = {
    mg: ['mg', 'g'],
    g: ['g', 'g'],
    kg: ['kg', 'g'],
    oz: ['ounce', 'g'],
    lb: ['pound', 'g'],
    ml: ['mL', 'mL'],
    cl: ['cL', 'mL'],
    dl: ['dL', 'mL'],
    l: ['L', 'mL'],
    us_tsp: ['US teaspoon', 'mL'],
    us_tbsp: ['US tablespoon', 'mL'],
    us_fl_oz: ['US fluid ounce', 'mL'],
    us_cup: ['cup', 'mL'],
    us_pint: ['US liquid pint', 'mL'],
    us_quart: ['US liquid quart', 'mL'],
    us_gal: ['US liquid gallon', 'mL'],
  };

  it.each(Object.entries(oracle))('%s', (unit, [name, to]) => {
    const theirs = (convert as (q: number, u: string) => { to(u: string): number })(1, name).to(to);
    const ours = UNIT_DEFINITIONS[unit as Unit].factor;
    expect(Math.abs(theirs - ours) / ours).toBeLessThanOrEqual(4 * Number.EPSILON);
  });

  it('covers every mass unit and every US customary volume unit', () => {
    const covered = new Set(Object.keys(oracle));
    for (const [unit, def] of Object.entries(UNIT_DEFINITIONS)) {
      if (def.kind === 'mass' || unit.startsWith('us_') || ['ml', 'cl', 'dl', 'l'].includes(unit)) {
        expect(covered.has(unit)).toBe(true);
      }
    }
  });
});

describe('metric and Australian spoons and cups are separate units (common practice, no source)', () => {
  it('metric cup 250 ml, metric tbsp 15 ml, metric tsp 5 ml, Australian tbsp 20 ml', () => {
    expect(UNIT_DEFINITIONS.metric_cup.factor).toBe(250);
    expect(UNIT_DEFINITIONS.metric_tbsp.factor).toBe(15);
    expect(UNIT_DEFINITIONS.metric_tsp.factor).toBe(5);
    expect(UNIT_DEFINITIONS.au_tbsp.factor).toBe(20);
  });

  it('a US cup is not a metric cup, nor a US tablespoon a metric one', () => {
    const water = { id: 'w', name: 'Water', densityGPerMl: 1 };
    expect(toGrams(1, 'metric_cup', water) - toGrams(1, 'us_cup', water)).toBeCloseTo(
      13.4117635,
      9,
    );
    expect(toGrams(1, 'metric_tbsp', water)).not.toBe(toGrams(1, 'us_tbsp', water));
  });

  it('has no bare “cup” or “tbsp”: the chef must say which one', () => {
    const parsed = unitSchema.safeParse('cup');
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues[0]?.message).toMatch(/US cup, metric cup/);
    expect(unitSchema.safeParse('us_cup').success).toBe(true);
  });
});

describe('quantities resolve to grams through density or unit weight', () => {
  it('one US cup of whole milk, heavy cream and water weighs what USDA FDC portions say', () => {
    // USDA FDC household portions (REFERENCES.md): whole milk 244 g, heavy cream 238 g, water 237 g per US cup.
    // Densities below are those portions ÷ 236.5882365 ml, to three decimals: within 0.5 g.
    expect(toGrams(1, 'us_cup', { id: 'm', name: 'Whole milk', densityGPerMl: 1.031 })).toBeCloseTo(
      244,
      0,
    );
    expect(
      toGrams(1, 'us_cup', { id: 'c', name: 'Heavy cream', densityGPerMl: 1.006 }),
    ).toBeCloseTo(238, 0);
    expect(
      Math.abs(toGrams(1, 'us_cup', { id: 'w', name: 'Water', densityGPerMl: 1 }) - 237),
    ).toBeLessThan(0.5);
  });

  it('a large egg is 50 g without shell (USDA FDC 171287 portion)', () => {
    expect(toGrams(3, 'piece', { id: 'e', name: 'Eggs', unitWeightG: 50 })).toBe(150);
  });

  it('two gelatin leaves weigh 3.3 g at a sheet weight of 1.65 g (common practice, no source)', () => {
    expect(
      toGrams(2, 'leaf', { id: 'gel', name: 'Gelatin leaves', unitWeightG: 1.65 }),
    ).toBeCloseTo(3.3, 12);
  });

  it('mass units need nothing from the ingredient', () => {
    expect(toGrams(2, 'kg', { id: 'x', name: 'Flour' })).toBe(2000);
    expect(toGrams(4, 'oz', { id: 'x', name: 'Flour' })).toBe(113.3980925);
  });

  it('round-trips through fromGrams', () => {
    const honey = { id: 'h', name: 'Honey', densityGPerMl: 1.42 };
    for (const unit of ['us_tbsp', 'metric_tsp', 'dl', 'us_fl_oz'] as const) {
      expect(fromGrams(toGrams(3, unit, honey), unit, honey)).toBeCloseTo(3, 12);
    }
  });

  it('a volume without a density is a typed error naming the ingredient and the unit', () => {
    const flour = { id: 'ing-flour', name: 'Rye flour' };
    let caught: unknown;
    try {
      toGrams(1, 'us_cup', flour);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(MissingConversionError);
    const err = caught as MissingConversionError;
    expect(err.code).toBe('missing_conversion');
    expect(err.itemName).toBe('Rye flour');
    expect(err.unit).toBe('US cup');
    expect(err.needs).toBe('density');
    expect(err.message).toContain('“Rye flour”');
    expect(err.message).toContain('US cup');
    expect(canConvert('us_cup', flour)).toBe(false);
  });

  it('a leaf without a sheet weight is a typed error naming the ingredient', () => {
    expect(() => toGrams(2, 'leaf', { id: 'g', name: 'Gelatin sheets' })).toThrowError(
      /“Gelatin sheets” has no weight per piece.*leaf/,
    );
  });

  it('refuses negative or non-finite quantities with a readable message', () => {
    expect(() => toGrams(-1, 'g', { id: 's', name: 'Sugar' })).toThrowError(InvalidQuantityError);
    expect(() => toGrams(Number.NaN, 'g', { id: 's', name: 'Sugar' })).toThrowError(
      /quantity of “Sugar”/,
    );
  });
});
