import type { OrderStatus } from '../orders/order-status.js';

/** The answer of `GET /api/insights/dashboard` (chef only): the server builds it, the admin shows it. */

export interface DashboardEvent {
  id: string;
  reference: string;
  /** `YYYY-MM-DD` in the studio's time zone. */
  eventDate: string;
  /** `HH:MM`, studio time. */
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
  /** ISO 8601 timestamp. */
  requestedAt: string;
}

export interface RevenueMonth {
  /** `YYYY-MM`, the month the money settled in. */
  month: string;
  receivedMinor: number;
  refundedMinor: number;
  revenueMinor: number;
}

export interface PlatesWeek {
  /** The Monday of the ISO week, `YYYY-MM-DD`. */
  weekStart: string;
  plates: number;
}

export interface FoodCostMonth {
  month: string;
  costMinor: number;
  netRevenueMinor: number;
  /** null in a month with no revenue. */
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
  /** `YYYY-MM-DD`, today in the studio's time zone. */
  today: string;
  timeZone: string;
  currency: string;
  upcoming: DashboardEvent[];
  requests: DashboardRequest[];
  revenueByMonth: RevenueMonth[];
  platesByWeek: PlatesWeek[];
  foodCost: { basis: string; months: FoodCostMonth[] };
  alerts: DashboardAlert[];
}
