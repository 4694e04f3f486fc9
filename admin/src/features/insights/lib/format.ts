import {
  daysBetween,
  formatMoney,
  isoDayNumber,
  minorToDecimalString,
  OrderStatus,
} from '@nappe/shared';

/**
 * Words and numbers for the chef's figures. Calendar dates (`YYYY-MM-DD`, `YYYY-MM`) are already
 * the studio's own days, so they are formatted in UTC, never shifted by the device's zone.
 */

const DAY_MS = 86_400_000;
const at = (isoDate: string) => isoDayNumber(isoDate) * DAY_MS;
const monthStart = (month: string) => at(`${month}-01`);

const dayShort = new Intl.DateTimeFormat('en-GB', {
  timeZone: 'UTC',
  weekday: 'short',
  day: 'numeric',
  month: 'short',
});
const dayLong = new Intl.DateTimeFormat('en-GB', {
  timeZone: 'UTC',
  weekday: 'long',
  day: 'numeric',
  month: 'long',
  year: 'numeric',
});
const dayMonth = new Intl.DateTimeFormat('en-GB', {
  timeZone: 'UTC',
  day: 'numeric',
  month: 'short',
});
const dayMonthYear = new Intl.DateTimeFormat('en-GB', {
  timeZone: 'UTC',
  day: 'numeric',
  month: 'long',
  year: 'numeric',
});
const monthShort = new Intl.DateTimeFormat('en-GB', {
  timeZone: 'UTC',
  month: 'short',
  year: '2-digit',
});
const monthLong = new Intl.DateTimeFormat('en-GB', {
  timeZone: 'UTC',
  month: 'long',
  year: 'numeric',
});

/** "Sat 5 Dec". */
export const formatDayShort = (isoDate: string) => dayShort.format(at(isoDate));
/** "Saturday 5 December 2026". */
export const formatDayLong = (isoDate: string) => dayLong.format(at(isoDate));
/** "5 December 2026". */
export const formatDate = (isoDate: string) => dayMonthYear.format(at(isoDate));
/** "Nov 26", for a chart axis. */
export const formatMonthShort = (month: string) => monthShort.format(monthStart(month));
/** "November 2026". */
export const formatMonthLong = (month: string) => monthLong.format(monthStart(month));
/** "30 Nov", the Monday starting a week, for a chart axis. */
export const formatWeekShort = (weekStart: string) => dayMonth.format(at(weekStart));
/** "Week of 30 November 2026". */
export const formatWeekLong = (weekStart: string) => `Week of ${formatDate(weekStart)}`;

/** "today", "tomorrow", "in 3 days", "yesterday", "4 days ago". */
export function relativeDay(isoDate: string, today: string): string {
  const days = daysBetween(today, isoDate);
  if (days === 0) return 'today';
  if (days === 1) return 'tomorrow';
  if (days === -1) return 'yesterday';
  return days > 0 ? `in ${days} days` : `${-days} days ago`;
}

/** Integer minor units in the studio currency: "€1,234.50". */
export const formatMinor = (minor: number, currency: string) => formatMoney(minor, currency);

/** A short amount for a chart axis: "€12K". The minor units reach Intl as an exact decimal. */
export function formatMinorCompact(minor: number, currency: string): string {
  if (!Number.isSafeInteger(minor)) return '';
  return new Intl.NumberFormat('en-GB', {
    style: 'currency',
    currency,
    notation: 'compact',
    minimumFractionDigits: 0,
    maximumFractionDigits: 1,
  }).format(minorToDecimalString(minor, currency) as Intl.StringNumericLiteral);
}

/** "31.4 %" (one decimal, as the API rounds it). */
export function formatPercent(percent: number): string {
  return `${new Intl.NumberFormat('en-GB', { maximumFractionDigits: 1 }).format(percent)} %`;
}

export const formatCount = (n: number) => new Intl.NumberFormat('en-GB').format(n);

const STATUS_LABELS: Record<OrderStatus, string> = {
  [OrderStatus.PendingPayment]: 'Awaiting payment',
  [OrderStatus.Requested]: 'Requested',
  [OrderStatus.Confirmed]: 'Confirmed',
  [OrderStatus.Completed]: 'Completed',
  [OrderStatus.Expired]: 'Expired',
  [OrderStatus.Declined]: 'Declined',
  [OrderStatus.Cancelled]: 'Cancelled',
};

export const statusLabel = (status: OrderStatus) => STATUS_LABELS[status];

/**
 * Round axis ticks for money in minor units: steps of 1, 2, 2.5 or 5 × a power of ten of the
 * currency's major unit (€500, €1,000…), from 0 up past the largest value (and down past the
 * lowest when refunds make a month negative). Integers in minor units, about `count` of them.
 */
export function moneyTicks(
  minMinor: number,
  maxMinor: number,
  digits: number,
  count = 4,
): number[] {
  const unit = 10 ** digits;
  const low = Math.min(0, minMinor);
  const high = Math.max(0, maxMinor);
  if (high === low) return [0, unit * 100];
  const rough = (high - low) / count;
  const magnitude = 10 ** Math.floor(Math.log10(rough / unit));
  const step =
    [1, 2, 2.5, 5, 10]
      .map((f) => f * magnitude * unit)
      .find((s) => s >= rough && Number.isInteger(s)) ?? 10 * magnitude * unit;
  const ticks: number[] = [];
  for (let t = Math.floor(low / step) * step; t < high + step; t += step) ticks.push(t);
  return ticks;
}
