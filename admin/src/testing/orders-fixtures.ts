import {
  computeQuote,
  DEFAULT_STUDIO_SETTINGS,
  formatMoney,
  OrderStatus,
  type IsoDate,
  type OrderDetail,
  type OrderEvent,
  type OrderGuest,
  type OrderSummary,
  type PaymentRecord,
} from '@nappe/shared';
import type {
  AccessLogEntry,
  AllergySummary,
  CalendarSettings,
} from '../features/orders/api/types';
import { MENUS } from './kitchen-fixtures';

/**
 * Invented bookings for the Orders and Calendar tests. Quotes come from the shared
 * `computeQuote` (the function the API books with) over the kitchen fixtures' menu "Garden
 * supper" (€18.00 a guest, 8–40 guests) and the default studio settings (30 % deposit), so the
 * money on screen is what the server would hold.
 */

/** The tests' "now": Friday 6 March 2026, 10:00 in Paris (CET, UTC+1 — IANA tz database). */
export const ORDERS_NOW = '2026-03-06T09:00:00.000Z';
export const ORDERS_TODAY: IsoDate = '2026-03-06';

export const STUDIO_TIME_ZONE = 'Europe/Paris';

const MENU = MENUS[0]!;
const SETTINGS = { ...DEFAULT_STUDIO_SETTINGS, timeZone: STUDIO_TIME_ZONE };

export const calendarSettings: CalendarSettings = {
  dailyPlateCapacity: 120,
  blackoutDates: ['2026-03-25'],
  timeZone: STUDIO_TIME_ZONE,
};

export interface FixtureOrder {
  detail: OrderDetail;
  /** What the allergy notes say is still unsafe on a guest's plate. */
  unresolved: AllergySummary['unresolved'];
  accessLog: AccessLogEntry[];
}

export interface OrderSpec {
  id: string;
  reference: string;
  status: OrderStatus;
  eventDate: IsoDate;
  serviceTime?: string;
  guestCount?: number;
  clientName?: string;
  createdAt?: string;
  guests?: OrderGuest[];
  unresolved?: AllergySummary['unresolved'];
  /** Paid in full at booking instead of the deposit. */
  paidInFull?: boolean;
}

const iso = (date: IsoDate, time = '10:00') => new Date(`${date}T${time}:00Z`).toISOString();

/** A booking as the API's detail describes it, with its ledger and audit trail. */
export function makeOrder(spec: OrderSpec): FixtureOrder {
  const guestCount = spec.guestCount ?? 18;
  const booked = spec.createdAt ?? iso('2026-02-20');
  const bookedOn = booked.slice(0, 10);
  const quote = computeQuote({
    menu: MENU,
    settings: SETTINGS,
    guestCount,
    eventDate: spec.eventDate,
    today: bookedOn < spec.eventDate ? bookedOn : spec.eventDate,
  });
  const paid = spec.status !== OrderStatus.PendingPayment && spec.status !== OrderStatus.Expired;
  const amount = spec.paidInFull ? quote.totalMinor : quote.depositMinor;
  const payments: PaymentRecord[] = paid
    ? [
        {
          id: `${spec.id}-pay-1`,
          kind: spec.paidInFull ? 'full' : 'deposit',
          status: 'succeeded',
          amountMinor: amount,
          currency: 'EUR',
          createdAt: booked,
          settledAt: booked,
          receiptAvailable: true,
        },
      ]
    : [];
  const clientName = spec.clientName ?? 'Odile Marchetti';
  const timeline: OrderEvent[] = [
    {
      id: `${spec.id}-ev-1`,
      at: booked,
      actor: { role: 'client', name: clientName },
      fromStatus: null,
      toStatus: OrderStatus.PendingPayment,
      summary: `Booked ${MENU.name} for ${guestCount} guests; awaiting payment`,
      reason: null,
    },
  ];
  if (paid) {
    timeline.push({
      id: `${spec.id}-ev-2`,
      at: booked,
      actor: { role: 'system', name: null },
      fromStatus: OrderStatus.PendingPayment,
      toStatus: OrderStatus.Requested,
      summary: `Deposit of ${formatMoney(amount, 'EUR')} received`,
      reason: null,
    });
  }
  if (spec.status === OrderStatus.Confirmed || spec.status === OrderStatus.Completed) {
    timeline.push({
      id: `${spec.id}-ev-3`,
      at: iso(bookedOn, '15:00'),
      actor: { role: 'chef', name: 'Inès Carreau' },
      fromStatus: OrderStatus.Requested,
      toStatus: OrderStatus.Confirmed,
      summary: 'Confirmed by the chef; added to the prep plan',
      reason: null,
    });
  }
  const paidMinor = paid ? amount : 0;
  const summary: OrderSummary = {
    id: spec.id,
    reference: spec.reference,
    status: spec.status,
    menuId: MENU.id,
    menuName: MENU.name,
    eventDate: spec.eventDate,
    serviceTime: spec.serviceTime ?? '19:30',
    guestCount,
    plates: guestCount * MENU.dessertIds.length,
    currency: 'EUR',
    totalMinor: quote.totalMinor,
    paidMinor,
    balanceMinor: quote.totalMinor - paidMinor,
    balanceDueDate: quote.balanceDueDate,
    clientName,
    createdAt: booked,
  };
  return {
    detail: {
      ...summary,
      venueAddressLines: ['Maison Verbeke', '41 quai des Tanneurs', '69002 Lyon'],
      occasion: 'Engagement dinner',
      contactPhone: '+33612345678',
      clientEmail: 'odile.marchetti@example.test',
      quote,
      guests: spec.guests ?? [],
      payments,
      timeline,
      actions: { pay: null, cancel: false, changeGuests: false },
      changeGuestsUntil: null,
    },
    unresolved: spec.unresolved ?? [],
    accessLog: [
      {
        at: '2026-03-05T08:12:00.000Z',
        userId: 'u-staff-1',
        name: 'Tomás Reyes',
        role: 'staff',
        what: 'briefing',
      },
      {
        at: '2026-03-04T16:40:00.000Z',
        userId: 'u-chef-1',
        name: 'Inès Carreau',
        role: 'chef',
        what: 'allergy_notes',
      },
    ],
  };
}

