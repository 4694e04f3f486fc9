import { addIsoDays, dateInTimeZone, daysBetween, isIsoDate } from '@nappe/shared';
import type { DateRange } from '../api/types';

/** The API plans at most this many days at a time (api/src/prep/prep.service.ts). */
export const PLAN_MAX_DAYS = 92;
/** The plan's default: today and the six days after. */
export const DEFAULT_PLAN_DAYS = 7;

/** The studio's calendar date now. */
export const studioToday = (timeZone: string, now: Date = new Date()): string =>
  dateInTimeZone(now, timeZone);

export const defaultPlanRange = (today: string, days = DEFAULT_PLAN_DAYS): DateRange => ({
  from: today,
  to: addIsoDays(today, days - 1),
});

/** Why a range cannot be planned, in words; null when it can. */
export function rangeProblem(from: string, to: string): string | null {
  if (!isIsoDate(from)) return 'Choose a real first day.';
  if (!isIsoDate(to)) return 'Choose a real last day.';
  const days = daysBetween(from, to) + 1;
  if (days < 1) return 'The last day must be on or after the first day.';
  if (days > PLAN_MAX_DAYS) return `Plan at most ${PLAN_MAX_DAYS} days at a time.`;
  return null;
}

export type RangeInUrl =
  | { kind: 'missing' }
  | { kind: 'invalid'; from: string; to: string; problem: string }
  | { kind: 'ok'; range: DateRange };

/** `?from=YYYY-MM-DD&to=YYYY-MM-DD`. */
export function rangeFromParams(params: URLSearchParams): RangeInUrl {
  const from = params.get('from');
  const to = params.get('to');
  if (from === null && to === null) return { kind: 'missing' };
  const problem = rangeProblem(from ?? '', to ?? '');
  if (problem) return { kind: 'invalid', from: from ?? '', to: to ?? '', problem };
  return { kind: 'ok', range: { from: from!, to: to! } };
}

export type DayInUrl =
  { kind: 'missing' } | { kind: 'invalid'; value: string } | { kind: 'ok'; date: string };

/** `?date=YYYY-MM-DD`. */
export function dayFromParams(params: URLSearchParams): DayInUrl {
  const date = params.get('date');
  if (date === null) return { kind: 'missing' };
  return isIsoDate(date) ? { kind: 'ok', date } : { kind: 'invalid', value: date };
}
