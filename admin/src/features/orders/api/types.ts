import type { AllergyNotes, OrderDetail, UnresolvedConflict } from '@nappe/shared';

/** Response shapes the Orders screens read that are not in @nappe/shared. */

/** What the order's detail reads of `GET /api/orders/:id/allergy-notes` (the shared contract). */
export type AllergySummary = Pick<AllergyNotes, 'orderId' | 'advisoryCount'> & {
  guests: Array<Pick<AllergyNotes['guests'][number], 'guestId' | 'label'>>;
  /** Guest plates that still conflict with the guest's requirement. */
  unresolved: Array<Pick<UnresolvedConflict, 'guestId' | 'guest' | 'dessertName' | 'messages'>>;
};

/** `GET /api/orders/:id/access-log`: one opening of the guests' health details by the studio. */
export type { AccessLogEntry } from '@nappe/shared';

/** The parts of `GET /api/studio/settings` the Calendar shows. */
export interface CalendarSettings {
  dailyPlateCapacity: number;
  blackoutDates: string[];
  timeZone: string;
}

/**
 * Present on an order whose guests' details were removed (the studio's retention period after
 * the event, or the client deleted their account): the guest list is then empty and the allergy
 * notes answer 410 (api/src/privacy/guest-retention.ts).
 */
export interface GuestDetailsRemoved {
  removed: true;
  reason: string;
  removedFrom: string;
  message: string;
}

export type OrderDetailView = OrderDetail & { guestDetailsRemoved?: GuestDetailsRemoved | null };
