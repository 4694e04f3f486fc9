import { minorToDecimalString, minorUnitDigits } from '@nappe/shared';

export type MoneyParse = { ok: true; minor: number } | { ok: false; message: string };

/**
 * A price typed in the currency's major units ("12.50", "12,50", "1 250.00") to integer minor
 * units, exactly: the digits are joined as text and read as one integer, so no float ever holds
 * money. One separator is the decimal point ("12,50" is twelve and a half, as a chef in Lyon
 * writes it); with both "." and ",", the last one is the decimal point and the others group
 * thousands. More decimals than the currency has (three for EUR) is an error, never rounded.
 */
export function parseMoneyToMinor(text: string, currency: string): MoneyParse {
  const digits = minorUnitDigits(currency);
  const compact = text.replace(/[\s\u00a0\u202f_']/g, '');
  if (compact === '') return { ok: false, message: 'Enter a price.' };
  if (compact.startsWith('-')) return { ok: false, message: 'A price cannot be negative.' };
  if (!/^[\d.,]+$/.test(compact)) {
    return { ok: false, message: 'Write the price with digits only, such as 12.50.' };
  }
  const lastSeparator = Math.max(compact.lastIndexOf('.'), compact.lastIndexOf(','));
  let whole = compact;
  let fraction = '';
  if (lastSeparator >= 0) {
    const separator = compact[lastSeparator]!;
    const usesBoth = compact.includes('.') && compact.includes(',');
    const repeated = compact.indexOf(separator) !== lastSeparator;
    if (usesBoth || !repeated) {
      whole = compact.slice(0, lastSeparator);
      fraction = compact.slice(lastSeparator + 1);
      if (/[.,]/.test(fraction)) {
        return { ok: false, message: 'Write the price with digits only, such as 12.50.' };
      }
    }
    whole = whole.replace(/[.,]/g, '');
  }
  if (whole === '') whole = '0';
  if (fraction.length > digits) {
    return {
      ok: false,
      message:
        digits === 0
          ? `${currency} has no smaller unit: write a whole amount.`
          : `Use at most ${digits} decimal${digits === 1 ? '' : 's'} (${currency} ${
              digits === 2 ? 'cents' : 'minor units'
            }).`,
    };
  }
  const minor = BigInt(whole) * 10n ** BigInt(digits) + BigInt(fraction.padEnd(digits, '0') || '0');
  if (minor > BigInt(Number.MAX_SAFE_INTEGER)) {
    return { ok: false, message: 'That price is too large.' };
  }
  return { ok: true, minor: Number(minor) };
}

/** Minor units back to what the field shows: 1250 EUR → "12.50". */
export function minorToInput(minor: number | null | undefined, currency: string): string {
  if (minor === null || minor === undefined) return '';
  return minorToDecimalString(minor, currency);
}
