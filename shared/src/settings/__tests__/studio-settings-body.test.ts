import { describe, expect, it } from 'vitest';
import { studioSettingsBodySchema } from '../studio-settings-body.js';
import { DEFAULT_STUDIO_SETTINGS } from '../studio-settings.js';

/** The whole settings body the API takes and the chef's form sends (values invented). */
const body = {
  name: 'Atelier Ondine',
  tagline: 'Plated desserts, finished at your table',
  city: 'Ghent',
  ...DEFAULT_STUDIO_SETTINGS,
  workingHours: { start: '07:00', end: '19:00' },
  platingBufferMinutes: 60,
};

const messages = (patch: Record<string, unknown>) =>
  studioSettingsBodySchema
    .safeParse({ ...body, ...patch })
    .error?.issues.map((i) => `${i.path.join('.')}: ${i.message}`) ?? [];

describe('studio settings body', () => {
  it('takes a complete body, trimming the one-line texts', () => {
    const parsed = studioSettingsBodySchema.parse({ ...body, name: '  Atelier Ondine  ' });
    expect(parsed.name).toBe('Atelier Ondine');
    expect(parsed.blackoutDates).toEqual([]);
  });

  it('requires every field: no defaults fill a missing one on a PUT', () => {
    const { sparePercent: _s, ...withoutSpare } = body;
    expect(studioSettingsBodySchema.safeParse(withoutSpare).success).toBe(false);
    const { blackoutDates: _b, ...withoutDates } = body;
    expect(studioSettingsBodySchema.safeParse(withoutDates).success).toBe(false);
    const { guestDataRetentionDays: _g, ...withoutRetention } = body;
    expect(studioSettingsBodySchema.safeParse(withoutRetention).success).toBe(false);
  });

  it('keeps names on one line (a line break could reach an e-mail header)', () => {
    expect(messages({ name: 'Atelier\r\nBcc: x@example.test' })).toEqual([
      'name: The studio name must be on one line, without control characters.',
    ]);
    expect(messages({ name: '   ' })).toEqual([
      'name: The studio name needs at least 1 character.',
    ]);
    expect(messages({ tagline: '' })).toEqual([]);
  });

  it('compares working hours only once both are real times', () => {
    expect(messages({ workingHours: { start: '19:00', end: '07:00' } })).toEqual([
      'workingHours: Working hours must end after they start on the same day (for example 07:00–19:00).',
    ]);
    expect(messages({ workingHours: { start: '7am', end: '06:00' } })).toEqual([
      'workingHours.start: The opening time is a time written HH:MM, e.g. 07:00.',
    ]);
  });

  it('refuses fields it does not know', () => {
    expect(messages({ status: 'open' })).toHaveLength(1);
  });
});
