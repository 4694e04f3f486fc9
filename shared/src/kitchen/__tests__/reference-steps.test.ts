import convert from 'convert';
import { describe, expect, it } from 'vitest';
import { DEMO_RECIPES } from '../demo-catalogue.js';
import {
  COUVERTURE_TEMPERING,
  GELATIN_GRADES,
  TRADE_PRACTICE,
  celsiusToFahrenheit,
  compareTemperingCurve,
  equivalentGelatinMass,
  nearestGelatinGrade,
  sugarStageAt,
} from '../reference-steps.js';
import { CUSTARD_CURDLES_ABOVE_C, CUSTARD_FINISH_C } from '../safety.js';

const recipe = (id: string) => DEMO_RECIPES.find((r) => r.id === id)!;

describe('trade practice (common practice, no source) checked against published bands', () => {
  it('Italian-meringue syrup at 118 °C is in Braker’s firm-ball band, 118–120 °C', () => {
    expect(TRADE_PRACTICE.italianMeringueSyrupC).toBe(118);
    expect(sugarStageAt(TRADE_PRACTICE.italianMeringueSyrupC)?.name).toBe('firm ball');
    // Stages vary ±2 °C by author (REFERENCES.md): 118 °C is also within 2 °C of soft ball's top.
    expect(sugarStageAt(116)?.name).toBe('soft ball');
    expect(sugarStageAt(117)).toBeUndefined();
    expect(sugarStageAt(121)?.name).toBe('hard ball');
  });

  it('a custard base heated to 85 °C: the top of the 82–85 °C finish, below curdling at ≈ 85–87 °C (common practice)', () => {
    expect(TRADE_PRACTICE.custardBaseCookC).toBeGreaterThanOrEqual(CUSTARD_FINISH_C.min);
    expect(TRADE_PRACTICE.custardBaseCookC).toBeLessThanOrEqual(CUSTARD_FINISH_C.max);
    expect(TRADE_PRACTICE.custardBaseCookC).toBeLessThan(CUSTARD_CURDLES_ABOVE_C);
  });

  it('the demo custard base cooks at 85 °C, rests at least 6 h before churning, then firms 30 min in the freezer', () => {
    const steps = recipe('rec-vanilla-base').steps;
    const custard = steps.findIndex((s) => s.kind === 'custard');
    const churn = steps.findIndex((s) => s.kind === 'churn');
    expect(steps[custard]?.temperatureC).toBe(85);
    const restBeforeChurn = steps
      .slice(custard + 1, churn)
      .reduce((sum, s) => sum + s.waitMinutes, 0);
    expect(restBeforeChurn).toBeGreaterThanOrEqual(TRADE_PRACTICE.custardBaseMinRestHours * 60);
    expect(steps[churn + 1]).toMatchObject({
      kind: 'freeze',
      waitMinutes: TRADE_PRACTICE.churnedIceCreamFirmMinutes,
    });
  });

  it('crumble: about 20 minutes at 160 °C, stirred every 5 minutes — 160 °C is 320 °F exactly (definition)', () => {
    expect(celsiusToFahrenheit(TRADE_PRACTICE.crumbleBake.temperatureC)).toBe(320);
    const viaConvert = (convert as (q: number, u: string) => { to(u: string): number })(
      160,
      'celsius',
    ).to('fahrenheit');
    expect(viaConvert).toBeCloseTo(320, 9);
    const bake = recipe('rec-almond-crumble').steps.find((s) => s.kind === 'bake')!;
    expect(bake).toMatchObject({ temperatureC: 160, waitMinutes: 20 });
    expect(TRADE_PRACTICE.crumbleBake.minutes / TRADE_PRACTICE.crumbleBake.stirEveryMinutes).toBe(
      4,
    );
    expect(bake.name).toMatch(/stirring every 5 minutes/);
  });

  it('two gelatin leaves weigh 3.3 g: 1.65 g a leaf, nearest the platinum grade (≈ 1.7 g, khymos collection, secondary) — not bronze, whose single leaf is ≈ 3.3 g', () => {
    const leaf = TRADE_PRACTICE.gelatinTwoLeavesG / 2;
    expect(leaf).toBe(1.65);
    const grade = nearestGelatinGrade(leaf);
    expect(grade.name).toBe('platinum');
    expect(Math.abs(grade.leafWeightG - leaf)).toBeLessThanOrEqual(0.1);
    expect(GELATIN_GRADES.find((g) => g.name === 'bronze')?.leafWeightG).toBe(3.3);
  });

  it('gelatin grades convert by mass × Bloom held constant (the linear rule, chosen): 2 bronze leaves ≈ 2.2 platinum leaves', () => {
    const bronze = GELATIN_GRADES.find((g) => g.name === 'bronze')!;
    const platinum = GELATIN_GRADES.find((g) => g.name === 'platinum')!;
    const grams = equivalentGelatinMass(2 * bronze.leafWeightG, bronze.bloom, platinum.bloom);
    expect(grams).toBeCloseTo((6.6 * 140) / 250, 12); // 3.696 g
    expect(grams / platinum.leafWeightG).toBeCloseTo(2.17, 2);
  });

  it('white chocolate 45 → 28 → 30 °C against the couverture maker’s 45 → 27 → 28–29 °C: melt agrees; cool and work are each 1 °C warmer', () => {
    const cmp = compareTemperingCurve(
      TRADE_PRACTICE.whiteChocolateTemper,
      COUVERTURE_TEMPERING.white,
    );
    expect(cmp.map((c) => [c.stage, c.offsetC])).toEqual([
      ['melt', 0],
      ['cool', 1],
      ['work', 1],
    ]);
  });

  it('the demo shards follow the practice temperatures', () => {
    const temps = recipe('rec-white-chocolate-shards')
      .steps.filter((s) => s.kind === 'temper')
      .map((s) => s.temperatureC);
    expect(temps).toEqual([45, 28, 30]);
  });
});
