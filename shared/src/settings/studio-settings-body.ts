import { z } from 'zod';
import { prepSettingsSchema } from '../prep-schedule/working-calendar.js';
import { clockMinutes, isClockTime } from '../prep-schedule/zoned-time.js';
import { studioSettingsSchema } from './studio-settings.js';

/** One line of plain text: no control characters (they could reach e-mail headers). */
const line = (what: string, min: number, max: number) =>
  z
    .string({ error: `${what} is text.` })
    .trim()
    .min(min, { error: `${what} needs at least ${min} character${min === 1 ? '' : 's'}.` })
    .max(max, { error: `${what} is at most ${max} characters.` })
    .refine((v) => !/[\p{Cc}\u2028\u2029]/u.test(v), {
      message: `${what} must be on one line, without control characters.`,
    });

const clock = (what: string) =>
  z
    .string({ error: `${what} is a time written HH:MM, e.g. 07:00.` })
    .trim()
    .refine(isClockTime, { message: `${what} is a time written HH:MM, e.g. 07:00.` });

/**
 * The same rules as the prep schedule's `workingHours`, but the order of the two times is only
 * compared once both are real times (the shared refinement throws on a malformed one).
 */
const workingHoursSchema = z
  .object({ start: clock('The opening time'), end: clock('The closing time') })
  .strict()
  .superRefine((h, ctx) => {
    if (!isClockTime(h.start) || !isClockTime(h.end)) return;
    if (clockMinutes(h.end) <= clockMinutes(h.start)) {
      ctx.addIssue({
        code: 'custom',
        message:
          'Working hours must end after they start on the same day (for example 07:00–19:00).',
      });
    }
  });

/**
 * `PUT /api/studio/settings`: the whole settings, every field required, unknown fields refused.
 * The booking rules come from the studio settings schema; the kitchen's working hours and plating
 * buffer from the prep schedule's schema; the public card (name, tagline, city) is defined here.
 * The API validates with it and the chef's settings form validates with it before sending.
 */
export const studioSettingsBodySchema = studioSettingsSchema
  .extend({
    name: line('The studio name', 1, 120),
    tagline: line('The tagline', 0, 200),
    city: line('The city', 1, 120),
    workingHours: workingHoursSchema,
    platingBufferMinutes: prepSettingsSchema.shape.platingBufferMinutes.unwrap(),
    blackoutDates: studioSettingsSchema.shape.blackoutDates.unwrap(),
    guestDataRetentionDays: studioSettingsSchema.shape.guestDataRetentionDays.unwrap(),
  })
  .strict();
export type StudioSettingsBody = z.output<typeof studioSettingsBodySchema>;

/** What `GET /api/studio/settings` answers: the body's shape, plus when it last changed. */
export interface StudioSettingsView extends StudioSettingsBody {
  updatedAt: string;
  lastChange: { changedAt: string; changedBy: string; fields: string[] } | null;
}
