import { Injectable } from '@nestjs/common';
import {
  OrderStatus,
  addIsoDays,
  checkOrderLeadTime,
  dateInTimeZone,
  foodCostPercent,
  isKitchenError,
  isoDateFromDayNumber,
  isoDayNumber,
  plateCostExactMinor,
  type IsoDate,
  type KitchenIndex,
} from '@nappe/shared';
import { DataSource, In, MoreThanOrEqual, type EntityManager } from 'typeorm';
import { OrderSubstitutionEntity } from '../allergy-notes/entities/order-substitution.entity.js';
import { allergyNotesOf, prepOrderOf } from '../allergy-notes/order-allergy-notes.js';
import { Clock } from '../common/clock.js';
import { KitchenCatalogueService } from '../kitchen/catalogue/kitchen-catalogue.service.js';
import { OrderGuestEntity } from '../orders/entities/order-guest.entity.js';
import { OrderEntity } from '../orders/entities/order.entity.js';
import { balanceOf, summarizeLedger } from '../orders/order-money.js';
import { confirmationTimes } from '../orders/order-records.js';
import { PaymentEntity } from '../payments/entities/payment.entity.js';
import { StudioSettings } from '../studio/entities/studio-settings.entity.js';
import { User } from '../users/entities/user.entity.js';
import type {
  Dashboard,
  DashboardAlert,
  FoodCostMonth,
  PlatesWeek,
  RevenueMonth,
} from './dashboard.types.js';

export const UPCOMING_DAYS = 14;
export const REVENUE_MONTHS = 12;
export const PLATE_WEEKS_BACK = 12;
export const PLATE_WEEKS_AHEAD = 4;

/** `YYYY-MM` of the month `offset` months after `month`. */
export function addMonths(month: string, offset: number): string {
  const [y, m] = month.split('-').map(Number) as [number, number];
  const index = y * 12 + (m - 1) + offset;
  return `${Math.floor(index / 12)}-${String((index % 12) + 1).padStart(2, '0')}`;
}

/** The Monday of the ISO 8601 week holding `date` (1970-01-01, day 0, was a Thursday). */
export function isoWeekStart(date: IsoDate): IsoDate {
  const day = isoDayNumber(date);
  return isoDateFromDayNumber(day - ((((day + 3) % 7) + 7) % 7));
}

const BOOKED: OrderStatus[] = [OrderStatus.Requested, OrderStatus.Confirmed];
const PLATES: OrderStatus[] = [OrderStatus.Confirmed, OrderStatus.Completed];

/**
 * The chef's dashboard, read in one transaction so the figures agree with each other. Money is
 * integer minor units from the ledger; plates and dates from the orders; food cost from the
 * recipes' costs as they are today (not as they were when the event was served).
 */
