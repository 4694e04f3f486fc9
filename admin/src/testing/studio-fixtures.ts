import { OrderStatus, Role, type StudioSettingsView } from '@nappe/shared';
import type { Dashboard } from '../features/insights/api/get-dashboard';
import type { Invitation } from '../features/users/api/invitations';
import type { UserListItem } from '../features/users/api/get-users';
import { chefUser, staffUser } from './fixtures';

/**
 * Invented studio data for the Insights, Settings, Team and Accept-invitation tests. Names,
 * amounts and dates are ours; the dashboard's "today" is fixed so the words ("in 3 days") are
 * stable whatever day the tests run.
 */

export const settingsView: StudioSettingsView = {
  name: 'Atelier Verjus',
  tagline: 'Plated desserts, finished at your table.',
  city: 'Lyon',
  currency: 'EUR',
  timeZone: 'Europe/Paris',
  // 20 % is France's standard VAT rate (from memory; Code général des impôts art. 278).
  taxRateBp: 2000,
  pricesIncludeTax: true,
  depositPercent: 30,
  balanceDueDaysBefore: 14,
  cancellationTiers: [
    { daysBefore: 30, refundPercent: 100 },
    { daysBefore: 14, refundPercent: 50 },
    { daysBefore: 0, refundPercent: 0 },
  ],
  dailyPlateCapacity: 240,
  blackoutDates: ['2030-12-25'],
  finalGuestCountDaysBefore: 7,
  sparePercent: 5,
  guestDataRetentionDays: 30,
  workingHours: { start: '07:00', end: '19:00' },
  platingBufferMinutes: 60,
  updatedAt: '2026-11-20T09:15:00.000Z',
  lastChange: {
    changedAt: '2026-11-20T09:15:00.000Z',
    changedBy: chefUser.name,
    fields: ['depositPercent'],
  },
};

export const DASHBOARD_TODAY = '2026-12-02';

/** The API's window: the 12 months up to this one (January to December 2026). */
const months = (values: number[]) =>
  values.map((v, i) => ({ month: `2026-${String(i + 1).padStart(2, '0')}`, v }));

/** A studio with a year of bookings behind it and two weeks ahead. */
export const dashboard: Dashboard = {
  today: DASHBOARD_TODAY,
  timeZone: 'Europe/Paris',
  currency: 'EUR',
  upcoming: [
    {
      id: 'ord-1',
      reference: 'NP-0101',
      eventDate: '2026-12-05',
      serviceTime: '19:30',
      menuName: 'Winter garden supper',
      guests: 18,
      status: OrderStatus.Confirmed,
      clientName: 'Margaux Feld',
    },
    {
      id: 'ord-2',
      reference: 'NP-0102',
      eventDate: '2026-12-09',
      serviceTime: '20:00',
      menuName: 'Orchard tasting',
      guests: 40,
      status: OrderStatus.Requested,
      clientName: 'Noor Van Acker',
    },
  ],
  requests: [
    {
      id: 'ord-2',
      reference: 'NP-0102',
      clientName: 'Noor Van Acker',
      eventDate: '2026-12-09',
      menuName: 'Orchard tasting',
      guests: 40,
      totalMinor: 156_000,
      currency: 'EUR',
      requestedAt: '2026-11-30T10:00:00.000Z',
    },
  ],
  revenueByMonth: months([0, 0, 42_000, 0, 0, 96_000, 0, 0, 0, 120_050, 61_000, 46_800]).map(
    ({ month, v }) => ({
      month,
      receivedMinor: v + (month === '2026-10' ? 10_000 : 0),
      refundedMinor: month === '2026-10' ? 10_000 : 0,
      revenueMinor: v,
    }),
  ),
  platesByWeek: Array.from({ length: 17 }, (_, i) => {
    // 12 weeks back to 4 ahead of the week of Monday 30 November 2026.
    const start = new Date(Date.UTC(2026, 10, 30 + 7 * (i - 12)));
    return {
      weekStart: start.toISOString().slice(0, 10),
      plates: i === 12 ? 19 : i === 13 ? 42 : i === 8 ? 24 : 0,
    };
  }),
  foodCost: {
    basis:
      'Cost of the plates served at the recipes’ current ingredient costs, divided by those events’ totals without tax.',
    months: months([0, 0, 1, 0, 0, 1, 0, 0, 0, 1, 1, 0]).map(({ month, v }) => ({
      month,
      costMinor: v ? 12_000 : 0,
      netRevenueMinor: v ? (month === '2026-10' ? 38_200 : 50_000) : 0,
      percent: v ? (month === '2026-10' ? 31.4 : 24) : null,
    })),
  },
  alerts: [
    {
      kind: 'lead_time',
      orderId: 'ord-1',
      reference: 'NP-0101',
      eventDate: '2026-12-05',
      message:
        'NP-0101: “Vanilla ice-cream base” needs to start before now to be ready for service.',
    },
    {
      kind: 'balance_overdue',
      orderId: 'ord-3',
      reference: 'NP-0098',
      eventDate: '2026-12-12',
      balanceDueDate: '2026-11-28',
      balanceMinor: 84_000,
      currency: 'EUR',
      message: 'NP-0098: the balance was due on 2026-11-28 and is still open.',
    },
    {
      kind: 'allergy_conflict',
      orderId: 'ord-1',
      reference: 'NP-0101',
      eventDate: '2026-12-05',
      unresolvedPlates: 2,
      message: 'NP-0101: 2 guest plates still conflict with a guest’s requirement.',
    },
  ],
};

/** A new studio: every window present, all zero, nothing booked. */
export const emptyDashboard: Dashboard = {
  ...dashboard,
  upcoming: [],
  requests: [],
  alerts: [],
  revenueByMonth: dashboard.revenueByMonth.map((m) => ({
    ...m,
    receivedMinor: 0,
    refundedMinor: 0,
    revenueMinor: 0,
  })),
  platesByWeek: dashboard.platesByWeek.map((w) => ({ ...w, plates: 0 })),
  foodCost: {
    ...dashboard.foodCost,
    months: dashboard.foodCost.months.map((m) => ({
      ...m,
      costMinor: 0,
      netRevenueMinor: 0,
      percent: null,
    })),
  },
};

export const teamAccounts: UserListItem[] = [
  { ...chefUser, createdAt: '2025-01-02T09:00:00.000Z' },
  { ...staffUser, createdAt: '2025-03-10T09:00:00.000Z' },
  {
    id: 'u-client-9',
    email: 'margaux@example.test',
    name: 'Margaux Feld',
    role: Role.Client,
    createdAt: '2026-02-01T09:00:00.000Z',
  },
];

export const pendingInvitation: Invitation = {
  id: '6f1b7c7e-3f0a-4a44-9c61-2f0f6b1e0a11',
  email: 'lea.marchand@example.test',
  name: 'Léa Marchand',
  role: 'staff',
  invitedBy: chefUser.name,
  // Sent a day and a half ago: the link works for 7 days, so about five and a half are left.
  createdAt: new Date(Date.now() - 36 * 3_600_000).toISOString(),
  expiresAt: new Date(Date.now() + (7 * 24 - 36) * 3_600_000).toISOString(),
};

/** One-time tokens for the accept page: 43 base64url characters, as the API makes them. */
export const tokens = {
  valid: 'V'.repeat(43),
  expired: 'E'.repeat(43),
  used: 'U'.repeat(43),
};
