import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InvalidBookingInputError } from '../../orders/booking-errors.js';
import {
  formatMoney,
  formatRateBp,
  minorToDecimalString,
  minorUnitDigits,
  mulDivHalfUp,
  percentOf,
  taxAdded,
  taxIncluded,
} from '../money.js';

describe('minor-unit digits per currency', () => {
  it('matches the ISO 4217 list (minor unit column)', () => {
    // ISO 4217, List One (SIX, maintenance agency): JPY 0, KRW 0, EUR 2, GBP 2, USD 2,
    // KWD 3, BHD 3, TND 3.
    expect(minorUnitDigits('JPY')).toBe(0);
    expect(minorUnitDigits('KRW')).toBe(0);
    expect(minorUnitDigits('EUR')).toBe(2);
    expect(minorUnitDigits('GBP')).toBe(2);
    expect(minorUnitDigits('USD')).toBe(2);
    expect(minorUnitDigits('KWD')).toBe(3);
    expect(minorUnitDigits('BHD')).toBe(3);
    expect(minorUnitDigits('TND')).toBe(3);
  });

  it('an unknown code is a readable error', () => {
    expect(() => minorUnitDigits('EURO')).toThrowError(InvalidBookingInputError);
    expect(() => minorUnitDigits('EURO')).toThrowError(/ISO 4217 code/);
  });
});

describe('amounts as text', () => {
  it('places the decimal point by the currency’s minor unit', () => {
    expect(minorToDecimalString(12345, 'EUR')).toBe('123.45');
    expect(minorToDecimalString(12345, 'JPY')).toBe('12345');
    expect(minorToDecimalString(12345, 'KWD')).toBe('12.345');
    expect(minorToDecimalString(5, 'EUR')).toBe('0.05');
    expect(minorToDecimalString(5, 'KWD')).toBe('0.005');
    expect(minorToDecimalString(0, 'EUR')).toBe('0.00');
    expect(minorToDecimalString(-250, 'EUR')).toBe('-2.50');
  });

  it('is exact where a float division would not be', () => {
    // 2^53 − 1 cents: dividing by 100 as a float gives 90071992547409.92.
    expect(minorToDecimalString(Number.MAX_SAFE_INTEGER, 'EUR')).toBe('90071992547409.91');
    expect(formatMoney(Number.MAX_SAFE_INTEGER, 'EUR')).toBe('€90,071,992,547,409.91');
  });

  it('formats for people with the currency’s own digits', () => {
    expect(formatMoney(12345, 'EUR')).toBe('€123.45');
    expect(formatMoney(12000, 'GBP')).toBe('£120.00');
    expect(formatMoney(12345, 'JPY')).toMatch(/¥12,345$/);
    expect(formatMoney(12345, 'KWD')).toMatch(/12\.345$/);
    expect(formatMoney(12345, 'EUR', 'fr-BE')).toMatch(/^123,45\s€$/);
  });

  it('round-trips: every integer amount reads back as the same number of minor units', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: -1e12, max: 1e12 }),
        fc.constantFrom('EUR', 'JPY', 'KWD'),
        (minor, currency) => {
          const text = minorToDecimalString(minor, currency);
          const digits = minorUnitDigits(currency);
          expect(BigInt(text.replace('.', ''))).toBe(BigInt(minor));
          expect(text.split('.')[1]?.length ?? 0).toBe(digits);
        },
      ),
    );
  });

  it('rates in basis points', () => {
    expect(formatRateBp(2100)).toBe('21 %');
    expect(formatRateBp(550)).toBe('5.5 %');
    expect(formatRateBp(887)).toBe('8.87 %');
    expect(formatRateBp(0)).toBe('0 %');
  });
});

