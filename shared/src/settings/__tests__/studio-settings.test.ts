import { describe, expect, it } from 'vitest';
import {
  DEFAULT_STUDIO_SETTINGS,
  cancellationPolicyProblems,
  isCurrencyCode,
  studioSettingsSchema,
  type StudioSettingsInput,
} from '../studio-settings.js';

const base: StudioSettingsInput = { ...DEFAULT_STUDIO_SETTINGS };
const messages = (over: Partial<StudioSettingsInput>) =>
  studioSettingsSchema.safeParse({ ...base, ...over }).error?.issues.map((i) => i.message) ?? [];

describe('studio settings', () => {
  it('the defaults are valid and keep guest data 30 days', () => {
    expect(studioSettingsSchema.parse(base)).toEqual(DEFAULT_STUDIO_SETTINGS);
    const { guestDataRetentionDays: _, ...withoutRetention } = base;
    expect(studioSettingsSchema.parse(withoutRetention).guestDataRetentionDays).toBe(30);
    // Deposits of 25–50 % are usual (REFERENCES.md: common practice, no source).
    expect(DEFAULT_STUDIO_SETTINGS.depositPercent).toBeGreaterThanOrEqual(25);
    expect(DEFAULT_STUDIO_SETTINGS.depositPercent).toBeLessThanOrEqual(50);
  });

  it('currency: ISO 4217 alphabetic codes only', () => {
    for (const c of ['EUR', 'GBP', 'JPY', 'KWD', 'CHF', 'USD'])
      expect(isCurrencyCode(c)).toBe(true);
    for (const c of ['eur', 'EURO', '€', 'XYZ', '']) expect(isCurrencyCode(c)).toBe(false);
    expect(messages({ currency: 'EURO' })).toEqual([
      'Use a three-letter ISO 4217 currency code in capitals, such as EUR, GBP or JPY.',
    ]);
  });

  it('time zone: IANA names only', () => {
    expect(messages({ timeZone: 'Asia/Tokyo' })).toEqual([]);
    expect(messages({ timeZone: 'CET+1' })).toHaveLength(1);
    expect(messages({ timeZone: 'Europe/Gent' })).toEqual([
      'Use a time-zone name such as Europe/Brussels or America/New_York.',
    ]);
  });

  it('numbers have ranges and say which', () => {
    expect(messages({ taxRateBp: 21.5 })).toEqual([
      'The tax rate (in basis points, 2100 = 21 %) must be a whole number.',
    ]);
    expect(messages({ depositPercent: 0 })).toEqual(['The deposit must be 1 % or more.']);
    expect(messages({ depositPercent: 101 })).toEqual(['The deposit must be 100 % or less.']);
    expect(messages({ dailyPlateCapacity: 0 })).toEqual([
      'The daily plate capacity must be 1 or more.',
    ]);
    expect(messages({ sparePercent: -1 })).toHaveLength(1);
  });

  it('closed days are real dates, listed once', () => {
    expect(messages({ blackoutDates: ['2026-12-25', '2027-01-01'] })).toEqual([]);
    expect(messages({ blackoutDates: ['2026-02-30'] })).toEqual([
      'Write each closed day as a real date like 2026-12-25.',
    ]);
    expect(messages({ blackoutDates: ['2026-12-25', '2026-12-25'] })).toEqual([
      'A closed day is listed twice.',
    ]);
  });
});

describe('cancellation tiers must make sense', () => {
  it('the example policy is coherent, in any order', () => {
    expect(cancellationPolicyProblems(DEFAULT_STUDIO_SETTINGS.cancellationTiers)).toEqual([]);
    expect(
      cancellationPolicyProblems([
        { daysBefore: 0, refundPercent: 0 },
        { daysBefore: 30, refundPercent: 100 },
        { daysBefore: 14, refundPercent: 50 },
      ]),
    ).toEqual([]);
  });

  it('says what is wrong in plain words', () => {
    expect(messages({ cancellationTiers: [{ daysBefore: 30, refundPercent: 100 }] })).toEqual([
      'Add a last tier that starts 0 days before the event, so a cancellation on any date up to the event has a rule.',
    ]);
    expect(
      messages({
        cancellationTiers: [
          { daysBefore: 30, refundPercent: 50 },
          { daysBefore: 14, refundPercent: 80 },
          { daysBefore: 0, refundPercent: 0 },
        ],
      }),
    ).toEqual([
      'Cancelling earlier must never refund less: from 30 days before, the refund is 50 %, but from 14 days before it is 80 %.',
    ]);
    expect(
      messages({
        cancellationTiers: [
          { daysBefore: 14, refundPercent: 50 },
          { daysBefore: 14, refundPercent: 50 },
          { daysBefore: 0, refundPercent: 0 },
        ],
      }),
    ).toEqual([
      'Two tiers both start 14 days before the event. Give each tier its own number of days.',
    ]);
    expect(messages({ cancellationTiers: [] })).toEqual(['Add at least one cancellation tier.']);
    expect(messages({ cancellationTiers: [{ daysBefore: 0, refundPercent: 120 }] })).toEqual([
      'The refund must be 100 % or less.',
    ]);
  });
});
