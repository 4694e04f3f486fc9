import { z } from 'zod';
import { substitutionSchema } from '../conflicts/conflicts.js';
import { kitchenIdSchema } from '../kitchen/types.js';
import { isCalendarDate, isClockTime, isTimeZone } from '../prep-schedule/zoned-time.js';

/**
 * A confirmed order as the prep plan needs it: when and where it is served, which menu, how many
 * guests, and the guests whose plates change (a component left out, or replaced by another
 * recipe at the same weight — the substitution the allergy check records).
 */

export const PREP_ORDER_MAX_GUESTS = 5000;

export const guestPlateChangeSchema = z.object({
  /** Guest name or label, e.g. "Table 3, seat 2". */
  guest: z.string().trim().min(1, 'Name the guest whose plate changes.').max(120),
  dessertId: kitchenIdSchema,
  changes: z.array(substitutionSchema).min(1, 'A changed plate needs at least one change.').max(20),
});
export type GuestPlateChange = z.infer<typeof guestPlateChangeSchema>;

export const prepOrderSchema = z.object({
  id: kitchenIdSchema,
  /** What the chef calls the order (its reference, e.g. N-2026-0003), in messages; else its id. */
  reference: z.string().trim().min(1).max(40).optional(),
  eventDate: z
    .string()
    .trim()
    .refine(isCalendarDate, { message: 'The event date is a calendar date written YYYY-MM-DD.' }),
  serviceTime: z
    .string()
    .trim()
    .refine(isClockTime, { message: 'The service time is written HH:MM, e.g. 19:30.' }),
  /** IANA zone the service time is read in, e.g. Europe/Brussels. */
  timeZone: z.string().trim().refine(isTimeZone, {
    message: 'The event’s time zone must be a name such as Europe/Brussels.',
  }),
  menuId: kitchenIdSchema,
  guestCount: z
    .number({ message: 'The guest count must be a number.' })
    .int({ message: 'The guest count is a whole number.' })
    .min(1, { message: 'At least one guest.' })
    .max(PREP_ORDER_MAX_GUESTS, { message: `At most ${PREP_ORDER_MAX_GUESTS} guests.` }),
  /** One entry per guest and dessert whose plate differs from the standard one. */
  guestChanges: z
    .array(guestPlateChangeSchema)
    .max(PREP_ORDER_MAX_GUESTS * 10)
    .default([]),
});
export type PrepOrderInput = z.input<typeof prepOrderSchema>;
export type PrepOrder = z.output<typeof prepOrderSchema>;
