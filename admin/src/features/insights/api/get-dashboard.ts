import type {
  DashboardEvent,
  DashboardRequest,
  RevenueMonth,
  PlatesWeek,
  FoodCostMonth,
  DashboardAlert,
  Dashboard,
} from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export type {
  DashboardEvent,
  DashboardRequest,
  RevenueMonth,
  PlatesWeek,
  FoodCostMonth,
  DashboardAlert,
  Dashboard,
};

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
