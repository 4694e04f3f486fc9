import {
  checkGuestAgainstDessert,
  type AllergyNotes,
  type Briefing,
  type BriefingTable,
  type GuestNote,
  type GuestRequirement,
  type GuestPlateChange,
  type KitchenIndex,
  type PrepOrderInput,
  type RecordedSubstitution,
  type Substitution,
  type UnresolvedConflict,
} from '@nappe/shared';
import type { OrderGuestEntity } from '../orders/entities/order-guest.entity.js';
import type { OrderEntity } from '../orders/entities/order.entity.js';
import type { OrderSubstitutionEntity } from './entities/order-substitution.entity.js';

/** A stored guest row as the shared conflict check reads it. */
export function requirementOf(guest: OrderGuestEntity): GuestRequirement {
  return {
    label: guest.label,
    ...(guest.tableLabel ? { table: guest.tableLabel } : {}),
    allergens: guest.allergens as GuestRequirement['allergens'],
    diets: guest.diets as GuestRequirement['diets'],
    ...(guest.notes ? { notes: guest.notes } : {}),
  };
}

/** The substitution recorded for this guest (same position AND label) and dessert, if any. */
export function substitutionFor(
  subs: readonly OrderSubstitutionEntity[],
  guest: OrderGuestEntity,
  dessertId: string,
): OrderSubstitutionEntity | null {
  return (
    subs.find(
      (s) =>
        s.guestPosition === guest.position &&
        s.guestLabel === guest.label &&
        s.dessertId === dessertId,
    ) ?? null
  );
}

export function describeChanges(index: KitchenIndex, changes: readonly Substitution[]): string[] {
  return changes.map((c) => {
    const name = index.hasRecipe(c.componentRecipeId)
      ? index.recipe(c.componentRecipeId).name
      : c.componentRecipeId;
    if (c.replacementRecipeId === undefined) return `Leave out ${name}`;
    const by = index.hasRecipe(c.replacementRecipeId)
      ? index.recipe(c.replacementRecipeId).name
      : c.replacementRecipeId;
    return `Replace ${name} with ${by}`;
  });
}

/**
 * Every guest against every dessert of the order's menu (shared `checkGuestAgainstDessert`),
 * then again with the recorded substitution applied. A plate is resolved when the plate the
 * guest will actually get has no conflict; a free note alone changes nothing on the plate, so it
 * does not resolve a conflict (the chef overrides with a reason instead).
 */
export function allergyNotesOf(
  index: KitchenIndex,
  order: OrderEntity,
  guests: readonly OrderGuestEntity[],
  subs: readonly OrderSubstitutionEntity[],
): AllergyNotes {
  const menu = index.menu(order.menuId);
  const desserts = menu.dessertIds.map((id) => index.dessert(id));
  const notes: GuestNote[] = [];
  const unresolved: UnresolvedConflict[] = [];
  let advisoryCount = 0;
  for (const guest of [...guests].sort((a, b) => a.position - b.position)) {
    const requirement = requirementOf(guest);
    const plates = desserts.map((dessert) => {
      const original = checkGuestAgainstDessert(index, dessert, requirement);
      const sub = substitutionFor(subs, guest, dessert.id);
      const after =
        sub && sub.changes.length > 0
          ? checkGuestAgainstDessert(index, dessert, requirement, sub.changes)
          : null;
      const final = after ?? original;
      const recorded: RecordedSubstitution | null = sub
        ? {
            changes: sub.changes,
            described: describeChanges(index, sub.changes),
            note: sub.note,
            recordedAt: new Date(sub.recordedAt).toISOString(),
          }
        : null;
      advisoryCount += final.advisories.length;
      if (!final.clear) {
        unresolved.push({
          guestId: guest.position,
          guest: guest.label,
          dessertId: dessert.id,
          dessertName: dessert.name,
          messages: final.conflicts.map((c) => c.message),
        });
      }
      return {
        dessertId: dessert.id,
        dessertName: dessert.name,
        clear: original.clear,
        conflicts: original.conflicts,
        advisories: original.advisories,
        substitution: recorded,
        afterSubstitution: after,
        resolved: final.clear,
      };
    });
    notes.push({
      guestId: guest.position,
      label: guest.label,
      table: guest.tableLabel,
      allergens: guest.allergens,
      diets: guest.diets,
      notes: guest.notes,
      plates,
    });
  }
  return {
    orderId: order.id,
    reference: order.reference,
    status: order.status,
    eventDate: order.eventDate,
    serviceTime: order.serviceTime,
    guestCount: order.guestCount,
    desserts: desserts.map((d) => ({ id: d.id, name: d.name })),
    guests: notes,
    unresolved,
    advisoryCount,
  };
}

/** The staff briefing: by table, each guest whose plate changes or needs a word, and why. */
export function briefingOf(notes: AllergyNotes, order: OrderEntity): Briefing {
  const tables = new Map<string, BriefingTable>();
  let changedGuests = 0;
  for (const guest of notes.guests) {
    const lines = guest.plates.flatMap((plate) => {
      const why = plate.conflicts.map((c) => c.message);
      const finalAdvisories = (plate.afterSubstitution ?? plate).advisories.map((a) => a.message);
      if (why.length === 0 && finalAdvisories.length === 0 && !plate.substitution) return [];
      const change = plate.substitution
        ? [
            ...plate.substitution.described,
            ...(plate.substitution.note ? [plate.substitution.note] : []),
          ].join('; ')
        : why.length > 0
          ? 'NOT RESOLVED — ask the chef before serving'
          : 'Standard plate';
      return [
        {
          guest: guest.label,
          dessert: plate.dessertName,
          change,
          why,
          advisories: finalAdvisories,
          unresolved: !plate.resolved,
        },
      ];
    });
    if (lines.length === 0) continue;
    changedGuests += 1;
    const key = guest.table ?? 'No table given';
    const table = tables.get(key) ?? { table: key, guests: [] };
    table.guests.push(...lines);
    tables.set(key, table);
  }
  return {
    orderId: order.id,
    reference: order.reference,
    occasion: order.occasion,
    eventDate: order.eventDate,
    serviceTime: order.serviceTime,
    venue: order.venueAddressLines,
    guestCount: order.guestCount,
    standardPlates: Math.max(0, order.guestCount - changedGuests),
    tables: [...tables.values()].sort((a, b) =>
      a.table.localeCompare(b.table, 'en', { numeric: true }),
    ),
  };
}

/** The order as the prep plan and the lead-time check read it, changed plates included. */
export function prepOrderOf(
  order: OrderEntity,
  timeZone: string,
  guests: readonly OrderGuestEntity[],
  subs: readonly OrderSubstitutionEntity[],
): PrepOrderInput {
  const guestChanges: GuestPlateChange[] = [];
  for (const guest of guests) {
    for (const sub of subs) {
      if (sub.guestPosition !== guest.position || sub.guestLabel !== guest.label) continue;
      if (sub.changes.length === 0) continue;
      guestChanges.push({
        // Unique per order even when two guests share a label.
        guest: `${guest.label.slice(0, 100)} #${guest.position + 1}`,
        dessertId: sub.dessertId,
        changes: sub.changes,
      });
    }
  }
  return {
    id: order.id,
    reference: order.reference,
    eventDate: order.eventDate,
    serviceTime: order.serviceTime,
    timeZone,
    menuId: order.menuId,
    guestCount: order.guestCount,
    guestChanges,
  };
}
