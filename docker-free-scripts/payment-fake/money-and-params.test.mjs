// Small pure pieces: money display, card-number checksum, form parsing, HTML escaping.
import { describe, expect, it } from 'vitest';
import {
  escapeHtml,
  formatMinorUnits,
  minorUnitExponent,
  minorUnitsToDecimalString,
  passesLuhn,
  TEST_CARDS,
} from './index.js';
import { parseForm } from './params.js';

describe('minor units', () => {
  // Stripe docs, "Supported currencies": zero-decimal (JPY, KRW, …) and three-decimal
  // (KWD, BHD, …) currencies; two decimals otherwise.
  it.each([
    ['gbp', 2],
    ['EUR', 2],
    ['jpy', 0],
    ['krw', 0],
    ['kwd', 3],
    ['bhd', 3],
  ])('%s has %i decimals', (currency, exponent) => {
    expect(minorUnitExponent(currency)).toBe(exponent);
  });

  it('writes the exact decimal without floating point', () => {
    expect(minorUnitsToDecimalString(1250, 'gbp')).toBe('12.50');
    expect(minorUnitsToDecimalString(5, 'gbp')).toBe('0.05');
    expect(minorUnitsToDecimalString(0, 'eur')).toBe('0.00');
    expect(minorUnitsToDecimalString(-1250, 'gbp')).toBe('-12.50');
    expect(minorUnitsToDecimalString(1250, 'jpy')).toBe('1250');
    expect(minorUnitsToDecimalString(1234, 'kwd')).toBe('1.234');
    expect(() => minorUnitsToDecimalString(12.5, 'gbp')).toThrow(/whole number/);
  });

  // Oracle: Intl.NumberFormat (CLDR data) given the major-unit amount as a number.
  it.each([
    [8000, 'gbp', 'en-GB', 80],
    [123456, 'eur', 'de-DE', 1234.56],
    [123456, 'eur', 'fr-FR', 1234.56],
    [1250, 'jpy', 'ja-JP', 1250],
    [1234, 'kwd', 'en-GB', 1.234],
    [99999999, 'usd', 'en-US', 999999.99],
  ])('formats %i %s in %s like Intl does for %d', (amount, currency, locale, major) => {
    const expected = new Intl.NumberFormat(locale, {
      style: 'currency',
      currency: currency.toUpperCase(),
    }).format(major);
    expect(formatMinorUnits(amount, currency, locale)).toBe(expected);
  });

  it('keeps every digit of amounts too large for a float cent', () => {
    // MAX_SAFE_INTEGER / 100 as a double formats as …409.90; the decimal string keeps .91.
    expect(minorUnitsToDecimalString(Number.MAX_SAFE_INTEGER, 'gbp')).toBe('90071992547409.91');
    expect(formatMinorUnits(Number.MAX_SAFE_INTEGER, 'gbp')).toBe('£90,071,992,547,409.91');
  });
});

describe('Luhn check (ISO/IEC 7812-1, annex B)', () => {
  it('accepts every documented test card and the textbook example 79927398713', () => {
    for (const card of TEST_CARDS) expect(passesLuhn(card.number)).toBe(true);
    expect(passesLuhn('79927398713')).toBe(true);
  });

  it('refuses a changed digit', () => {
    expect(passesLuhn('4242424242424241')).toBe(false);
    expect(passesLuhn('79927398710')).toBe(false);
    expect(passesLuhn('')).toBe(false);
  });
});

describe('form bodies (qs, depth 10, arrayLimit 1000)', () => {
  it('rebuilds bracketed keys into objects and arrays, values left as strings', () => {
    const parsed = parseForm(
      'mode=payment&line_items[0][quantity]=2&line_items[0][price_data][unit_amount]=1250' +
        '&line_items[0][price_data][product_data][name]=Caf%C3%A9%20tart&metadata[guests]=40&expand[0]=line_items',
    );
    expect(parsed).toEqual({
      mode: 'payment',
      line_items: [
        { quantity: '2', price_data: { unit_amount: '1250', product_data: { name: 'Café tart' } } },
      ],
      metadata: { guests: '40' },
      expand: ['line_items'],
    });
  });

  it('keeps a hundred line items as an array (qs turns indices past arrayLimit into keys)', () => {
    const body = Array.from({ length: 100 }, (_, i) => `line_items[${i}][quantity]=1`).join('&');
    const parsed = parseForm(body);
    expect(Array.isArray(parsed.line_items)).toBe(true);
    expect(parsed.line_items).toHaveLength(100);
  });

  it('does not let a body reach the object prototype', () => {
    const parsed = parseForm('__proto__[polluted]=yes&constructor[prototype][x]=1');
    expect(/** @type {any} */ ({}).polluted).toBeUndefined();
    expect(Object.prototype.hasOwnProperty.call(parsed, '__proto__')).toBe(false);
  });
});

describe('escapeHtml', () => {
  it('escapes the characters that can open a tag or leave an attribute', () => {
    expect(escapeHtml(`<a href="x" title='y'>&\``)).toBe(
      '&lt;a href=&quot;x&quot; title=&#39;y&#39;&gt;&amp;&#96;',
    );
    expect(escapeHtml(null)).toBe('');
    expect(escapeHtml(40)).toBe('40');
  });
});
