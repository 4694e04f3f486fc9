import { OrderStatus, type OrderSummary } from '@nappe/shared';
import { describe, expect, it } from 'vitest';
import {
  addMonths,
  gridRange,
  isMonth,
  monthGrid,
  monthLabel,
  ordersByDay,
  platesOn,
  weekdayOf,
} from './calendar-month';

// Weekdays are checked against JavaScript's own calendar (Date#getUTCDay, proleptic Gregorian,
// ECMA-262 §21.4.1), mapped to ISO 8601 numbering with Monday first.
const isoWeekday = (date: string) => (new Date(`${date}T00:00:00Z`).getUTCDay() + 6) % 7;

describe('the month grid', () => {
  it('numbers weekdays as the reference calendar does, over four years', () => {
    for (let day = Date.UTC(2024, 0, 1); day < Date.UTC(2028, 0, 1); day += 86_400_000) {
      const date = new Date(day).toISOString().slice(0, 10);
      expect(weekdayOf(date), date).toBe(isoWeekday(date));
    }
  });

  it('runs from the Monday on or before the 1st to the Sunday on or after the last day', () => {
    // 1 March 2026 is a Sunday and 31 March a Tuesday: six weeks, 23 February – 5 April.
    const march = monthGrid('2026-03');
    expect(march).toHaveLength(6);
    expect(march[0]![0]).toBe('2026-02-23');
    expect(march.at(-1)![6]).toBe('2026-04-05');
    expect(gridRange('2026-03')).toEqual({ from: '2026-02-23', to: '2026-04-05' });
    // February 2027 starts on a Monday and has 28 days: exactly four weeks.
    const feb = monthGrid('2027-02');
    expect(feb).toHaveLength(4);
    expect(feb[0]![0]).toBe('2027-02-01');
    expect(feb.at(-1)![6]).toBe('2027-02-28');
    for (const month of ['2024-02', '2026-03', '2026-08', '2027-02', '2028-12']) {
      for (const week of monthGrid(month)) {
        expect(week.map(isoWeekday)).toEqual([0, 1, 2, 3, 4, 5, 6]);
      }
    }
  });

  it('steps months across years and reads only YYYY-MM', () => {
    expect(addMonths('2026-12', 1)).toBe('2027-01');
    expect(addMonths('2026-01', -1)).toBe('2025-12');
    expect(addMonths('2026-03', -15)).toBe('2024-12');
    expect(isMonth('2026-03')).toBe(true);
    expect(isMonth('2026-13')).toBe(false);
    expect(isMonth('2026-3')).toBe(false);
    expect(monthLabel('2026-03')).toBe('March 2026');
  });
});

const order = (o: Partial<OrderSummary>): OrderSummary => ({
  id: 'o',
  reference: 'N-1',
  status: OrderStatus.Confirmed,
  menuId: 'm',
  menuName: 'Menu',
  eventDate: '2026-03-14',
  serviceTime: '19:30',
  guestCount: 10,
  plates: 20,
  currency: 'EUR',
  totalMinor: 0,
  paidMinor: 0,
  balanceMinor: 0,
  balanceDueDate: null,
  clientName: 'C',
  createdAt: '2026-01-01T00:00:00Z',
  ...o,
});

describe('events by day', () => {
  it('keeps the bookings that hold plates, in service order, and adds their plates', () => {
    const days = ordersByDay([
      order({ id: 'a', serviceTime: '20:00', reference: 'N-3' }),
      order({ id: 'b', serviceTime: '12:30', reference: 'N-2', status: OrderStatus.Requested }),
      order({ id: 'c', status: OrderStatus.Cancelled }),
      order({ id: 'd', status: OrderStatus.Declined }),
      order({ id: 'e', status: OrderStatus.Expired }),
      order({ id: 'f', eventDate: '2026-03-15', status: OrderStatus.Completed, plates: 8 }),
    ]);
    expect(days.get('2026-03-14')!.map((o) => o.id)).toEqual(['b', 'a']);
    expect(platesOn(days.get('2026-03-14')!)).toBe(40);
    expect(platesOn(days.get('2026-03-15')!)).toBe(8);
  });

  it('gives no plate figure when the API did not send one', () => {
    expect(platesOn([order({ plates: undefined })])).toBeNull();
  });
});
