// @ts-check
/**
 * Minor units → text for people. Amounts stay integers everywhere; only the display string
 * is built here, from an exact decimal string (never a float) handed to Intl.NumberFormat.
 */

// Stripe docs, "Supported currencies → Zero-decimal currencies" and "Three-decimal currencies":
// the exponent the payment service uses for the minor unit of each currency.
const ZERO_DECIMAL = new Set([
  'bif',
  'clp',
  'djf',
  'gnf',
  'jpy',
  'kmf',
  'krw',
  'mga',
  'pyg',
  'rwf',
  'ugx',
  'vnd',
  'vuv',
  'xaf',
  'xof',
  'xpf',
]);
const THREE_DECIMAL = new Set(['bhd', 'jod', 'kwd', 'omr', 'tnd']);

/**
 * @param {string} currency three-letter ISO 4217 code, any case
 * @returns {number} digits after the decimal point in one major unit
 */
export function minorUnitExponent(currency) {
  const code = currency.toLowerCase();
  if (ZERO_DECIMAL.has(code)) return 0;
  if (THREE_DECIMAL.has(code)) return 3;
  return 2;
}

/**
 * Exact decimal string for an integer amount of minor units: 1250 gbp → "12.50".
 * @param {number} amount integer minor units
 * @param {string} currency
 * @returns {string}
 */
export function minorUnitsToDecimalString(amount, currency) {
  if (!Number.isSafeInteger(amount)) {
    throw new TypeError(`Amount must be a whole number of minor units, got ${amount}`);
  }
  const exponent = minorUnitExponent(currency);
  const digits = String(Math.abs(amount)).padStart(exponent + 1, '0');
  const major =
    exponent === 0 ? digits : `${digits.slice(0, -exponent)}.${digits.slice(-exponent)}`;
  return amount < 0 ? `-${major}` : major;
}

/**
 * @param {number} amount integer minor units
 * @param {string} currency
 * @param {string} [locale]
 * @returns {string} e.g. "£12.50"
 */
export function formatMinorUnits(amount, currency, locale = 'en-GB') {
  const format = new Intl.NumberFormat(locale, {
    style: 'currency',
    currency: currency.toUpperCase(),
  });
  // Intl.NumberFormat accepts an exact decimal string (ECMA-402, NumberFormat v3).
  return format.format(/** @type {`${number}`} */ (minorUnitsToDecimalString(amount, currency)));
}

/** @type {Set<string> | undefined} */
let knownCurrencies;

/**
 * @param {string} code lower-case three-letter code
 * @returns {boolean}
 */
export function isKnownCurrency(code) {
  knownCurrencies ??= new Set(Intl.supportedValuesOf('currency').map((c) => c.toLowerCase()));
  return knownCurrencies.has(code);
}