@Injectable()
export class InsightsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock,
    private readonly catalogue: KitchenCatalogueService,
  ) {}

  dashboard(): Promise<Dashboard> {
    return this.dataSource.transaction((m) => this.build(m));
  }

  private async build(m: EntityManager): Promise<Dashboard> {
    const studio = await m.findOneByOrFail(StudioSettings, { id: 1 });
    const now = this.clock.now();
    const tz = studio.timeZone;
    const today = dateInTimeZone(now, tz);
    const thisMonth = today.slice(0, 7);
    const firstMonth = addMonths(thisMonth, -(REVENUE_MONTHS - 1));
    const months = Array.from({ length: REVENUE_MONTHS }, (_, i) => addMonths(firstMonth, i));
    const firstWeek = addIsoDays(isoWeekStart(today), -7 * PLATE_WEEKS_BACK);
    const weeks = Array.from({ length: PLATE_WEEKS_BACK + PLATE_WEEKS_AHEAD + 1 }, (_, i) =>
      addIsoDays(firstWeek, 7 * i),
    );
    const lastDay = addIsoDays(weeks[weeks.length - 1]!, 6);
    const earliest = [`${firstMonth}-01`, firstWeek].sort()[0]!;

    // Every order the dashboard can show: events from the earliest window on, and all requests.
    const orders = await m
      .createQueryBuilder(OrderEntity, 'o')
      .where('o.eventDate >= :earliest', { earliest })
      .orWhere('o.status = :requested', { requested: OrderStatus.Requested })
      .getMany();
    const clientIds = [...new Set(orders.map((o) => o.clientId))];
    const clients = clientIds.length ? await m.findBy(User, { id: In(clientIds) }) : [];
    const clientName = new Map(clients.map((c) => [c.id, c.name]));
    const nameOf = (o: OrderEntity) => clientName.get(o.clientId) ?? '';

    const horizon = addIsoDays(today, UPCOMING_DAYS - 1);
    const upcoming = orders
      .filter(
        (o) =>
          [...BOOKED, OrderStatus.Completed].includes(o.status) &&
          o.eventDate >= today &&
          o.eventDate <= horizon,
      )
      .sort(
        (a, b) =>
          a.eventDate.localeCompare(b.eventDate) ||
          a.serviceTime.localeCompare(b.serviceTime) ||
          a.reference.localeCompare(b.reference),
      )
      .map((o) => ({
        id: o.id,
        reference: o.reference,
        eventDate: o.eventDate,
        serviceTime: o.serviceTime,
        menuName: o.pricing.menuName,
        guests: o.guestCount,
        status: o.status,
        clientName: nameOf(o),
      }));

    const requests = orders
      .filter((o) => o.status === OrderStatus.Requested)
      .sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime())
      .map((o) => ({
        id: o.id,
        reference: o.reference,
        clientName: nameOf(o),
        eventDate: o.eventDate,
        menuName: o.pricing.menuName,
        guests: o.guestCount,
        totalMinor: o.totalMinor,
        currency: o.currency,
        requestedAt: o.createdAt.toISOString(),
      }));

    const revenueByMonth = await this.revenue(m, months, tz, studio.currency);

    const plates = new Map<string, number>(weeks.map((w) => [w, 0]));
    for (const o of orders) {
      if (!PLATES.includes(o.status) || o.eventDate < firstWeek || o.eventDate > lastDay) continue;
      const week = isoWeekStart(o.eventDate);
      plates.set(week, (plates.get(week) ?? 0) + o.plates);
    }
    const platesByWeek: PlatesWeek[] = weeks.map((weekStart) => ({
      weekStart,
      plates: plates.get(weekStart) ?? 0,
    }));

    const { index } = await this.catalogue.load(m);
    const foodCost = this.foodCost(index, orders, months, today, studio.currency);
    const alerts = await this.alerts(m, index, orders, studio, today, now);

    return {
      today,
      timeZone: tz,
      currency: studio.currency,
      upcoming,
      requests,
      revenueByMonth,
      platesByWeek,
      foodCost: {
        basis:
          'Cost of the plates served (guests × the menu’s desserts, spare plates and substitutions left out) at the recipes’ current ingredient costs, divided by those events’ totals without tax.',
        months: foodCost,
      },
      alerts,
    };
  }

  /** Succeeded payments in minus succeeded refunds, by the month they settled (studio zone). */
  private async revenue(
    m: EntityManager,
    months: string[],
    tz: string,
    currency: string,
  ): Promise<RevenueMonth[]> {
    // A day of margin either side of the window: the month is decided in the studio's zone below.
    const from = new Date(Date.parse(`${months[0]!}-01T00:00:00Z`) - 86_400_000);
    const payments = await m.find(PaymentEntity, {
      where: { status: 'succeeded', currency, settledAt: MoreThanOrEqual(from) },
    });
    const rows = new Map<string, RevenueMonth>(
      months.map((month) => [
        month,
        { month, receivedMinor: 0, refundedMinor: 0, revenueMinor: 0 },
      ]),
    );
    for (const p of payments) {
      if (!p.settledAt) continue;
      const row = rows.get(dateInTimeZone(p.settledAt, tz).slice(0, 7));
      if (!row) continue;
      if (p.kind === 'refund') row.refundedMinor += p.amountMinor;
      else row.receivedMinor += p.amountMinor;
    }
    return months.map((month) => {
      const row = rows.get(month)!;
      return { ...row, revenueMinor: row.receivedMinor - row.refundedMinor };
    });
  }

  /**
   * Served events (completed, or confirmed with the date past) by event month: plate cost from
   * the recipes' current costs ÷ their totals without tax.
   */
  private foodCost(
    index: KitchenIndex,
    orders: readonly OrderEntity[],
    months: string[],
    today: IsoDate,
    currency: string,
  ): FoodCostMonth[] {
    const cost = new Map<string, number>(months.map((mo) => [mo, 0]));
    const net = new Map<string, number>(months.map((mo) => [mo, 0]));
    const plateCost = new Map<string, number>();
    const dessertCost = (id: string): number => {
      let c = plateCost.get(id);
      if (c === undefined) {
        c = plateCostExactMinor(index, id);
        plateCost.set(id, c);
      }
      return c;
    };
    for (const o of orders) {
      const served =
        o.status === OrderStatus.Completed ||
        (o.status === OrderStatus.Confirmed && o.eventDate < today);
      const month = o.eventDate.slice(0, 7);
      if (!served || !cost.has(month) || o.currency !== currency) continue;
      let perGuest = 0;
      try {
        for (const id of index.menu(o.menuId).dessertIds) perGuest += dessertCost(id);
      } catch (error) {
        if (isKitchenError(error)) continue; // a dessert that cannot be costed is left out
        throw error;
      }
      cost.set(month, cost.get(month)! + perGuest * o.guestCount);
      net.set(month, net.get(month)! + o.quote.netMinor);
    }
    return months.map((month) => {
      const costMinor = Math.round(cost.get(month)!);
      const netRevenueMinor = net.get(month)!;
      return {
        month,
        costMinor,
        netRevenueMinor,
        percent: netRevenueMinor > 0 ? foodCostPercent(costMinor, netRevenueMinor) : null,
      };
    });
  }

  private async alerts(
    m: EntityManager,
    index: KitchenIndex,
    orders: readonly OrderEntity[],
    studio: StudioSettings,
    today: IsoDate,
    now: Date,
  ): Promise<DashboardAlert[]> {
    const live = orders
      .filter((o) => BOOKED.includes(o.status) && o.eventDate >= today)
      .sort(
        (a, b) => a.eventDate.localeCompare(b.eventDate) || a.reference.localeCompare(b.reference),
      );
    if (live.length === 0) return [];
    const ids = live.map((o) => o.id);
    const payments = await m.findBy(PaymentEntity, { orderId: In(ids) });
    const guests = await m.findBy(OrderGuestEntity, { orderId: In(ids) });
    const subs = await m.findBy(OrderSubstitutionEntity, { orderId: In(ids) });
    const confirmedAt = await confirmationTimes(m, ids);
    const alerts: DashboardAlert[] = [];
    const settings = {
      studioTimeZone: studio.timeZone,
      workingHours: { start: studio.workingHoursStart, end: studio.workingHoursEnd },
      platingBufferMinutes: studio.platingBufferMinutes,
    };
    for (const o of live) {
      const base = { orderId: o.id, reference: o.reference, eventDate: o.eventDate };
      const ownGuests = guests.filter((g) => g.orderId === o.id);
      const ownSubs = subs.filter((s) => s.orderId === o.id);

      try {
        const late = checkOrderLeadTime(
          index,
          prepOrderOf(o, studio.timeZone, ownGuests, ownSubs),
          settings,
          now.toISOString(),
          // A confirmed order is checked from its confirmation: work under way is not late.
          o.status === OrderStatus.Confirmed ? confirmedAt[o.id] : undefined,
        );
        const leadTime = late.filter((c) => c.kind === 'lead_time');
        // One alert per order: the component latest to be ready explains, the others are named.
        const worst = leadTime.reduce<(typeof leadTime)[number] | undefined>(
          (w, c) => (!w || c.lateByMinutes > w.lateByMinutes ? c : w),
          undefined,
        );
        if (worst) {
          const names = [...new Set(leadTime.map((c) => c.recipeName))];
          const message =
            names.length === 1
              ? worst.message
              : `${names.length} components of ${o.reference} cannot be ready in time: ${names.join(', ')}. The latest: ${worst.message}`;
          alerts.push({ kind: 'lead_time', ...base, message });
        }
      } catch (error) {
        if (!isKitchenError(error)) throw error;
        alerts.push({
          kind: 'lead_time',
          ...base,
          message: `The prep schedule for ${o.reference} cannot be worked out: ${error.message}`,
        });
      }

      const dueDate = o.quote.balanceDueDate;
      const balance = balanceOf(o, summarizeLedger(payments.filter((p) => p.orderId === o.id)));
      if (dueDate && dueDate < today && balance > 0) {
        alerts.push({
          kind: 'balance_overdue',
          ...base,
          balanceDueDate: dueDate,
          balanceMinor: balance,
          currency: o.currency,
          message: `${o.reference}: the balance was due on ${dueDate} and is still open.`,
        });
      }

      try {
        const notes = allergyNotesOf(index, o, ownGuests, ownSubs);
        if (notes.unresolved.length > 0) {
          const n = notes.unresolved.length;
          alerts.push({
            kind: 'allergy_conflict',
            ...base,
            unresolvedPlates: n,
            message: `${o.reference}: ${n} guest plate${n === 1 ? '' : 's'} still conflict${n === 1 ? 's' : ''} with a guest’s requirement.`,
          });
        }
      } catch (error) {
        if (!isKitchenError(error)) throw error;
      }
    }
    return alerts;
  }
}
