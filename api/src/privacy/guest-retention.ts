import { HttpException, HttpStatus } from '@nestjs/common';
import {
  addIsoDays,
  compareIsoDates,
  dateInTimeZone,
  formatIsoDate,
  type GuestPlateChange,
  type IsoDate,
} from '@nappe/shared';
import type { EntityManager } from 'typeorm';
import type { OrderEntity } from '../orders/entities/order.entity.js';
import {
  OrderGuestSummaryEntity,
  type GuestDetailsRemovalReason,
} from './entities/order-guest-summary.entity.js';

/**
 * When an event's guest details (names, tables, allergens, diets, notes, the per-guest plate
 * changes) stop being available: they are held through the event date plus the studio's
 * retention days, and removed from the day after. With the default 30 days, an event on
 * 2026-06-20 keeps them through 2026-07-20; from 2026-07-21 they are gone for everyone — the
 * client, the chef and the staff — whether or not the scheduled purge has run yet.
 */
export function guestDetailsHeldUntil(eventDate: IsoDate, retentionDays: number): IsoDate {
  return addIsoDays(eventDate, retentionDays);
}

export function guestDetailsExpired(
  eventDate: IsoDate,
  retentionDays: number,
  today: IsoDate,
): boolean {
  return compareIsoDates(today, guestDetailsHeldUntil(eventDate, retentionDays)) > 0;
}

/**
 * The "guest details removed" state an order's detail carries (`guestDetailsRemoved`) and the
 * 410 body of the allergy notes, briefing and substitutions carries (`guestDetails`).
 */
export interface GuestDetailsRemoved {
  removed: true;
  reason: GuestDetailsRemovalReason;
  /** The studio's retention setting (days after the event). */
  retentionDays: number;
  /** The first day without guest details (retention), or the day they were erased. */
  removedFrom: IsoDate;
  message: string;
}

function removedMessage(
  reason: GuestDetailsRemovalReason,
  retentionDays: number,
  removedFrom: IsoDate,
): string {
  if (reason === 'account_deleted') {
    return 'The guest details of this event were erased when the client deleted their account. The number of guests and anonymous counts per allergen and diet are kept for planning.';
  }
  return `Guest details removed after ${retentionDays} day${retentionDays === 1 ? '' : 's'}: the studio keeps guests’ allergies and diets until ${retentionDays} day${retentionDays === 1 ? '' : 's'} after the event, so they were removed on ${formatIsoDate(removedFrom)}. The number of guests and anonymous counts per allergen and diet are kept for planning.`;
}

/**
 * Null while the order's guest details are held; otherwise why and since when they are gone.
 * Removed means: the purge (or an account deletion) has removed them, or the retention date has
 * passed and the purge simply has not run yet.
 */
export async function guestDetailsState(
  m: EntityManager,
  order: Pick<OrderEntity, 'id' | 'eventDate'>,
  retentionDays: number,
  today: IsoDate,
  timeZone: string,
): Promise<GuestDetailsRemoved | null> {
  const kept = await m.findOneBy(OrderGuestSummaryEntity, { orderId: order.id });
  if (kept) {
    const days = kept.retentionDays ?? retentionDays;
    const from =
      kept.reason === 'account_deleted'
        ? dateInTimeZone(kept.removedAt, timeZone)
        : addIsoDays(guestDetailsHeldUntil(order.eventDate, days), 1);
    return {
      removed: true,
      reason: kept.reason,
      retentionDays: days,
      removedFrom: from,
      message: removedMessage(kept.reason, days, from),
    };
  }
  if (!guestDetailsExpired(order.eventDate, retentionDays, today)) return null;
  const from = addIsoDays(guestDetailsHeldUntil(order.eventDate, retentionDays), 1);
  return {
    removed: true,
    reason: 'retention',
    retentionDays,
    removedFrom: from,
    message: removedMessage('retention', retentionDays, from),
  };
}

/**
 * 410 Gone: the guest details asked for were removed under the retention setting or with the
 * client's account. The body says why, in words, and carries the state for the apps.
 */
export class GuestDetailsGoneException extends HttpException {
  constructor(state: GuestDetailsRemoved) {
    super(
      { statusCode: HttpStatus.GONE, error: 'Gone', message: state.message, guestDetails: state },
      HttpStatus.GONE,
    );
  }
}

/** Throws 410 unless the order's guest details are still held. */
export async function assertGuestDetailsHeld(
  m: EntityManager,
  order: Pick<OrderEntity, 'id' | 'eventDate'>,
  retentionDays: number,
  today: IsoDate,
  timeZone: string,
): Promise<void> {
  const state = await guestDetailsState(m, order, retentionDays, today, timeZone);
  if (state) throw new GuestDetailsGoneException(state);
}

/**
 * The kept plate changes as the prep plan reads them: one anonymous entry per changed plate
 * ("Kept plate 3"), so a plan over past dates counts the same recipes after the purge as before.
 */
export function keptPlateChanges(
  summary: Pick<OrderGuestSummaryEntity, 'plateChanges'> | null | undefined,
): GuestPlateChange[] {
  if (!summary) return [];
  const out: GuestPlateChange[] = [];
  let n = 0;
  for (const group of summary.plateChanges) {
    for (let i = 0; i < group.plates; i += 1) {
      n += 1;
      out.push({ guest: `Kept plate ${n}`, dessertId: group.dessertId, changes: group.changes });
    }
  }
  return out;
}

/** The OpenAPI description of the 410 every guest-details route answers once they are removed. */
export const GUEST_DETAILS_GONE = {
  description:
    'Guest details removed: the event is more than the studio’s `guestDataRetentionDays` in the past (default 30), or the client deleted their account. Body: `{ statusCode: 410, error: "Gone", message: "Guest details removed after 30 days: …", guestDetails: { removed: true, reason: "retention" | "account_deleted", retentionDays, removedFrom, message } }`. The order detail (`GET /orders/:id`) then answers 200 with an empty `guests` list and the same object as `guestDetailsRemoved`.',
  schema: {
    type: 'object',
    properties: {
      statusCode: { type: 'number', example: 410 },
      error: { type: 'string', example: 'Gone' },
      message: { type: 'string' },
      guestDetails: {
        type: 'object',
        properties: {
          removed: { type: 'boolean', example: true },
          reason: { type: 'string', enum: ['retention', 'account_deleted'] },
          retentionDays: { type: 'number', example: 30 },
          removedFrom: { type: 'string', example: '2026-07-21' },
          message: { type: 'string' },
        },
      },
    },
  },
};