describe('the one rounding rule: exact fraction, rounded once, half up', () => {
  it('rounds halves up, everything else to the nearer unit', () => {
    expect(mulDivHalfUp(1, 1, 2)).toBe(1); // 0.5 → 1 (banker's would give 0)
    expect(mulDivHalfUp(5, 1, 2)).toBe(3); // 2.5 → 3 (banker's would give 2)
    expect(mulDivHalfUp(3, 1, 2)).toBe(2); // 1.5 → 2
    expect(mulDivHalfUp(1, 1, 3)).toBe(0); // 0.333…
    expect(mulDivHalfUp(2, 1, 3)).toBe(1); // 0.666…
    expect(percentOf(11401, 50)).toBe(5701); // 5700.5 → 5701
  });

  it('agrees with Math.round where floats are exact enough to serve as an oracle', () => {
    // For operands ≤ 10^6 the distance between a×b/c and a half is ≥ 1/(2c) ≫ float error.
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 1_000_000 }),
        fc.integer({ min: 0, max: 1_000_000 }),
        fc.integer({ min: 1, max: 1_000_000 }),
        (a, b, c) => {
          expect(mulDivHalfUp(a, b, c)).toBe(Math.round((a * b) / c));
        },
      ),
    );
  });

  it('satisfies the definition of half-up rounding on large operands (checked in BigInt)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: Number.MAX_SAFE_INTEGER }),
        fc.integer({ min: 0, max: 1_000_000 }),
        fc.integer({ min: 1, max: Number.MAX_SAFE_INTEGER }),
        (a, b, c) => {
          const n = BigInt(a) * BigInt(b);
          const q = n / BigInt(c) + 1n; // well above any possible result
          if (q > BigInt(Number.MAX_SAFE_INTEGER)) return; // the function refuses these
          const r = BigInt(mulDivHalfUp(a, b, c));
          const twiceError = 2n * (r * BigInt(c) - n); // 2(r − exact)·c
          expect(twiceError <= BigInt(c)).toBe(true);
          expect(twiceError > -BigInt(c)).toBe(true); // exact half goes up, never down
        },
      ),
    );
  });

  it('refuses fractional or negative money', () => {
    expect(() => mulDivHalfUp(10.5, 1, 1)).toThrowError(InvalidBookingInputError);
    expect(() => mulDivHalfUp(-1, 1, 1)).toThrowError(InvalidBookingInputError);
    expect(() => mulDivHalfUp(1, 1, 0)).toThrowError(InvalidBookingInputError);
  });
});

describe('tax, against published definitions and examples', () => {
  it('tax included: HMRC’s “VAT fraction” — 1/6 at 20 %, so £120.00 including VAT holds £20.00', () => {
    // HMRC VAT Notice 700: VAT fraction = rate ÷ (100 + rate); 20/120 = 1/6.
    expect(taxIncluded(12000, 2000)).toBe(2000);
    // 5 % reduced rate: 5/105 = 1/21, so £105.00 including VAT holds £5.00.
    expect(taxIncluded(10500, 500)).toBe(500);
  });

  it('tax added: the taxable amount excludes the tax, so tax = net × rate', () => {
    // Directive 2006/112/EC, Art. 73 (taxable amount = the consideration) and Art. 78 (the VAT
    // itself is not part of it): €100.00 net at 21 % → €21.00 VAT, €121.00 to pay.
    expect(taxAdded(10000, 2100)).toBe(2100);
    // …and the same €121.00 read as a price including VAT holds the same €21.00.
    expect(taxIncluded(12100, 2100)).toBe(2100);
    // HMRC VAT Notice 700, standard rate 20 %: £250.00 net → £50.00 VAT.
    expect(taxAdded(25000, 2000)).toBe(5000);
  });

  it('rounds the tax once, half up', () => {
    // €9.99 including 21 %: 999 × 21/121 = 173.38… → 173.
    expect(taxIncluded(999, 2100)).toBe(173);
    // 5 cents net at 10 %: 0.5 cent → 1 cent.
    expect(taxAdded(5, 1000)).toBe(1);
    // ¥1,100 including Japan's 10 % consumption tax (rate from memory): ¥100, no minor unit.
    expect(taxIncluded(1100, 1000)).toBe(100);
  });

  it('inclusive and added tax agree when converted', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 1e11 }),
        fc.integer({ min: 0, max: 10_000 }),
        (net, rateBp) => {
          // Add tax to a net amount, then read the gross as tax-inclusive: the same tax, exactly
          // (the exact inclusive tax differs from the added one by less than half a unit).
          const tax = taxAdded(net, rateBp);
          expect(taxIncluded(net + tax, rateBp)).toBe(tax);
          // The other way round the net is rounded first, so re-adding may differ by one unit.
          const gross = net;
          const incl = taxIncluded(gross, rateBp);
          expect(
            Math.abs(gross - incl + taxAdded(gross - incl, rateBp) - gross),
          ).toBeLessThanOrEqual(1);
        },
      ),
    );
  });
});
