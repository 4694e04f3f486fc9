import { createOrderSchema, type CreateOrderInput } from '@nappe/shared';
import { z } from 'zod';
import type { BookingDraft, EventDraft } from './booking-draft';

const order = createOrderSchema.shape;

/** The venue as typed (one line per line) → the address lines the API takes; blank lines dropped. */
export function addressLines(text: string): string[] {
  return text
    .split(/\r?\n/)
    .map((line) => line.trim())
    .filter((line) => line !== '');
}

/** A form field checked by one of the shared request schemas: its first message, as is. */
function checkedBy(schema: z.ZodType, map: (value: string) => unknown = (v) => v, empty?: string) {
  return z.string().superRefine((value, ctx) => {
    if (empty && value.trim() === '') {
      ctx.addIssue({ code: 'custom', message: empty });
      return;
    }
    const result = schema.safeParse(map(value));
    if (!result.success) {
      const issue = result.error.issues[0]!;
      // "Line 2: Keep the address line under 120 characters."
      const line = typeof issue.path[0] === 'number' ? `Line ${issue.path[0] + 1}: ` : '';
      ctx.addIssue({ code: 'custom', message: line + issue.message });
    }
  });
}

/**
 * *Your event*, checked field by field with the same rules the API applies to a booking
 * (`createOrderSchema`), on the raw values the form holds.
 */
export const eventStepSchema = z.object({
  eventDate: checkedBy(order.eventDate, (v) => v, 'Choose a date in the calendar.'),
  serviceTime: checkedBy(order.serviceTime, (v) => v, 'Enter the time dessert is served.'),
  venueAddress: checkedBy(order.venueAddressLines, addressLines, 'Enter the venue’s address.'),
  occasion: checkedBy(order.occasion),
  contactPhone: checkedBy(order.contactPhone),
}) satisfies z.ZodType<EventDraft>;

export function eventComplete(event: EventDraft): boolean {
  return eventStepSchema.safeParse(event).success;
}

/** The booking request the draft stands for (not yet checked: `createOrderSchema` does that). */
export function orderInputFrom(draft: BookingDraft): CreateOrderInput {
  const guests = draft.guests;
  const listed = guests?.guestRequirements ?? [];
  return {
    menuId: draft.menuId,
    eventDate: draft.event.eventDate,
    serviceTime: draft.event.serviceTime.trim(),
    venueAddressLines: addressLines(draft.event.venueAddress),
    occasion: draft.event.occasion.trim(),
    contactPhone: draft.event.contactPhone,
    guestCount: guests?.guestCount ?? 0,
    guestRequirements: listed,
    ...(listed.length > 0 ? { guestDataConsent: guests?.guestDataConsent ?? false } : {}),
    acceptTerms: draft.acceptTerms as true,
  };
}
