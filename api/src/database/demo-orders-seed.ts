import { randomUUID } from 'node:crypto';
import {
  addIsoDays,
  computeQuote,
  dateInTimeZone,
  formatMoney,
  menuBookingRules,
  OrderStatus,
  platesForGuests,
  type GuestRequirement,
  type Substitution,
} from '@nappe/shared';
import type { DataSource, EntityManager } from 'typeorm';
import { OrderSubstitutionEntity } from '../allergy-notes/entities/order-substitution.entity.js';
import { menuFromRows } from '../kitchen/catalogue/catalogue-rows.js';
import { MenuDessertEntity } from '../kitchen/entities/menu-dessert.entity.js';
import { MenuEntity } from '../kitchen/entities/menu.entity.js';
import { OrderEventEntity } from '../orders/entities/order-event.entity.js';
import { OrderGuestEntity } from '../orders/entities/order-guest.entity.js';
import { OrderEntity } from '../orders/entities/order.entity.js';
import { PaymentEntity } from '../payments/entities/payment.entity.js';
import { loadStudio } from '../studio/booking-settings.js';
import { User } from '../users/entities/user.entity.js';
import { demoUuid } from './demo-catalogue-seed.js';

/** Invented bookings of the demo client, so the screens have something to show. */
interface DemoOrder {
  demoId: string;
  menuDemoId: string;
  daysAhead: number;
  serviceTime: string;
  guestCount: number;
  occasion: string;
  venue: string[];
  status: OrderStatus.Requested | OrderStatus.Confirmed;
  guests: GuestRequirement[];
  /** Plates the chef already changed: guest position, dessert, components (demo ids). */
  substitutions?: DemoSubstitution[];
}

interface DemoSubstitution {
  guest: number;
  dessert: string;
  leaveOut?: string[];
  replace?: Array<[string, string]>;
  note?: string;
}

/** Confirmed events over the next two weeks for the prep plan, with real allergy conflicts. */
const PLANNING_ORDERS: DemoOrder[] = [
  {
    demoId: 'order-plan-engagement',
    menuDemoId: 'menu-garden-supper',
    daysAhead: 3,
    serviceTime: '19:30',
    guestCount: 18,
    occasion: 'Engagement dinner',
    venue: ['Huis Verbeke', 'Lange Steenstraat 41', '9000 Gent'],
    status: OrderStatus.Confirmed,
    guests: [
      { label: 'Amira', table: '1', allergens: ['tree_nuts'], diets: [] },
      { label: 'Bastien', table: '2', allergens: [], diets: ['vegetarian'] },
    ],
    substitutions: [
      {
        guest: 0,
        dessert: 'des-pistachio-frost',
        leaveOut: ['rec-pistachio-parfait'],
        replace: [['rec-almond-crumble', 'rec-rye-crumble']],
        note: 'Extra ice cream in place of the parfait',
      },
    ],
  },
  {
    demoId: 'order-plan-book-club',
    menuDemoId: 'menu-autumn-orchard',
    daysAhead: 4,
    serviceTime: '20:00',
    guestCount: 12,
    occasion: 'Book club tenth year',
    venue: ['Bibliotheek Zaal', 'Kouter 29', '9000 Gent'],
    status: OrderStatus.Confirmed,
    guests: [{ label: 'Greet', table: '1', allergens: ['gluten'], diets: [] }],
  },
  {
    demoId: 'order-plan-wedding',
    menuDemoId: 'menu-celebration-trio',
    daysAhead: 6,
    serviceTime: '21:00',
    guestCount: 60,
    occasion: 'Wedding dinner',
    venue: ['Kasteel Wissekerke', 'Kasteelstraat 1', '9290 Berlare'],
    status: OrderStatus.Confirmed,
    guests: [
      { label: 'Table 3, seat 4', table: '3', allergens: ['nuts'], diets: [] },
      { label: 'Table 5, seat 1', table: '5', allergens: [], diets: ['no_alcohol'] },
      { label: 'Table 6, seat 2', table: '6', allergens: [], diets: ['vegetarian'] },
    ],
    substitutions: [
      {
        guest: 0,
        dessert: 'des-vanilla-crumble-bowl',
        replace: [['rec-almond-crumble', 'rec-rye-crumble']],
      },
    ],
  },
  {
    demoId: 'order-plan-retirement',
    menuDemoId: 'menu-garden-supper',
    daysAhead: 7,
    serviceTime: '19:00',
    guestCount: 30,
    occasion: 'Retirement party',
    venue: ['Het Pakhuis', 'Schuurkenstraat 4', '9000 Gent'],
    status: OrderStatus.Confirmed,
    guests: [{ label: 'Mr Claes', table: '2', allergens: [], diets: ['no_gelatin'] }],
  },
  {
    demoId: 'order-plan-tasting',
    menuDemoId: 'menu-winter-tasting',
    daysAhead: 9,
    serviceTime: '20:30',
    guestCount: 16,
    occasion: 'Winter tasting evening',
    venue: ['Atelier Ondine, back room', 'Sint-Pietersnieuwstraat 12', '9000 Gent'],
    status: OrderStatus.Confirmed,
    guests: [{ label: 'Lotte', table: '1', allergens: ['sesame'], diets: [] }],
  },
  {
    demoId: 'order-plan-christening',
    menuDemoId: 'menu-autumn-orchard',
    daysAhead: 10,
    serviceTime: '15:00',
    guestCount: 22,
    occasion: 'Christening lunch',
    venue: ['Zaal De Kring', 'Kerkstraat 7', '9050 Gentbrugge'],
    status: OrderStatus.Confirmed,
    guests: [
      { label: 'Grandma Jo', table: '1', allergens: ['gluten'], diets: [] },
      { label: 'Noor', table: '2', allergens: ['almond'], diets: [] },
    ],
    substitutions: [
      {
        guest: 1,
        dessert: 'des-fig-leaf-smoked-tea',
        leaveOut: ['rec-almond-crumble'],
      },
    ],
  },
  {
    demoId: 'order-plan-board',
    menuDemoId: 'menu-celebration-trio',
    daysAhead: 12,
    serviceTime: '20:00',
    guestCount: 24,
    occasion: 'Board dinner',
    venue: ['Hotel Harmony', 'Kraanlei 37', '9000 Gent'],
    status: OrderStatus.Confirmed,
    guests: [{ label: 'Ms Dubois', table: '1', allergens: [], diets: ['vegan'] }],
  },
  {
    demoId: 'order-plan-garden-party',
    menuDemoId: 'menu-garden-supper',
    daysAhead: 13,
    serviceTime: '18:30',
    guestCount: 40,
    occasion: 'Summer garden party',
    venue: ['Tuin Van Damme', 'Heiveldstraat 88', '9040 Sint-Amandsberg'],
    status: OrderStatus.Confirmed,
    guests: [
      { label: 'Yusuf', table: '4', allergens: [], diets: ['vegetarian'] },
      { label: 'Elise', table: '4', allergens: ['tree_nuts'], diets: [] },
    ],
    substitutions: [
      {
        guest: 0,
        dessert: 'des-pistachio-frost',
        leaveOut: ['rec-pistachio-parfait'],
      },
    ],
  },
];