/** A request with a tree-nut guest whose plate still carries almonds. */
export const REQUEST_WITH_CONFLICT = (): FixtureOrder =>
  makeOrder({
    id: 'ord-41',
    reference: 'N-2026-0041',
    status: OrderStatus.Requested,
    eventDate: '2026-03-20',
    serviceTime: '19:30',
    guestCount: 18,
    createdAt: '2026-03-02T10:00:00.000Z',
    guests: [
      { label: 'Amira', table: '1', allergens: ['tree_nuts'], diets: [] },
      { label: 'Bastien', table: '2', allergens: [], diets: ['vegetarian'] },
    ],
    unresolved: [
      {
        guestId: 0,
        guest: 'Amira',
        dessertName: 'Tartlet and vanilla ice',
        messages: ['Contains almond (tree nuts) in Almond crumble.'],
      },
    ],
  });

export const CLEAN_REQUEST = (): FixtureOrder =>
  makeOrder({
    id: 'ord-40',
    reference: 'N-2026-0040',
    status: OrderStatus.Requested,
    eventDate: '2026-04-02',
    serviceTime: '20:00',
    guestCount: 12,
    clientName: 'Hugo Lefebvre',
    createdAt: '2026-03-01T10:00:00.000Z',
  });

export const CONFIRMED_ORDER = (): FixtureOrder =>
  makeOrder({
    id: 'ord-38',
    reference: 'N-2026-0038',
    status: OrderStatus.Confirmed,
    eventDate: '2026-03-14',
    serviceTime: '20:00',
    guestCount: 24,
    clientName: 'Sanne de Wit',
    createdAt: '2026-02-25T10:00:00.000Z',
  });

/** The orders most tests start from. */
export function standardOrders(): FixtureOrder[] {
  return [
    REQUEST_WITH_CONFLICT(),
    CLEAN_REQUEST(),
    CONFIRMED_ORDER(),
    makeOrder({
      id: 'ord-35',
      reference: 'N-2026-0035',
      status: OrderStatus.Completed,
      eventDate: '2026-02-27',
      guestCount: 10,
      clientName: 'Jonas Peeters',
      createdAt: '2026-02-10T10:00:00.000Z',
    }),
    makeOrder({
      id: 'ord-37',
      reference: 'N-2026-0037',
      status: OrderStatus.Cancelled,
      eventDate: '2026-03-14',
      guestCount: 30,
      clientName: 'Maud Lambert',
      createdAt: '2026-02-24T10:00:00.000Z',
    }),
  ];
}

/** `count` bookings numbered so each page's rows are recognisable (newest booking first). */
export function manyOrders(count: number): FixtureOrder[] {
  return Array.from({ length: count }, (_, i) =>
    makeOrder({
      id: `ord-m${i + 1}`,
      reference: `N-2026-${String(i + 1).padStart(4, '0')}`,
      status: i % 3 === 0 ? OrderStatus.Requested : OrderStatus.Confirmed,
      eventDate: `2026-04-${String((i % 28) + 1).padStart(2, '0')}`,
      guestCount: 8 + (i % 20),
      clientName: `Client ${i + 1}`,
      createdAt: new Date(Date.UTC(2026, 0, 1, 9) + i * 3_600_000).toISOString(),
    }),
  );
}
