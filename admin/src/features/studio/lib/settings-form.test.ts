import { describe, expect, it } from 'vitest';
import {
  bpToPercentText,
  describePolicy,
  fieldOf,
  percentTextToBp,
  placeServerMessages,
  textToNumber,
} from './settings-form';

// A basis point is one hundredth of a per cent (the unit's definition): 2100 bp = 21 %.

describe('tax rate: per cent as typed ↔ basis points', () => {
  it('reads whole and decimal per cents exactly, with a point or a comma', () => {
    expect(percentTextToBp('21')).toEqual({ ok: true, bp: 2100 });
    expect(percentTextToBp('5.5')).toEqual({ ok: true, bp: 550 });
    expect(percentTextToBp('5,5')).toEqual({ ok: true, bp: 550 });
    expect(percentTextToBp('8.25 %')).toEqual({ ok: true, bp: 825 });
    expect(percentTextToBp('0')).toEqual({ ok: true, bp: 0 });
    expect(percentTextToBp('.5')).toEqual({ ok: true, bp: 50 });
    // 0.07 × 100 is 7.000000000000001 in binary floating point; digits never go through a float.
    expect(percentTextToBp('0.07')).toEqual({ ok: true, bp: 7 });
  });

  it('refuses what is not a per cent, and never rounds a third decimal', () => {
    expect(percentTextToBp('')).toMatchObject({ ok: false });
    expect(percentTextToBp('twenty')).toMatchObject({
      ok: false,
      message: 'Write the tax rate as a number, such as 21 or 5.5.',
    });
    expect(percentTextToBp('5.555')).toMatchObject({
      ok: false,
      message: 'Use at most two decimals for the tax rate (such as 5.55).',
    });
    // A negative rate reads as a number; the shared schema then says "0 % or more".
    expect(percentTextToBp('-1')).toEqual({ ok: true, bp: -100 });
  });

  it('writes basis points back without trailing zeros', () => {
    expect(bpToPercentText(2100)).toBe('21');
    expect(bpToPercentText(550)).toBe('5.5');
    expect(bpToPercentText(555)).toBe('5.55');
    expect(bpToPercentText(7)).toBe('0.07');
    expect(bpToPercentText(0)).toBe('0');
    expect(bpToPercentText(10_000)).toBe('100');
  });
});

describe('numbers as typed', () => {
  it('blank and text are NaN (the schema says "must be a number"); decimals stay decimals', () => {
    expect(textToNumber('30')).toBe(30);
    expect(textToNumber(' 12,5 ')).toBe(12.5);
    expect(textToNumber('')).toBeNaN();
    expect(textToNumber('3O')).toBeNaN();
  });
});

describe('where a message goes', () => {
  it('maps schema paths to the form’s fields', () => {
    expect(fieldOf(['taxRateBp'])).toBe('taxRatePercent');
    expect(fieldOf(['cancellationTiers'])).toBe('cancellationTiers');
    expect(fieldOf(['cancellationTiers', 2, 'refundPercent'])).toBe(
      'cancellationTiers.2.refundPercent',
    );
    expect(fieldOf(['blackoutDates', 3])).toBe('blackoutDates');
    expect(fieldOf(['workingHours'])).toBe('workingHours.end');
    expect(fieldOf(['workingHours', 'start'])).toBe('workingHours.start');
    expect(fieldOf(['sparePercent'])).toBe('sparePercent');
    expect(fieldOf([])).toBeNull();
    expect(fieldOf(['status'])).toBeNull();
  });

  it('places the API’s "path: message" lines, rewording basis points as per cents', () => {
    expect(
      placeServerMessages([
        'cancellationTiers[1].daysBefore: The number of days before the event must be a whole number.',
        'taxRateBp: The tax rate (in basis points, 2100 = 21 %) must be 0 or more.',
        'Unrecognized key: "status"',
        'status: something the form does not have',
      ]),
    ).toEqual([
      {
        field: 'cancellationTiers.1.daysBefore',
        message: 'The number of days before the event must be a whole number.',
      },
      { field: 'taxRatePercent', message: 'The tax rate must be 0 % or more.' },
      { field: null, message: 'Unrecognized key: "status"' },
      { field: null, message: 'status: something the form does not have' },
    ]);
  });
});

describe('the policy in words', () => {
  it('reads the tiers from the earliest cancellation to the latest, whatever their order', () => {
    expect(
      describePolicy([
        { daysBefore: 0, refundPercent: 0 },
        { daysBefore: 30, refundPercent: 100 },
        { daysBefore: 14, refundPercent: 50 },
      ]),
    ).toEqual([
      'Cancelled 30 days or more before the event: 100 % refunded.',
      'Cancelled 14 to 29 days before: 50 % refunded.',
      'Cancelled 0 to 13 days before: no refund.',
    ]);
    expect(describePolicy([{ daysBefore: 0, refundPercent: 50 }])).toEqual([
      'Cancelled any time before the event: 50 % refunded.',
    ]);
    expect(
      describePolicy([
        { daysBefore: 1, refundPercent: 20 },
        { daysBefore: 0, refundPercent: 0 },
      ]),
    ).toEqual([
      'Cancelled 1 day or more before the event: 20 % refunded.',
      'Cancelled on the day of the event: no refund.',
    ]);
    expect(describePolicy([{ daysBefore: Number.NaN, refundPercent: 10 }])).toEqual([]);
  });
});