const DEMO_ORDERS: DemoOrder[] = [
  {
    demoId: 'order-birthday-garden',
    menuDemoId: 'menu-garden-supper',
    daysAhead: 45,
    serviceTime: '20:00',
    guestCount: 24,
    occasion: 'Fiftieth birthday dinner',
    venue: ['Orangerie Ter Linden', 'Kouter 8', '9000 Gent'],
    status: OrderStatus.Requested,
    guests: [
      { label: 'Table 1, seat 3', table: '1', allergens: ['nuts'], diets: [] },
      { label: 'Jonas', table: '2', allergens: [], diets: ['no_alcohol'] },
    ],
  },
  {
    demoId: 'order-company-trio',
    menuDemoId: 'menu-celebration-trio',
    daysAhead: 21,
    serviceTime: '21:15',
    guestCount: 40,
    occasion: 'Company anniversary dinner',
    venue: ['Hal 14', 'Dok Noord 14', '9000 Gent'],
    status: OrderStatus.Confirmed,
    guests: [
      {
        label: 'Table 4, seat 1',
        table: '4',
        allergens: ['milk'],
        diets: ['vegan'],
        notes: 'Strictly plant-based',
      },
    ],
  },
];

/**
 * Adds the demo client's two invented bookings — one paid and waiting for the chef, one
 * confirmed — with their deposits in the ledger marked `seeded` (no money moved; the payment
 * service was never called). Dates are counted from today. Does nothing if they exist.
 */
