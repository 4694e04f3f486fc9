import { describe, expect, it } from 'vitest';
import type { OrderSubstitutionEntity } from '../allergy-notes/entities/order-substitution.entity.js';
import type { OrderGuestEntity } from '../orders/entities/order-guest.entity.js';
import { anonymousCounts } from './guest-purge.js';
import { guestDetailsExpired, guestDetailsHeldUntil, keptPlateChanges } from './guest-retention.js';

/** The same calendar sum by the ECMAScript Date in UTC: an independent reference for the dates. */
function plusDaysByDate(date: string, days: number): string {
  const at = new Date(`${date}T00:00:00Z`);
  at.setUTCDate(at.getUTCDate() + days);
  return at.toISOString().slice(0, 10);
}

describe('guest details are held through the event date + the retention days (DESIGN.md)', () => {
  it('counts calendar days across month ends, the year end and 29 February', () => {
    // June has 30 days and 2028 is a leap year (Gregorian calendar, ISO 8601).
    const cases: Array<[string, number, string]> = [
      ['2026-06-20', 30, '2026-07-20'],
      ['2026-12-15', 30, '2027-01-14'],
      ['2028-02-15', 30, '2028-03-16'],
      ['2027-02-15', 30, '2027-03-17'],
      ['2026-06-20', 0, '2026-06-20'],
      ['2026-01-31', 3650, plusDaysByDate('2026-01-31', 3650)],
    ];
    for (const [event, days, last] of cases) {
      expect(guestDetailsHeldUntil(event, days), `${event} + ${days}`).toBe(last);
      expect(last).toBe(plusDaysByDate(event, days));
    }
  });

  it('removes them from the day after the last day, never on it', () => {
    expect(guestDetailsExpired('2026-06-20', 30, '2026-07-20')).toBe(false);
    expect(guestDetailsExpired('2026-06-20', 30, '2026-07-21')).toBe(true);
    // 0 days: kept through the event day itself, so staff still have the briefing at service.
    expect(guestDetailsExpired('2026-06-20', 0, '2026-06-20')).toBe(false);
    expect(guestDetailsExpired('2026-06-20', 0, '2026-06-21')).toBe(true);
    // Upcoming events are never expired.
    expect(guestDetailsExpired('2026-06-20', 30, '2026-03-06')).toBe(false);
  });
});

const guest = (position: number, patch: Partial<OrderGuestEntity>): OrderGuestEntity => ({
  orderId: 'o1',
  position,
  label: `Guest ${position + 1}`,
  tableLabel: null,
  allergens: [],
  diets: [],
  notes: null,
  ...patch,
});

const sub = (patch: Partial<OrderSubstitutionEntity>): OrderSubstitutionEntity => ({
  id: `s-${Math.random()}`,
  orderId: 'o1',
  guestPosition: 0,
  guestLabel: 'Guest 1',
  dessertId: 'd1',
  changes: [{ componentRecipeId: 'crumble', replacementRecipeId: 'oat' }],
  note: null,
  recordedBy: null,
  recordedAt: new Date(0),
  ...patch,
});

describe('the anonymous counts kept when guest details go', () => {
  it('counts guests per allergen group and diet, once per guest, and keeps no name or note', () => {
    const counts = anonymousCounts(
      [
        guest(0, { label: 'Ines', allergens: ['nuts', 'nuts', 'gluten'], notes: 'Epi-pen' }),
        guest(1, { label: 'Tomas', allergens: ['nuts'], diets: ['vegan'] }),
        guest(2, { label: 'Wim', diets: ['vegan', 'no_alcohol'], notes: '   ' }),
      ],
      [],
    );
    expect(counts).toEqual({
      guestsListed: 3,
      guestsWithNotes: 1,
      allergenCounts: { nuts: 2, gluten: 1 },
      dietCounts: { vegan: 2, no_alcohol: 1 },
      plateChanges: [],
    });
    expect(JSON.stringify(counts)).not.toMatch(/Ines|Tomas|Wim|Epi/);
  });

  it('groups changed plates by dessert and change, ignoring a substitution whose guest was replaced', () => {
    const guests = [guest(0, { label: 'A' }), guest(1, { label: 'B' }), guest(2, { label: 'C' })];
    const counts = anonymousCounts(guests, [
      sub({ guestPosition: 0, guestLabel: 'A' }),
      sub({ guestPosition: 1, guestLabel: 'B' }),
      sub({ guestPosition: 2, guestLabel: 'C', changes: [{ componentRecipeId: 'crumble' }] }),
      // Recorded for an earlier guest 2 ("Old C"): the prep plan ignores it, so do the counts.
      sub({ guestPosition: 2, guestLabel: 'Old C', dessertId: 'd2' }),
      // A note alone changes nothing on the plate.
      sub({ guestPosition: 1, guestLabel: 'B', dessertId: 'd2', changes: [], note: 'warm plate' }),
    ]);
    expect(counts.plateChanges).toEqual([
      {
        dessertId: 'd1',
        changes: [{ componentRecipeId: 'crumble', replacementRecipeId: 'oat' }],
        plates: 2,
      },
      { dessertId: 'd1', changes: [{ componentRecipeId: 'crumble' }], plates: 1 },
    ]);
    // Read back by the prep plan: one anonymous changed plate per counted plate.
    const back = keptPlateChanges(counts);
    expect(back.map((c) => c.guest)).toEqual(['Kept plate 1', 'Kept plate 2', 'Kept plate 3']);
    expect(back.filter((c) => c.changes[0]!.replacementRecipeId === 'oat')).toHaveLength(2);
    expect(keptPlateChanges(null)).toEqual([]);
  });
});
