import type { OrderStatus } from '@nappe/shared';

export interface DashboardEvent {
  id: string;
  reference: string;
  eventDate: string;
  serviceTime: string;
  menuName: string;
  guests: number;
  status: OrderStatus;
  clientName: string;
}

export interface DashboardRequest {
  id: string;
  reference: string;
  clientName: string;
  eventDate: string;
  menuName: string;
  guests: number;
  totalMinor: number;
  currency: string;
  requestedAt: string;
}

export interface RevenueMonth {
  /** `YYYY-MM`, the month the money settled in, in the studio's time zone. */
  month: string;
  receivedMinor: number;
  refundedMinor: number;
  /** received − refunded. */
  revenueMinor: number;
}

export interface PlatesWeek {
  /** The Monday starting the ISO 8601 week (`YYYY-MM-DD`). */
  weekStart: string;
  plates: number;
}

export interface FoodCostMonth {
  /** `YYYY-MM` of the events served. */
  month: string;
  /** Plates served × each dessert's plate cost from the recipes' current costs, minor units. */
  costMinor: number;
  /** The served orders' totals without tax, minor units. */
  netRevenueMinor: number;
  /** cost ÷ net revenue × 100, one decimal; null in a month with no revenue. */
  percent: number | null;
}

export type DashboardAlert =
  | { kind: 'lead_time'; orderId: string; reference: string; eventDate: string; message: string }
  | {
      kind: 'balance_overdue';
      orderId: string;
      reference: string;
      eventDate: string;
      balanceDueDate: string;
      balanceMinor: number;
      currency: string;
      message: string;
    }
  | {
      kind: 'allergy_conflict';
      orderId: string;
      reference: string;
      eventDate: string;
      unresolvedPlates: number;
      message: string;
    };

export interface Dashboard {
  today: string;
  timeZone: string;
  currency: string;
  /** Requested, confirmed and completed events from today to 13 days ahead, by date and time. */
  upcoming: DashboardEvent[];
  /** Paid bookings waiting for the chef's decision, oldest first. */
  requests: DashboardRequest[];
  /** The last 12 months, oldest first, in the studio's currency. */
  revenueByMonth: RevenueMonth[];
  /** Confirmed and completed plates, 12 weeks back to 4 weeks ahead. */
  platesByWeek: PlatesWeek[];
  foodCost: { basis: string; months: FoodCostMonth[] };
  alerts: DashboardAlert[];
}
