/**
 * Reference temperatures and trade practice the recipes and tests lean on.
 *
 * Published bands (REFERENCES.md): sugar stages from F. Braker, *The Simple Art of Perfect
 * Baking* (stages vary by about ±2 °C between authors); chocolate tempering curves from a
 * couverture maker's published guide. Trade practice is marked "common practice, no source".
 */

export interface TemperatureBand {
  name: string;
  minC: number;
  maxC: number;
}

/** Sugar-syrup stages, °C (Braker). Gaps between stages are real gaps in the table. */
export const SUGAR_STAGES: readonly TemperatureBand[] = [
  { name: 'soft ball', minC: 112, maxC: 116 },
  { name: 'firm ball', minC: 118, maxC: 120 },
  { name: 'hard ball', minC: 121, maxC: 130 },
  { name: 'soft crack', minC: 132, maxC: 143 },
  { name: 'hard crack', minC: 149, maxC: 154 },
  { name: 'caramel', minC: 160, maxC: 185 },
];

/** The sugar stage a syrup at `temperatureC` is in, or undefined between or outside stages. */
export function sugarStageAt(temperatureC: number): TemperatureBand | undefined {
  return SUGAR_STAGES.find((s) => temperatureC >= s.minC && temperatureC <= s.maxC);
}

export type ChocolateKind = 'dark' | 'milk' | 'white';

export interface TemperingCurve {
  meltC: readonly [number, number];
  coolC: readonly [number, number];
  workC: readonly [number, number];
}

/** A couverture maker's published tempering curves (REFERENCES.md). */
export const COUVERTURE_TEMPERING: Record<ChocolateKind, TemperingCurve> = {
  dark: { meltC: [45, 50], coolC: [27, 27], workC: [31, 32] },
  milk: { meltC: [45, 45], coolC: [27, 27], workC: [29, 30] },
  white: { meltC: [45, 45], coolC: [27, 27], workC: [28, 29] },
};

/** Trade practice used by the demo recipes and as check values. */
export const TRADE_PRACTICE = {
  /** A custard ice-cream base is heated to 85 °C… (common practice, no source) */
  custardBaseCookC: 85,
  /** …and rested at least six hours in the cold before churning (common practice, no source). */
  custardBaseMinRestHours: 6,
  /** Churned ice cream is firmed 30 minutes in the freezer (common practice, no source). */
  churnedIceCreamFirmMinutes: 30,
  /** Sugar syrup for an Italian meringue (common practice, no source). */
  italianMeringueSyrupC: 118,
  /** A crumble baked about 20 minutes at 160 °C, stirred every five minutes (common practice, no source). */
  crumbleBake: { temperatureC: 160, minutes: 20, stirEveryMinutes: 5 },
  /** Two gelatin leaves weigh 3.3 g (common practice, no source; brands vary). */
  gelatinTwoLeavesG: 3.3,
  /** White chocolate melted at 45 °C, cooled to 28 °C, re-warmed to 30 °C (common practice, no source). */
  whiteChocolateTemper: { meltC: 45, coolC: 28, workC: 30 },
} as const;

export interface CurveComparison {
  stage: 'melt' | 'cool' | 'work';
  valueC: number;
  band: readonly [number, number];
  /** 0 inside the band; otherwise degrees above (positive) or below (negative) it. */
  offsetC: number;
}

/** Where a tempering practice sits against a published curve, stage by stage. */
export function compareTemperingCurve(
  practice: { meltC: number; coolC: number; workC: number },
  curve: TemperingCurve,
): CurveComparison[] {
  const at = (
    stage: CurveComparison['stage'],
    valueC: number,
    band: readonly [number, number],
  ) => ({
    stage,
    valueC,
    band,
    offsetC: valueC < band[0] ? valueC - band[0] : valueC > band[1] ? valueC - band[1] : 0,
  });
  return [
    at('melt', practice.meltC, curve.meltC),
    at('cool', practice.coolC, curve.coolC),
    at('work', practice.workC, curve.workC),
  ];
}

/** A temperature for people: a true minus sign, a thin space before the unit. */
export function formatCelsius(c: number): string {
  return `${c < 0 ? `−${Math.abs(c)}` : String(c)} °C`;
}

/** °C to °F by definition: °F = °C × 9/5 + 32. */
export function celsiusToFahrenheit(c: number): number {
  return (c * 9) / 5 + 32;
}

export interface GelatinGrade {
  name: 'bronze' | 'silver' | 'gold' | 'platinum';
  leafWeightG: number;
  bloom: number;
}

/** Typical leaf weights and Bloom strengths (secondary source; brands vary: let the chef set the leaf weight). */
export const GELATIN_GRADES: readonly GelatinGrade[] = [
  { name: 'bronze', leafWeightG: 3.3, bloom: 140 },
  { name: 'silver', leafWeightG: 2.5, bloom: 160 },
  { name: 'gold', leafWeightG: 2.0, bloom: 200 },
  { name: 'platinum', leafWeightG: 1.7, bloom: 250 },
];

/**
 * Gelatin of another strength for the same set: mass × Bloom held constant (the linear rule,
 * chosen and stated; some use a square-root rule instead).
 */
export function equivalentGelatinMass(massG: number, fromBloom: number, toBloom: number): number {
  return (massG * fromBloom) / toBloom;
}

/** The grade whose typical leaf weight is closest to `leafWeightG`. */
export function nearestGelatinGrade(leafWeightG: number): GelatinGrade {
  return GELATIN_GRADES.reduce((best, g) =>
    Math.abs(g.leafWeightG - leafWeightG) < Math.abs(best.leafWeightG - leafWeightG) ? g : best,
  );
}
