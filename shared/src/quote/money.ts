import { InvalidBookingInputError } from '../orders/booking-errors.js';

/**
 * Money in the booking rules: integer minor units (cents, pence, yen, fils) everywhere.
 *
 * THE rounding rule, applied to every amount that comes from a multiplication or division
 * (tax, deposit, refund, the share of a payment): the amount is worked out exactly as a fraction
 * of integers and rounded ONCE, half up, to a whole minor unit — the nearer minor unit, and an
 * exact half goes up. Sums and differences of whole minor units need no rounding, and every
 * complementary amount is a difference: balance = total − deposit, net = gross − tax, kept =
 * paid − refund. So deposit + balance = total holds exactly, always.
 *
 * Why half up and not banker's rounding: each order is rounded a handful of times, not summed
 * over thousands of rounded items, so the statistical bias banker's rounding removes does not
 * build up here; half up is what a client reproduces with a calculator, and it is the rule the
 * kitchen's costing already uses (kitchen/rounding.ts). All amounts are ≥ 0, so half up is
 * also half away from zero. The arithmetic is done on BigInt, so no float ever rounds a cent.
 */

export function assertMinor(what: string, value: unknown): asserts value is number {
  if (typeof value !== 'number' || !Number.isSafeInteger(value) || value < 0) {
    throw new InvalidBookingInputError(
      what,
      value,
      'a whole number of minor units (cents), 0 or more',
    );
  }
}

/** `a × b ÷ c`, rounded half up to an integer. Integers, a, b ≥ 0, c > 0. */
export function mulDivHalfUp(a: number, b: number, c: number): number {
  for (const [name, v] of [
    ['a', a],
    ['b', b],
  ] as const) {
    if (!Number.isSafeInteger(v) || v < 0) {
      throw new InvalidBookingInputError(
        `Money arithmetic (${name})`,
        v,
        'a whole number, 0 or more',
      );
    }
  }
  if (!Number.isSafeInteger(c) || c <= 0) {
    throw new InvalidBookingInputError('Money arithmetic (divisor)', c, 'a whole number above 0');
  }
  const n = BigInt(a) * BigInt(b);
  const d = BigInt(c);
  // floor((2n + d) / 2d) = floor(n/d + 1/2): the nearest integer, halves up.
  const q = (2n * n + d) / (2n * d);
  const result = Number(q);
  if (!Number.isSafeInteger(result)) {
    throw new InvalidBookingInputError('An amount', q.toString(), 'small enough to count exactly');
  }
  return result;
}

/** `percent` % of `amount`, rounded half up. */
export function percentOf(amountMinor: number, percent: number): number {
  return mulDivHalfUp(amountMinor, percent, 100);
}

/** Tax on a net amount when tax is added: net × r. */
export function taxAdded(netMinor: number, rateBp: number): number {
  return mulDivHalfUp(netMinor, rateBp, 10_000);
}

/**
 * Tax inside a gross amount when prices include tax: gross × r / (1 + r) — the "VAT fraction"
 * (1/6 at 20 %). The taxable amount excludes the tax itself (Directive 2006/112/EC, Art. 73, 78).
 */
export function taxIncluded(grossMinor: number, rateBp: number): number {
  return mulDivHalfUp(grossMinor, rateBp, 10_000 + rateBp);
}

// ---------------------------------------------------------------- formatting

const digitsCache = new Map<string, number>();

/**
 * Minor-unit digits of a currency (ISO 4217: JPY 0, EUR 2, KWD 3), read from the runtime's Intl
 * data: the most fraction digits a currency format shows.
 */
export function minorUnitDigits(currency: string): number {
  let digits = digitsCache.get(currency);
  if (digits === undefined) {
    try {
      digits = new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions()
        .maximumFractionDigits;
    } catch {
      throw new InvalidBookingInputError('The currency', currency, 'an ISO 4217 code such as EUR');
    }
    if (digits === undefined) {
      throw new InvalidBookingInputError('The currency', currency, 'an ISO 4217 code such as EUR');
    }
    digitsCache.set(currency, digits);
  }
  return digits;
}

/** An amount in minor units as an exact decimal string in major units: 12345 EUR → "123.45". */
export function minorToDecimalString(minor: number, currency: string): string {
  if (!Number.isSafeInteger(minor)) {
    throw new InvalidBookingInputError('An amount', minor, 'a whole number of minor units');
  }
  const digits = minorUnitDigits(currency);
  const sign = minor < 0 ? '-' : '';
  const abs = String(Math.abs(minor));
  if (digits === 0) return sign + abs;
  const padded = abs.padStart(digits + 1, '0');
  return `${sign}${padded.slice(0, -digits)}.${padded.slice(-digits)}`;
}

/**
 * An amount for people to read: 12345 EUR → "€123.45". The decimal string is handed to Intl as
 * a string, so no float ever stands between the integer and the text.
 */
/** One formatter per locale and currency, kept: building one costs far more than using it. */
const moneyFormatters = new Map<string, Intl.NumberFormat>();

export function formatMoney(minor: number, currency: string, locale = 'en-GB'): string {
  const key = `${locale}|${currency}`;
  let formatter = moneyFormatters.get(key);
  if (!formatter) {
    const digits = minorUnitDigits(currency);
    formatter = new Intl.NumberFormat(locale, {
      style: 'currency',
      currency,
      minimumFractionDigits: digits,
      maximumFractionDigits: digits,
    });
    moneyFormatters.set(key, formatter);
  }
  return formatter.format(minorToDecimalString(minor, currency) as Intl.StringNumericLiteral);
}

/** A rate in basis points for people to read: 2100 → "21 %", 550 → "5.5 %", 887 → "8.87 %". */
export function formatRateBp(rateBp: number): string {
  const whole = Math.trunc(rateBp / 100);
  const frac = String(rateBp % 100)
    .padStart(2, '0')
    .replace(/0+$/, '');
  return `${whole}${frac ? `.${frac}` : ''} %`;
}
