import type { EntityManager } from 'typeorm';
import { OrderSubstitutionEntity } from '../allergy-notes/entities/order-substitution.entity.js';
import { OrderEventEntity } from '../orders/entities/order-event.entity.js';
import { OrderGuestEntity } from '../orders/entities/order-guest.entity.js';
import {
  OrderGuestSummaryEntity,
  type GuestDetailsRemovalReason,
  type KeptPlateChange,
} from './entities/order-guest-summary.entity.js';

/** What removing one order's guest details took away: numbers only. */
export interface OrderGuestPurge {
  orderId: string;
  reference: string;
  guestsRemoved: number;
  substitutionsRemoved: number;
  /** Audit lines that named a guest or held a substitution note, rewritten without them. */
  auditLinesRedacted: number;
}

/** Audit lines written by the allergy notes that name a guest ("Substitution for <guest>, …"). */
const NAMING_GUEST = [
  { like: 'Substitution for %', redacted: 'Guest substitution recorded (guest details removed)' },
  {
    like: 'Substitution removed for %',
    redacted: 'Guest substitution removed (guest details removed)',
  },
] as const;

function bump(counts: Record<string, number>, key: string): void {
  counts[key] = (counts[key] ?? 0) + 1;
}

function merge(a: Record<string, number>, b: Record<string, number>): Record<string, number> {
  const out = { ...a };
  for (const [k, v] of Object.entries(b)) out[k] = (out[k] ?? 0) + v;
  return out;
}

/**
 * The anonymous counts of an order's guests: per allergen group, per diet, and the changed
 * plates grouped by dessert and change (a substitution counts only while it belongs to a guest
 * still listed — same position and label — exactly as the prep plan reads it).
 */
export function anonymousCounts(
  guests: readonly OrderGuestEntity[],
  subs: readonly OrderSubstitutionEntity[],
): Pick<
  OrderGuestSummaryEntity,
  'guestsListed' | 'guestsWithNotes' | 'allergenCounts' | 'dietCounts' | 'plateChanges'
> {
  const allergenCounts: Record<string, number> = {};
  const dietCounts: Record<string, number> = {};
  let guestsWithNotes = 0;
  for (const g of guests) {
    for (const a of new Set(g.allergens)) bump(allergenCounts, a);
    for (const d of new Set(g.diets)) bump(dietCounts, d);
    if (g.notes?.trim()) guestsWithNotes += 1;
  }
  const groups = new Map<string, KeptPlateChange>();
  for (const sub of subs) {
    if (sub.changes.length === 0) continue;
    const owner = guests.find(
      (g) => g.position === sub.guestPosition && g.label === sub.guestLabel,
    );
    if (!owner) continue;
    const key = JSON.stringify([
      sub.dessertId,
      sub.changes.map((c) => [c.componentRecipeId, c.replacementRecipeId ?? null]),
    ]);
    const group = groups.get(key) ?? { dessertId: sub.dessertId, changes: sub.changes, plates: 0 };
    group.plates += 1;
    groups.set(key, group);
  }
  return {
    guestsListed: guests.length,
    guestsWithNotes,
    allergenCounts,
    dietCounts,
    plateChanges: [...groups.values()],
  };
}

/**
 * Removes one order's guest details in the caller's transaction: the guest rows (names, tables,
 * allergens, diets, notes), the chef's per-guest substitutions, and the guest's name and note in
 * the audit lines the substitutions wrote — after adding their anonymous counts to the order's
 * kept summary. Returns null when there was nothing left to remove (so a second run removes
 * nothing). The caller writes the order's audit line.
 */
export async function purgeGuestDetails(
  m: EntityManager,
  order: { id: string; reference: string },
  reason: GuestDetailsRemovalReason,
  retentionDays: number | null,
  now: Date,
): Promise<OrderGuestPurge | null> {
  const guests = await m.find(OrderGuestEntity, { where: { orderId: order.id } });
  const subs = await m.find(OrderSubstitutionEntity, { where: { orderId: order.id } });
  const naming = await guestNamingEvents(m, order.id);
  if (guests.length === 0 && subs.length === 0 && naming.length === 0) return null;

  const counts = anonymousCounts(guests, subs);
  const existing = await m.findOneBy(OrderGuestSummaryEntity, { orderId: order.id });
  if (existing) {
    await m.update(
      OrderGuestSummaryEntity,
      { orderId: order.id },
      {
        guestsListed: existing.guestsListed + counts.guestsListed,
        guestsWithNotes: existing.guestsWithNotes + counts.guestsWithNotes,
        allergenCounts: merge(existing.allergenCounts, counts.allergenCounts),
        dietCounts: merge(existing.dietCounts, counts.dietCounts),
        plateChanges: [...existing.plateChanges, ...counts.plateChanges],
      },
    );
  } else {
    await m.insert(OrderGuestSummaryEntity, {
      orderId: order.id,
      ...counts,
      reason,
      retentionDays,
      removedAt: now,
    });
  }
  if (subs.length > 0) await m.delete(OrderSubstitutionEntity, { orderId: order.id });
  if (guests.length > 0) await m.delete(OrderGuestEntity, { orderId: order.id });
  for (const event of naming) {
    const rule = NAMING_GUEST.find((r) => event.summary.startsWith(r.like.slice(0, -1)))!;
    await m.update(OrderEventEntity, { id: event.id }, { summary: rule.redacted, reason: null });
  }
  return {
    orderId: order.id,
    reference: order.reference,
    guestsRemoved: guests.length,
    substitutionsRemoved: subs.length,
    auditLinesRedacted: naming.length,
  };
}

/** The order's audit lines that still name a guest (the redacted ones no longer match). */
export async function guestNamingEvents(
  m: EntityManager,
  orderId: string,
): Promise<OrderEventEntity[]> {
  const qb = m.createQueryBuilder(OrderEventEntity, 'e').where('e.orderId = :orderId', { orderId });
  qb.andWhere(
    `(${NAMING_GUEST.map((_, i) => `e.summary LIKE :naming${i}`).join(' OR ')})`,
    Object.fromEntries(NAMING_GUEST.map((r, i) => [`naming${i}`, r.like])),
  );
  return qb.getMany();
}

/** SQL condition: the order `alias` still has guest details of any kind to remove. */
export function holdsGuestDetailsSql(alias: string): string {
  const like = NAMING_GUEST.map((r) => `e.summary LIKE '${r.like}'`).join(' OR ');
  return `(EXISTS (SELECT 1 FROM order_guests g WHERE g.order_id = ${alias}.id)
    OR EXISTS (SELECT 1 FROM order_substitutions s WHERE s.order_id = ${alias}.id)
    OR EXISTS (SELECT 1 FROM order_events e WHERE e.order_id = ${alias}.id AND (${like})))`;
}
