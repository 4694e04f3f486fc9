import {
  formatDurationForChef,
  formatIsoDate,
  formatMoney,
  isoDayNumber,
  type StepKind,
  type StorageKind,
} from '@nappe/shared';

const MS_PER_DAY = 86_400_000;

/** "Fri 4 Dec" for a calendar date. */
export function shortDate(date: string): string {
  return new Intl.DateTimeFormat('en-GB', {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    timeZone: 'UTC',
  }).format(isoDayNumber(date) * MS_PER_DAY);
}

/** "Friday 4 December 2026" for a calendar date (the shared wording, no comma). */
export const longDate = (date: string): string => formatIsoDate(date);

/**
 * The wall-clock time of a zoned ISO date-time the planner sends ("2026-12-04T17:05:00+01:00"
 * → "17:05"): it is already in the studio's zone.
 */
export const clockOf = (zonedIso: string): string => zonedIso.slice(11, 16);

/** The studio-local date of a zoned ISO date-time. */
export const dateOf = (zonedIso: string): string => zonedIso.slice(0, 10);

/** "17:05" on `day`, "Tue 1 Dec 17:06" on another day. */
export function when(zonedIso: string, day: string): string {
  return dateOf(zonedIso) === day
    ? clockOf(zonedIso)
    : `${shortDate(dateOf(zonedIso))} ${clockOf(zonedIso)}`;
}

/** An instant (UTC ISO) as "14:05" — or "Tue 1 Dec 14:05" on another day — on the studio's clock. */
export function instantInZone(iso: string, timeZone: string, day?: string): string {
  const parts = new Intl.DateTimeFormat('en-GB', {
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
    timeZone,
  }).formatToParts(new Date(iso));
  const p: Record<string, string> = {};
  for (const part of parts) p[part.type] = part.value;
  const date = `${p.year}-${p.month}-${p.day}`;
  const time = `${p.hour}:${p.minute}`;
  return day === undefined || date === day ? time : `${shortDate(date)} ${time}`;
}

/** "2 h 55 min". */
export const duration = (minutes: number): string => formatDurationForChef(minutes);

const wholeGrams = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 0 });
const tenthGrams = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 1 });

/** Kitchen grams as the planner rounded them: "1,234 g", "12.5 g". */
export function grams(g: number): string {
  return `${(g >= 100 ? wholeGrams : tenthGrams).format(g)} g`;
}

export const money = (minor: number, currency: string): string => formatMoney(minor, currency);

/** "−20 °C", with a real minus sign. */
export const celsius = (c: number): string => `${c < 0 ? `−${Math.abs(c)}` : String(c)} °C`;

export const STEP_KIND_LABELS: Record<StepKind, string> = {
  prep: 'Prepare',
  cook: 'Cook',
  custard: 'Custard',
  sugar_syrup: 'Sugar syrup',
  caramel: 'Caramel',
  bake: 'Bake',
  cool: 'Cool down',
  chill: 'Chill',
  freeze: 'Freeze',
  churn: 'Churn',
  temper: 'Temper',
  whip: 'Whip',
  rest: 'Rest',
  assemble: 'Assemble',
};

export const STORAGE_LABELS: Record<StorageKind, string> = {
  dry: 'Dry, room temperature',
  chilled: 'Chilled',
  frozen: 'Frozen',
};
