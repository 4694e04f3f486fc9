import type { OrderStatus } from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

// The answer of `GET /api/insights/dashboard`, as api/src/insights/dashboard.types.ts declares it.

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

export const insightsKeys = {
  all: ['insights'] as const,
  dashboard: () => [...insightsKeys.all, 'dashboard'] as const,
};

/** `GET /api/insights/dashboard` (chef only). */
export const getDashboard = (signal?: AbortSignal) =>
  api.get<Dashboard>('/insights/dashboard', { signal });

export const dashboardQueryOptions = () =>
  queryOptions({
    queryKey: insightsKeys.dashboard(),
    queryFn: ({ signal }) => getDashboard(signal),
    // Figures move as bookings and payments arrive: fresh on every visit, kept for a minute.
    staleTime: 60_000,
  });

export const useDashboard = () => useQuery(dashboardQueryOptions());
