import { plural } from '@nappe/shared';
import type { Dashboard, FoodCostMonth, PlatesWeek, RevenueMonth } from '../api/get-dashboard';
import { formatDate, formatMinor, formatMonthLong, formatPercent } from './format';

/** A studio with nothing booked, paid or served yet: the dashboard says so instead of drawing zeros. */
export function isEmptyDashboard(d: Dashboard): boolean {
  return (
    d.upcoming.length === 0 &&
    d.requests.length === 0 &&
    d.alerts.length === 0 &&
    d.revenueByMonth.every((m) => m.receivedMinor === 0 && m.refundedMinor === 0) &&
    d.platesByWeek.every((w) => w.plates === 0) &&
    d.foodCost.months.every((m) => m.percent === null)
  );
}

/** The charts' words: what a sighted reader takes from the bars, in one or two sentences. */
export function revenueSummary(months: readonly RevenueMonth[], currency: string): string {
  if (months.length === 0) return 'No revenue figures yet.';
  const total = months.reduce((sum, m) => sum + m.revenueMinor, 0);
  const first = months[0]!.month;
  const last = months[months.length - 1]!;
  const best = months.reduce((a, b) => (b.revenueMinor > a.revenueMinor ? b : a));
  const parts = [
    `${formatMinor(total, currency)} received, less refunds, from ${formatMonthLong(first)} to ${formatMonthLong(last.month)}.`,
  ];
  if (best.revenueMinor > 0) {
    parts.push(
      `Best month: ${formatMonthLong(best.month)} (${formatMinor(best.revenueMinor, currency)}).`,
    );
  }
  parts.push(`This month so far: ${formatMinor(last.revenueMinor, currency)}.`);
  return parts.join(' ');
}

/** Weeks starting after today are bookings still to come. */
export const isAhead = (week: PlatesWeek, today: string) => week.weekStart > today;

export function platesSummary(weeks: readonly PlatesWeek[], today: string): string {
  if (weeks.length === 0) return 'No plate figures yet.';
  const toDate = weeks.filter((w) => !isAhead(w, today));
  const ahead = weeks.filter((w) => isAhead(w, today));
  const current = toDate[toDate.length - 1];
  const served = toDate.reduce((sum, w) => sum + w.plates, 0);
  const booked = ahead.reduce((sum, w) => sum + w.plates, 0);
  const busiest = weeks.reduce((a, b) => (b.plates > a.plates ? b : a));
  const parts = [
    `${plural(served, 'plate')} in the ${plural(toDate.length, 'week')} up to this one` +
      (current ? ` (this week: ${plural(current.plates, 'plate')})` : '') +
      `; ${plural(booked, 'plate')} booked in the ${plural(ahead.length, 'week')} ahead.`,
  ];
  if (busiest.plates > 0) {
    parts.push(
      `Busiest: the week of ${formatDate(busiest.weekStart)}, ${plural(busiest.plates, 'plate')}.`,
    );
  }
  return parts.join(' ');
}

export function foodCostSummary(months: readonly FoodCostMonth[]): string {
  const known = months.filter((m): m is FoodCostMonth & { percent: number } => m.percent !== null);
  if (known.length === 0) {
    return 'No events served in these months yet, so there is no food cost to show.';
  }
  const latest = known[known.length - 1]!;
  const low = known.reduce((a, b) => (b.percent < a.percent ? b : a));
  const high = known.reduce((a, b) => (b.percent > a.percent ? b : a));
  const parts = [`Latest: ${formatMonthLong(latest.month)}, ${formatPercent(latest.percent)}.`];
  if (known.length > 1) {
    parts.push(
      `Lowest ${formatPercent(low.percent)} (${formatMonthLong(low.month)}), highest ${formatPercent(high.percent)} (${formatMonthLong(high.month)}).`,
    );
  }
  return parts.join(' ');
}
