import { ServiceUnavailableException } from '@nestjs/common';
import { DEFAULT_STUDIO_SETTINGS } from '@nappe/shared';
import { describe, expect, it } from 'vitest';
import { bookingSettingsOf, bookingTermsOf } from './booking-settings.js';
import type { StudioSettings } from './entities/studio-settings.entity.js';

const row = (patch: Partial<StudioSettings> = {}): StudioSettings =>
  ({
    id: 1,
    name: 'Atelier Test',
    tagline: '',
    city: 'Ghent',
    updatedAt: new Date(),
    ...DEFAULT_STUDIO_SETTINGS,
    ...patch,
  }) as StudioSettings;

describe('bookingSettingsOf', () => {
  it('reads the row as the shared rules take it', () => {
    expect(bookingSettingsOf(row())).toEqual(DEFAULT_STUDIO_SETTINGS);
  });

  it('pauses bookings, naming the problem, when the policy is incomplete', () => {
    const broken = row({ cancellationTiers: [{ daysBefore: 30, refundPercent: 100 }] });
    expect(() => bookingSettingsOf(broken)).toThrow(ServiceUnavailableException);
    expect(() => bookingSettingsOf(broken)).toThrow(/0 days before the event/);
  });
});

describe('bookingTermsOf', () => {
  it('states tax, deposit, deadlines and retention in words from the settings', () => {
    const terms = bookingTermsOf({ row: row(), settings: DEFAULT_STUDIO_SETTINGS });
    expect(terms.terms.join('\n')).toMatch(/include tax at 21 %/);
    expect(terms.terms.join('\n')).toMatch(/deposit of 30 %.*due 14 days before/);
    expect(terms.terms.join('\n')).toMatch(/until 7 days before the event/);
    expect(terms.terms.join('\n')).toMatch(/deleted 30 days after the event/);
    const added = bookingTermsOf({
      row: row(),
      settings: { ...DEFAULT_STUDIO_SETTINGS, pricesIncludeTax: false, depositPercent: 100 },
    });
    expect(added.terms[0]).toMatch(/tax at 21 % is added/);
    expect(added.terms[1]).toBe('The whole total is paid when you book.');
  });
});
