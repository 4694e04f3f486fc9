import { addIsoDays } from '@nappe/shared';
import type { PrepEvent } from './prep-api';

/**
 * Invented events over the shared demo catalogue. The first is the hand-worked case of
 * shared/src/prep-plan/__tests__/prep-plan.test.ts: Garden Supper (one Pistachio Frost per
 * guest) for 20 guests with 10 % spare → ceil(20 × 1.1) = 22 plates; Table 2, seat 3 has no
 * almond crumble, Table 4, seat 1 has crème fraîche cream instead of the vanilla ice cream.
 */
export const ENGAGEMENT: PrepEvent = {
  id: 'ord-engagement',
  reference: 'N-2026-0101',
  clientName: 'Lotte Vermeulen',
  eventDate: '2026-03-24',
  serviceTime: '19:30',
  menuId: 'menu-garden-supper',
  guestCount: 20,
  guestChanges: [
    {
      guest: 'Table 2, seat 3',
      dessertId: 'des-pistachio-frost',
      changes: [{ componentRecipeId: 'rec-almond-crumble' }],
    },
    {
      guest: 'Table 4, seat 1',
      dessertId: 'des-pistachio-frost',
      changes: [
        { componentRecipeId: 'rec-vanilla-base', replacementRecipeId: 'rec-creme-fraiche-cream' },
      ],
    },
  ],
};

/** A later event outside the first week's range. */
export const BOARD_DINNER: PrepEvent = {
  id: 'ord-board',
  reference: 'N-2026-0102',
  clientName: 'Ambroos Claes',
  eventDate: '2026-04-02',
  serviceTime: '20:00',
  menuId: 'menu-celebration-trio',
  guestCount: 24,
};

/** Events placed from `today`, for the Today screen (which always opens on the real day). */
export function eventsFrom(today: string): { tonight: PrepEvent; later: PrepEvent } {
  return {
    tonight: {
      ...ENGAGEMENT,
      id: 'ord-tonight',
      reference: 'N-2026-0201',
      clientName: 'Noor Haddad',
      eventDate: today,
    },
    later: {
      ...BOARD_DINNER,
      id: 'ord-later',
      reference: 'N-2026-0202',
      clientName: 'Ambroos Claes',
      eventDate: addIsoDays(today, 3),
    },
  };
}
