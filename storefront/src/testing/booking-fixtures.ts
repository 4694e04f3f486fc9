import {
  addIsoDays,
  compareIsoDates,
  DEFAULT_STUDIO_SETTINGS,
  describeCancellationPolicy,
  OrderStatus,
  quoteFromSnapshot,
  type AvailabilityDay,
  type AvailabilityResponse,
  type BookingTerms,
  type DayStatus,
  type IsoDate,
  type OrderDetail,
  type Page,
  type PricingSnapshot,
  type Quote,
} from '@nappe/shared';
import { http, HttpResponse } from 'msw';
import type { PublicAllergens, PublicMenu } from '../features/menus/api/types';
import { clientUser } from './fixtures';

/*
 * Invented menus, days and orders for the booking screens' tests. Quotes are made by the shared
 * quote function (the one the server uses), from an invented price snapshot.
 */

/** "Today" in the studio for every booking test. */
export const TODAY: IsoDate = '2026-06-01';

const noAllergens: PublicAllergens = {
  eu: { contains: [], mayContain: [] },
  us: { contains: [], mayContain: [] },
  advisories: [],
};

export const summerMenu: PublicMenu = {
  id: 'menu-summer',
  name: 'Midsummer Garden',
  description: 'Two plated desserts of the early summer: stone fruit, pistachio and cream.',
  pricePerGuestMinor: 5800,
  currency: 'EUR',
  minGuests: 10,
  maxGuests: 120,
  leadDays: 14,
  photos: [
    {
      url: '/api/files/11111111-1111-4111-8111-111111111111-1200.webp',
      thumbnailUrl: '/api/files/11111111-1111-4111-8111-111111111111-400.webp',
      width: 1200,
      height: 900,
    },
  ],
  allergens: {
    eu: {
      contains: [
        { group: 'eggs', label: 'Eggs', foods: ['egg'] },
        { group: 'milk', label: 'Milk', foods: ['milk'] },
        { group: 'nuts', label: 'Nuts', foods: ['pistachios', 'almonds'] },
      ],
      mayContain: [{ group: 'peanuts', label: 'Peanuts', foods: ['peanuts'] }],
    },
    us: {
      contains: [
        { group: 'milk', label: 'Milk', foods: ['milk'] },
        { group: 'egg', label: 'Egg', foods: ['egg'] },
        { group: 'tree_nuts', label: 'Tree nuts', foods: ['pistachios', 'almonds'] },
      ],
      mayContain: [{ group: 'peanuts', label: 'Peanuts', foods: ['peanuts'] }],
    },
    advisories: [],
  },
  dietary: {
    vegetarian: false,
    vegan: false,
    alcohol: true,
    gelatin: ['beef'],
    animalOrigins: ['milk', 'egg', 'beef'],
  },
  desserts: [
    {
      id: 'dessert-apricot',
      name: 'Roasted apricot, pistachio mousse',
      description: 'Apricots roasted with honey, a pistachio mousse and an almond crumble.',
      photos: [
        {
          url: '/api/files/22222222-2222-4222-8222-222222222222-1200.webp',
          thumbnailUrl: '/api/files/22222222-2222-4222-8222-222222222222-400.webp',
          width: 1200,
          height: 800,
        },
      ],
      allergens: {
        eu: {
          contains: [
            { group: 'milk', label: 'Milk', foods: ['milk'] },
            { group: 'nuts', label: 'Nuts', foods: ['pistachios', 'almonds'] },
          ],
          mayContain: [{ group: 'peanuts', label: 'Peanuts', foods: ['peanuts'] }],
        },
        us: {
          contains: [
            { group: 'milk', label: 'Milk', foods: ['milk'] },
            { group: 'tree_nuts', label: 'Tree nuts', foods: ['pistachios', 'almonds'] },
          ],
          mayContain: [{ group: 'peanuts', label: 'Peanuts', foods: ['peanuts'] }],
        },
        advisories: [],
      },
      dietary: {
        vegetarian: false,
        vegan: false,
        alcohol: false,
        gelatin: ['beef'],
        animalOrigins: ['milk', 'beef'],
      },
      components: [
        { name: 'Pistachio mousse', quantity: 45, unit: 'g', grams: 45 },
        { name: 'Roasted apricots', quantity: 2, unit: 'piece', grams: 60 },
        { name: 'Almond crumble', quantity: 15, unit: 'g', grams: 15 },
      ],
    },
    {
      id: 'dessert-cream',
      name: 'Elderflower cream, cherry and kirsch',
      description: null,
      photos: [],
      allergens: {
        eu: {
          contains: [
            { group: 'eggs', label: 'Eggs', foods: ['egg'] },
            { group: 'milk', label: 'Milk', foods: ['milk'] },
          ],
          mayContain: [],
        },
        us: {
          contains: [
            { group: 'milk', label: 'Milk', foods: ['milk'] },
            { group: 'egg', label: 'Egg', foods: ['egg'] },
          ],
          mayContain: [],
        },
        advisories: [],
      },
      dietary: {
        vegetarian: true,
        vegan: false,
        alcohol: true,
        gelatin: [],
        animalOrigins: ['milk', 'egg'],
      },
      components: [
        { name: 'Elderflower cream', quantity: 70, unit: 'g', grams: 70 },
        { name: 'Cherries in kirsch', quantity: 30, unit: 'g', grams: 30 },
      ],
    },
  ],
};

