import { z } from 'zod';
import { KitchenError } from '../kitchen/errors.js';
import {
  MINUTES_PER_DAY,
  addCalendarDays,
  clockMinutes,
  calendarDayNumber,
  isClockTime,
  isTimeZone,
  offsetMinutesAt,
  zonedToInstant,
  type EpochMinutes,
} from './zoned-time.js';

/**
 * The studio's working hours as a calendar of windows, one per local day, in the studio's time
 * zone. Hands-on work happens inside a window; waits (chilling, freezing, resting) run at any
 * hour. One block of hands-on work — one batch of one step — never straddles a closing time:
 * if it does not fit before closing it moves to the previous (or next) working day.
 */

export class PrepInputError extends KitchenError {
  readonly code = 'invalid_prep_input';
}

export class StepLongerThanWorkingDayError extends KitchenError {
  readonly code = 'step_longer_than_working_day';

  constructor(
    readonly recipeName: string,
    readonly stepName: string,
    readonly activeMinutes: number,
    readonly workingHours: { start: string; end: string },
  ) {
    super(
      `“${stepName}” in “${recipeName}” needs ${activeMinutes} minutes of hands-on work in one go, more than the working day (${workingHours.start}–${workingHours.end}) holds. Split the step, or widen the working hours.`,
    );
  }
}

const clockSchema = (what: string) =>
  z
    .string()
    .trim()
    .refine(isClockTime, { message: `${what} is a time written HH:MM, e.g. 07:00.` });

export const prepSettingsSchema = z.object({
  /** IANA zone of the studio kitchen: working hours and production days are read in it. */
  studioTimeZone: z
    .string()
    .trim()
    .refine(isTimeZone, { message: 'Pick the studio’s time zone, such as Europe/Brussels.' }),
  /** Hands-on work happens between these local times, every day. */
  workingHours: z
    .object({ start: clockSchema('The opening time'), end: clockSchema('The closing time') })
    // Compared only when both times are valid: a malformed one has its own message already.
    .refine(
      (h) =>
        !clockSchema('').safeParse(h.start).success ||
        !clockSchema('').safeParse(h.end).success ||
        clockMinutes(h.end) > clockMinutes(h.start),
      {
        message:
          'Working hours must end after they start on the same day (for example 07:00–19:00).',
      },
    )
    .default({ start: '07:00', end: '19:00' }),
  /** Every component is finished at least this long before service, for plating. */
  platingBufferMinutes: z
    .number()
    .int({ message: 'The plating time is a whole number of minutes.' })
    .min(0, { message: 'The plating time cannot be negative.' })
    .max(12 * 60, { message: 'The plating time is at most 12 hours.' })
    .default(60),
});
export type PrepSettingsInput = z.input<typeof prepSettingsSchema>;
export type PrepSettings = z.output<typeof prepSettingsSchema>;

/** Defaults stated once: 07:00–19:00, 60 minutes for plating. */
export const DEFAULT_WORKING_HOURS = { start: '07:00', end: '19:00' } as const;
export const DEFAULT_PLATING_BUFFER_MINUTES = 60;

/** Settings with defaults filled; throws PrepInputError with a readable message when wrong. */
export function parsePrepSettings(input: PrepSettingsInput): PrepSettings {
  const parsed = prepSettingsSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new PrepInputError(`Studio settings: ${issue?.message ?? 'not valid.'}`);
  }
  return parsed.data;
}

/** At most this many days are searched for a window a block fits in. */
const SEARCH_DAYS = 14;

export interface BlockContext {
  recipeName: string;
  stepName: string;
}

export class WorkingCalendar {
  readonly timeZone: string;
  readonly hours: { start: string; end: string };
  /** Nominal window length in minutes (a window spanning a clock change is an hour shorter or longer). */
  readonly windowMinutes: number;
  private readonly windows = new Map<number, readonly [EpochMinutes, EpochMinutes]>();
  /** The window last looked up: most blocks fall in the same one as the block before. */
  private lastOpen = Number.NaN;
  private lastClose = Number.NaN;

  constructor(settings: Pick<PrepSettings, 'studioTimeZone' | 'workingHours'>) {
    this.timeZone = settings.studioTimeZone;
    this.hours = settings.workingHours;
    this.windowMinutes = clockMinutes(this.hours.end) - clockMinutes(this.hours.start);
  }

  /** The local day number (days since 1970-01-01 on the studio's wall calendar) at `instant`. */
  localDay(instant: EpochMinutes): number {
    return Math.floor((instant + offsetMinutesAt(instant, this.timeZone)) / MINUTES_PER_DAY);
  }

  /** Opening and closing instants of the working day `day` (a local day number). */
  window(day: number): readonly [EpochMinutes, EpochMinutes] {
    let w = this.windows.get(day);
    if (!w) {
      const date = addCalendarDays('1970-01-01', day);
      w = [
        zonedToInstant(date, this.hours.start, this.timeZone),
        zonedToInstant(date, this.hours.end, this.timeZone),
      ] as const;
      this.windows.set(day, w);
    }
    return w;
  }

  windowOnDate(date: string): readonly [EpochMinutes, EpochMinutes] {
    return this.window(calendarDayNumber(date));
  }

  /**
   * The latest end `e` ≤ `t` such that `minutes` of hands-on work, [e − minutes, e], fit in one
   * working window. Zero minutes fit anywhere.
   */
  latestBlockEnd(t: EpochMinutes, minutes: number, context: BlockContext): EpochMinutes {
    if (minutes === 0) return t;
    if (t <= this.lastClose && t - minutes >= this.lastOpen) return t;
    this.assertFits(minutes, context);
    let day = this.localDay(t);
    for (let i = 0; i < SEARCH_DAYS; i += 1, day -= 1) {
      const [open, close] = this.window(day);
      const end = Math.min(t, close);
      if (end - minutes >= open) {
        this.lastOpen = open;
        this.lastClose = close;
        return end;
      }
    }
    throw new StepLongerThanWorkingDayError(
      context.recipeName,
      context.stepName,
      minutes,
      this.hours,
    );
  }

  /** The earliest start `s` ≥ `t` such that [s, s + minutes] fits in one working window. */
  earliestBlockStart(t: EpochMinutes, minutes: number, context: BlockContext): EpochMinutes {
    if (minutes === 0) return t;
    if (t >= this.lastOpen && t + minutes <= this.lastClose) return t;
    this.assertFits(minutes, context);
    let day = this.localDay(t);
    for (let i = 0; i < SEARCH_DAYS; i += 1, day += 1) {
      const [open, close] = this.window(day);
      const start = Math.max(t, open);
      if (start + minutes <= close) {
        this.lastOpen = open;
        this.lastClose = close;
        return start;
      }
    }
    throw new StepLongerThanWorkingDayError(
      context.recipeName,
      context.stepName,
      minutes,
      this.hours,
    );
  }

  private assertFits(minutes: number, context: BlockContext): void {
    if (minutes > this.windowMinutes) {
      throw new StepLongerThanWorkingDayError(
        context.recipeName,
        context.stepName,
        minutes,
        this.hours,
      );
    }
  }
}