export async function seedDemoOrders(dataSource: DataSource, clientEmail: string): Promise<number> {
  return dataSource.transaction(async (m) => {
    const client = await m.findOneBy(User, { email: clientEmail });
    if (!client) return 0;
    const studio = await loadStudio(m);
    const now = new Date();
    const today = dateInTimeZone(now, studio.settings.timeZone);
    let made = 0;
    for (const [index, demo] of [...DEMO_ORDERS, ...PLANNING_ORDERS].entries()) {
      const id = demoUuid(demo.demoId);
      if (await m.findOneBy(OrderEntity, { id })) continue;
      const menuRow = await m.findOneBy(MenuEntity, { id: demoUuid(demo.menuDemoId) });
      if (!menuRow) continue;
      const menu = menuFromRows(
        menuRow,
        await m.find(MenuDessertEntity, {
          where: { menuId: menuRow.id },
          order: { position: 'ASC' },
        }),
      );
      const eventDate = addIsoDays(today, demo.daysAhead);
      const quote = computeQuote({
        menu,
        settings: studio.settings,
        guestCount: demo.guestCount,
        eventDate,
        today,
      });
      const at = (minutesAgo: number) => new Date(now.getTime() - minutesAgo * 60_000);
      await m.insert(OrderEntity, {
        id,
        reference: `N-${today.slice(0, 4)}-${String(index + 1).padStart(4, '0')}`,
        clientId: client.id,
        menuId: menu.id,
        status: demo.status,
        eventDate,
        serviceTime: demo.serviceTime,
        venueAddressLines: demo.venue,
        occasion: demo.occasion,
        contactPhone: '+32470000000',
        guestCount: demo.guestCount,
        plates: platesForGuests(demo.guestCount, menuBookingRules(menu).platesPerGuest),
        currency: quote.currency,
        totalMinor: quote.totalMinor,
        retainedMinor: 0,
        pricing: quote.pricing,
        quote,
        clientRequestId: `seed-${demo.demoId}`,
        requestHash: 'seed',
        holdExpiresAt: null,
        amountVersion: 2,
        createdAt: at(3 * 24 * 60),
        updatedAt: at(60),
      });
      await m.insert(
        OrderGuestEntity,
        demo.guests.map((g, position) => ({
          orderId: id,
          position,
          label: g.label,
          tableLabel: g.table ?? null,
          allergens: g.allergens,
          diets: g.diets,
          notes: g.notes ?? null,
        })),
      );
      const paidAt = at(3 * 24 * 60 - 5);
      await m.insert(PaymentEntity, {
        id: demoUuid(`${demo.demoId}/deposit`),
        orderId: id,
        kind: quote.paymentPlan === 'full' ? 'full' : 'deposit',
        status: 'succeeded',
        amountMinor: quote.depositMinor,
        currency: quote.currency,
        idempotencyKey: `seed:${demo.demoId}:deposit`,
        providerSessionId: null,
        checkoutUrl: null,
        checkoutExpiresAt: null,
        providerPaymentIntentId: null,
        providerRefundId: null,
        refundOfPaymentId: null,
        operation: null,
        targetGuestCount: null,
        failureMessage: null,
        seeded: true,
        createdAt: at(3 * 24 * 60),
        settledAt: paidAt,
        updatedAt: paidAt,
      });
      const events: Array<Partial<OrderEventEntity>> = [
        {
          actorUserId: client.id,
          actorRole: 'client',
          fromStatus: null,
          toStatus: OrderStatus.PendingPayment,
          summary: `Booked ${menu.name} for ${demo.guestCount} guests; awaiting payment`,
          at: at(3 * 24 * 60),
        },
        {
          actorUserId: null,
          actorRole: 'system',
          fromStatus: OrderStatus.PendingPayment,
          toStatus: OrderStatus.Requested,
          summary: `Deposit of ${formatMoney(quote.depositMinor, quote.currency)} received (demo record)`,
          at: paidAt,
        },
      ];
      if (demo.status === OrderStatus.Confirmed) {
        const chef = await m.findOneBy(User, { role: 'chef' as User['role'] });
        events.push({
          actorUserId: chef?.id ?? null,
          actorRole: chef ? 'chef' : 'system',
          fromStatus: OrderStatus.Requested,
          toStatus: OrderStatus.Confirmed,
          summary: 'Confirmed by the chef; added to the prep plan',
          at: at(2 * 24 * 60),
        });
      }
      const studioChef = await m.findOneBy(User, { role: 'chef' as User['role'] });
      for (const sub of demo.substitutions ?? []) {
        const guest = demo.guests[sub.guest]!;
        const changes: Substitution[] = [
          ...(sub.leaveOut ?? []).map((r) => ({ componentRecipeId: demoUuid(r) })),
          ...(sub.replace ?? []).map(([from, to]) => ({
            componentRecipeId: demoUuid(from),
            replacementRecipeId: demoUuid(to),
          })),
        ];
        await m.insert(OrderSubstitutionEntity, {
          id: demoUuid(`${demo.demoId}/sub/${sub.guest}/${sub.dessert}`),
          orderId: id,
          guestPosition: sub.guest,
          guestLabel: guest.label,
          dessertId: demoUuid(sub.dessert),
          changes,
          note: sub.note ?? null,
          recordedBy: studioChef?.id ?? null,
          recordedAt: at(2 * 24 * 60 + 30),
        });
        events.push({
          actorUserId: studioChef?.id ?? null,
          actorRole: studioChef ? 'chef' : 'system',
          summary: `Substitution for ${guest.label} recorded (demo record)`,
          at: at(2 * 24 * 60 - 5),
        });
      }
      await insertEvents(m, id, events);
      made += 1;
    }
    return made;
  });
}

async function insertEvents(
  m: EntityManager,
  orderId: string,
  events: Array<Partial<OrderEventEntity>>,
): Promise<void> {
  for (const [i, event] of events.entries()) {
    await m.insert(OrderEventEntity, {
      id: randomUUID(),
      orderId,
      seq: i + 1,
      reason: null,
      ...event,
    });
  }
}