export const orchardMenu: PublicMenu = {
  id: 'menu-orchard',
  name: 'Orchard Table',
  description: 'A single dessert of poached pear and cocoa, without any animal product.',
  pricePerGuestMinor: 4250,
  currency: 'EUR',
  minGuests: 6,
  maxGuests: 40,
  leadDays: 5,
  photos: [],
  allergens: {
    ...noAllergens,
    eu: { contains: [], mayContain: [{ group: 'sesame', label: 'Sesame', foods: ['sesame'] }] },
  },
  dietary: { vegetarian: true, vegan: true, alcohol: false, gelatin: [], animalOrigins: [] },
  desserts: [
    {
      id: 'dessert-pear',
      name: 'Poached pear, cocoa nib tuile',
      description: null,
      photos: [],
      allergens: {
        ...noAllergens,
        eu: { contains: [], mayContain: [{ group: 'sesame', label: 'Sesame', foods: ['sesame'] }] },
      },
      dietary: { vegetarian: true, vegan: true, alcohol: false, gelatin: [], animalOrigins: [] },
      components: [
        { name: 'Poached pear', quantity: 1, unit: 'piece', grams: 90 },
        { name: 'Cocoa nib tuile', quantity: 8, unit: 'g', grams: 8 },
      ],
    },
  ],
};

export const MENUS = [summerMenu, orchardMenu];

export function pageOf<T>(items: T[], page = 1, pageSize = 20): Page<T> {
  return { items, total: items.length, page, pageSize };
}

/** The days the availability fake answers with: any not listed is open with plenty left. */
export const SPECIAL_DAYS: Record<IsoDate, { status: DayStatus; remainingPlates?: number }> = {
  '2026-07-03': { status: 'full', remainingPlates: 0 },
  '2026-07-14': { status: 'blackout' },
  '2026-07-18': { status: 'open', remainingPlates: 96 },
  '2026-07-25': { status: 'open', remainingPlates: 30 },
};

export function availabilityFor(
  menu: PublicMenu,
  from: IsoDate,
  to: IsoDate,
): AvailabilityResponse {
  const earliest = addIsoDays(TODAY, menu.leadDays);
  const days: AvailabilityDay[] = [];
  for (let d = from; compareIsoDates(d, to) <= 0; d = addIsoDays(d, 1)) {
    const special = SPECIAL_DAYS[d];
    const status: DayStatus =
      compareIsoDates(d, TODAY) < 0
        ? 'past'
        : special?.status === 'blackout'
          ? 'blackout'
          : compareIsoDates(d, earliest) < 0
            ? 'too_soon'
            : (special?.status ?? 'open');
    days.push({
      date: d,
      status,
      remainingPlates: status === 'open' ? (special?.remainingPlates ?? 240) : 0,
    });
  }
  return {
    menuId: menu.id,
    timeZone: 'Europe/Paris',
    today: TODAY,
    earliestDate: earliest,
    platesPerGuest: menu.desserts.length,
    days,
  };
}

export const pricing: PricingSnapshot = {
  menuId: summerMenu.id,
  menuName: summerMenu.name,
  pricePerGuestMinor: summerMenu.pricePerGuestMinor,
  minGuests: summerMenu.minGuests,
  maxGuests: summerMenu.maxGuests,
  currency: 'EUR',
  taxRateBp: DEFAULT_STUDIO_SETTINGS.taxRateBp,
  pricesIncludeTax: true,
  depositPercent: DEFAULT_STUDIO_SETTINGS.depositPercent,
  balanceDueDaysBefore: DEFAULT_STUDIO_SETTINGS.balanceDueDaysBefore,
  finalGuestCountDaysBefore: DEFAULT_STUDIO_SETTINGS.finalGuestCountDaysBefore,
  cancellationTiers: DEFAULT_STUDIO_SETTINGS.cancellationTiers,
};

