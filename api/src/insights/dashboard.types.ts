// The dashboard's contract lives in shared, with the admin that reads it.
export type {
  DashboardEvent,
  DashboardRequest,
  RevenueMonth,
  PlatesWeek,
  FoodCostMonth,
  DashboardAlert,
  Dashboard,
} from '@nappe/shared';
