/**
 * Rounding, stated once. Quantities and money are carried unrounded through every sum and only
 * rounded for output. Half-up means half away from zero; binary floating-point noise
 * (1.005 × 100 = 100.49999…) is removed first by reading the value to 15 significant digits.
 */

function clean(value: number): number {
  return Number(value.toPrecision(15));
}

/** Round half away from zero to `decimals` places. */
export function roundHalfUp(value: number, decimals = 0): number {
  const p = 10 ** decimals;
  const scaled = clean(value * p);
  const rounded = Math.sign(scaled) * Math.round(Math.abs(scaled));
  return clean(rounded / p) + 0; // + 0 turns -0 into 0
}

/**
 * The kitchen's weighing rule (DESIGN.md §2): 100 g and more to the whole gram, under 100 g to
 * the tenth of a gram.
 */
export function roundKitchenGrams(grams: number): number {
  return clean(grams) >= 100 ? roundHalfUp(grams, 0) : roundHalfUp(grams, 1);
}

/** Whole pieces needed to cover `grams` of something weighing `unitWeightG` per piece (always up). */
export function piecesCovering(grams: number, unitWeightG: number): number {
  return Math.ceil(clean(grams / unitWeightG));
}

/** An exact amount in minor units (cents, possibly fractional) to an integer, half away from zero. */
export function roundMinorUnits(exactMinor: number): number {
  return roundHalfUp(exactMinor, 0);
}

/** Strip floating-point noise from a derived quantity without rounding it to a kitchen rule. */
export function tidy(value: number, decimals = 6): number {
  return roundHalfUp(value, decimals);
}