export function quoteFor(guestCount: number, eventDate: IsoDate = '2026-07-18'): Quote {
  return quoteFromSnapshot(pricing, { guestCount, eventDate, today: TODAY });
}

export const bookingTerms: BookingTerms = {
  currency: 'EUR',
  pricesIncludeTax: true,
  taxRateBp: 2100,
  depositPercent: 30,
  balanceDueDaysBefore: 14,
  finalGuestCountDaysBefore: 7,
  cancellationPolicy: describeCancellationPolicy(DEFAULT_STUDIO_SETTINGS.cancellationTiers),
  terms: [
    'The studio prepares and plates the desserts of the menu booked, for the number of guests booked.',
    'Allergies and diets given with the booking are checked against every component.',
  ],
};

export function makeOrder(overrides: Partial<OrderDetail> = {}): OrderDetail {
  const quote = quoteFor(40);
  return {
    id: 'order-1',
    reference: 'N-2026-0042',
    status: OrderStatus.Requested,
    menuId: summerMenu.id,
    menuName: summerMenu.name,
    eventDate: '2026-07-18',
    serviceTime: '21:30',
    guestCount: 40,
    currency: 'EUR',
    totalMinor: quote.totalMinor,
    paidMinor: quote.depositMinor,
    balanceMinor: quote.balanceMinor,
    balanceDueDate: quote.balanceDueDate,
    clientName: clientUser.name,
    createdAt: '2026-06-01T09:30:00Z',
    venueAddressLines: ['Domaine des Tilleuls', '12 chemin des Vignes', '69005 Lyon'],
    occasion: 'Wedding',
    contactPhone: '+33612345678',
    clientEmail: clientUser.email,
    quote,
    guests: [
      {
        label: 'Aunt Mireille',
        table: '1',
        allergens: ['milk', 'eggs'],
        diets: ['vegetarian'],
        notes: 'Carries an adrenaline pen',
      },
      { label: 'Léon', allergens: ['nuts'], diets: [] },
    ],
    payments: [
      {
        id: 'pay-1',
        kind: 'deposit',
        status: 'succeeded',
        amountMinor: quote.depositMinor,
        currency: 'EUR',
        createdAt: '2026-06-01T09:31:00Z',
        settledAt: '2026-06-01T09:32:00Z',
        receiptAvailable: true,
      },
    ],
    timeline: [
      {
        id: 'ev-1',
        at: '2026-06-01T09:30:00Z',
        actor: { role: 'client', name: clientUser.name },
        fromStatus: null,
        toStatus: OrderStatus.PendingPayment,
        summary: 'Booking made, waiting for payment',
        reason: null,
      },
      {
        id: 'ev-2',
        at: '2026-06-01T09:32:00Z',
        actor: { role: 'system', name: null },
        fromStatus: OrderStatus.PendingPayment,
        toStatus: OrderStatus.Requested,
        summary: 'Deposit of €696.00 received',
        reason: null,
      },
    ],
    actions: { pay: 'balance', cancel: true, changeGuests: true },
    changeGuestsUntil: '2026-07-11',
    ...overrides,
  };
}

/** The public menu endpoints, answering from MENUS. */
export const menuHandlers = [
  http.get('/api/menus', ({ request }) => {
    const url = new URL(request.url);
    const pageSize = Number(url.searchParams.get('pageSize') ?? 20);
    return HttpResponse.json(pageOf(MENUS.slice(0, pageSize), 1, pageSize));
  }),
  http.get('/api/menus/:id', ({ params }) => {
    const menu = MENUS.find((m) => m.id === params.id);
    return menu
      ? HttpResponse.json(menu)
      : HttpResponse.json(
          { statusCode: 404, message: 'No such menu.', error: 'Not Found' },
          { status: 404 },
        );
  }),
];

/** Availability, terms and quotes, as the booking API answers them for MENUS. */
export const bookingHandlers = [
  http.get('/api/availability', ({ request }) => {
    const url = new URL(request.url);
    const menu = MENUS.find((m) => m.id === url.searchParams.get('menuId'));
    if (!menu)
      return HttpResponse.json({ statusCode: 404, message: 'No such menu.' }, { status: 404 });
    return HttpResponse.json(
      availabilityFor(
        menu,
        url.searchParams.get('from') ?? TODAY,
        url.searchParams.get('to') ?? TODAY,
      ),
    );
  }),
  http.get('/api/booking-terms', () => HttpResponse.json(bookingTerms)),
  http.post('/api/quotes', async ({ request }) => {
    const body = (await request.json()) as { guestCount: number; eventDate: string };
    return HttpResponse.json(quoteFor(body.guestCount, body.eventDate));
  }),
];
