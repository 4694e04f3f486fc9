import { describe, expect, it } from 'vitest';
import { minorToInput, parseMoneyToMinor } from './money-input';

// ISO 4217 minor units: EUR 2, JPY 0, KWD 3 (the ISO 4217 list; read here through Intl).
describe('parseMoneyToMinor', () => {
  it('reads a decimal string exactly, without floating point', () => {
    expect(parseMoneyToMinor('12.50', 'EUR')).toEqual({ ok: true, minor: 1250 });
    expect(parseMoneyToMinor('12,50', 'EUR')).toEqual({ ok: true, minor: 1250 });
    expect(parseMoneyToMinor('12', 'EUR')).toEqual({ ok: true, minor: 1200 });
    expect(parseMoneyToMinor('0.1', 'EUR')).toEqual({ ok: true, minor: 10 });
    // 1.005 × 100 is 100.49999999999999 in binary floating point; the string reading is exact.
    expect(parseMoneyToMinor('1.005', 'KWD')).toEqual({ ok: true, minor: 1005 });
    expect(1.005 * 100).not.toBe(100.5);
    expect(parseMoneyToMinor('1 250.00', 'EUR')).toEqual({ ok: true, minor: 125000 });
    expect(parseMoneyToMinor('1.250,75', 'EUR')).toEqual({ ok: true, minor: 125075 });
    expect(parseMoneyToMinor('1,250.75', 'EUR')).toEqual({ ok: true, minor: 125075 });
    expect(parseMoneyToMinor('1500', 'JPY')).toEqual({ ok: true, minor: 1500 });
  });

  it('refuses what is not a price, in words a chef can act on', () => {
    expect(parseMoneyToMinor('12.505', 'EUR')).toEqual({
      ok: false,
      message: 'Use at most 2 decimals (EUR cents).',
    });
    expect(parseMoneyToMinor('15.5', 'JPY')).toEqual({
      ok: false,
      message: 'JPY has no smaller unit: write a whole amount.',
    });
    expect(parseMoneyToMinor('-3', 'EUR')).toMatchObject({ ok: false });
    expect(parseMoneyToMinor('twelve', 'EUR')).toMatchObject({ ok: false });
    expect(parseMoneyToMinor('', 'EUR')).toEqual({ ok: false, message: 'Enter a price.' });
    expect(parseMoneyToMinor('99999999999999999', 'EUR')).toEqual({
      ok: false,
      message: 'That price is too large.',
    });
  });

  it('shows minor units back in major units', () => {
    expect(minorToInput(1250, 'EUR')).toBe('12.50');
    expect(minorToInput(5, 'EUR')).toBe('0.05');
    expect(minorToInput(null, 'EUR')).toBe('');
  });
});
