import { createHash, randomUUID } from 'node:crypto';
import {
  BadRequestException,
  ConflictException,
  ForbiddenException,
  HttpException,
  HttpStatus,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import {
  addIsoDays,
  AVAILABILITY_RANGE_MAX_DAYS,
  availabilityRange,
  canBook,
  computeQuote,
  daysBetween,
  declineRefund,
  formatIsoDate,
  formatMoney,
  isIsoDate,
  menuBookingRules,
  OrderStatus,
  plural,
  refundFor,
  requote,
  Role,
  transition,
  type AvailabilityResponse,
  type BookingTerms,
  type CancellationPreview,
  type ChangeGuestCountRequest,
  type CreateOrderRequest,
  type CreateQuoteRequest,
  type GuestChangePreview,
  type GuestChangeResult,
  type GuestRequirement,
  type OrderDetail,
  type OrderSummary,
  type Page,
  type Quote,
  type RefundResult,
} from '@nappe/shared';
import { DataSource, In, QueryFailedError, type EntityManager } from 'typeorm';
import { AllergyNotesService } from '../allergy-notes/allergy-notes.service.js';
import type { Principal } from '../auth/principal.js';
import { likePattern } from '../kitchen/catalogue/kitchen-catalogue.service.js';
import { Env } from '../config/env.js';
import { DocumentsService, type RenderedDocument } from '../documents/documents.service.js';
import { CheckoutService } from '../payments/checkout.service.js';
import { PaymentEntity } from '../payments/entities/payment.entity.js';
import { PaymentGateway } from '../payments/payment-gateway.js';
import { RefundService } from '../payments/refunds.service.js';
import { bookingTermsOf, CHECKOUT_HOLD_MINUTES } from '../studio/booking-settings.js';
import { User } from '../users/entities/user.entity.js';
import { BookingContext } from './booking-context.js';
import { DAY_BOOK, lockFor } from '../database/serialized-writes.js';
import { platesTaken } from './capacity.js';
import type { AvailabilityQuery, ListOrdersQuery } from './dto/order-queries.js';
import { OrderGuestEntity } from './entities/order-guest.entity.js';
import { OrderEntity } from './entities/order.entity.js';
import { toOrderSummary } from './order.mapper.js';
import { isBooked, orderMoneyOf, summarizeLedger } from './order-money.js';
import { OrderNotifications } from './order-notifications.js';
import { actorOf, orderFor, recordEvent, transitionOrder, type Actor } from './order-records.js';
import { OrderViews } from './order-views.js';
import { recordConsents } from '../privacy/consents.js';

/** Sorted-key JSON, so the same booking sent with its fields in another order hashes the same. */
function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => a.localeCompare(b));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
  }
  return JSON.stringify(value) ?? 'null';
}

function conflict(message: string): ConflictException {
  return new ConflictException({ statusCode: 409, message, error: 'Conflict' });
}

const CAN_BOOK_BAD_INPUT = new Set([
  'past',
  'too_few_guests',
  'too_many_guests',
  'invalid_guest_count',
]);

function guestRows(orderId: string, guests: readonly GuestRequirement[]): OrderGuestEntity[] {
  return guests.map((g, position) => ({
    orderId,
    position,
    label: g.label,
    tableLabel: g.table ?? null,
    allergens: g.allergens,
    diets: g.diets,
    notes: g.notes ?? null,
  }));
}

/**
 * Bookings: the quote, availability, creating an order (capacity checked and held in the same
 * transaction as the insert), reading orders, and the changes a client or the chef makes —
 * each change in one transaction with its audit line and its e-mail. Money moves through the
 * payment service only outside transactions (checkout.service.ts, refunds.service.ts).
 */
@Injectable()
export class OrdersService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly context: BookingContext,
    private readonly views: OrderViews,
    private readonly notifications: OrderNotifications,
    private readonly refunds: RefundService,
    private readonly checkouts: CheckoutService,
    private readonly gateway: PaymentGateway,
    private readonly documents: DocumentsService,
    private readonly env: Env,
    private readonly allergyNotes: AllergyNotesService,
  ) {}

  // ---------------------------------------------------------------- public

  bookingTerms(): Promise<BookingTerms> {
    return this.dataSource.transaction(async (m) => bookingTermsOf(await this.context.studio(m)));
  }

  /** A quote computed by the server only, from the menu, the guests, the date and the settings. */
  quote(body: CreateQuoteRequest): Promise<Quote> {
    return this.dataSource.transaction(async (m) => {
      const studio = await this.context.studio(m);
      const menu = await this.context.menu(m, body.menuId);
      if (!menu) throw new NotFoundException('There is no menu with that id.');
      return computeQuote({
        menu,
        settings: studio.settings,
        guestCount: body.guestCount,
        eventDate: body.eventDate,
        today: this.context.today(studio.settings.timeZone),
      });
    });
  }

  availability(query: AvailabilityQuery): Promise<AvailabilityResponse> {
    if (!isIsoDate(query.from) || !isIsoDate(query.to)) {
      throw new BadRequestException('Use real dates written like 2026-06-21 for from and to.');
    }
    const days = daysBetween(query.from, query.to) + 1;
    if (days < 1) throw new BadRequestException('“to” must be on or after “from”.');
    const maxDays = Math.min(92, AVAILABILITY_RANGE_MAX_DAYS);
    if (days > maxDays) throw new BadRequestException(`Ask for at most ${maxDays} days at a time.`);
    return this.dataSource.transaction(async (m) => {
      const studio = await this.context.studio(m);
      const menu = await this.context.menu(m, query.menuId);
      if (!menu || !menu.active) throw new NotFoundException('There is no menu with that id.');
      const today = this.context.today(studio.settings.timeZone);
      const input = {
        settings: studio.settings,
        platesTaken: await platesTaken(m, query.from, query.to, this.context.now()),
        today,
        menu: menuBookingRules(menu),
      };
      return {
        menuId: menu.id,
        timeZone: studio.settings.timeZone,
        today,
        earliestDate: addIsoDays(today, menu.leadDays),
        platesPerGuest: input.menu.platesPerGuest,
        days: availabilityRange(query.from, query.to, input).map((d) => ({
          date: d.date,
          status: d.status,
          remainingPlates: d.bookablePlates,
          ...(query.guests === undefined
            ? {}
            : { fitsGuests: canBook(d.date, query.guests, input).ok }),
        })),
      };
    });
  }

  // ---------------------------------------------------------------- create and read

  /**
   * Books: validates, computes the quote, checks the client's unpaid bookings and the day's
   * capacity, and inserts the order — all in ONE transaction, so two clients racing for the
   * last plates cannot both get them. A retry with the same Idempotency-Key and body returns
   * the same order; the same key with another body is refused.
   */
  async create(
    principal: Principal,
    idempotencyKey: string,
    body: CreateOrderRequest,
  ): Promise<{ order: OrderDetail; created: boolean }> {
    const requestHash = createHash('sha256').update(canonicalJson(body)).digest('hex');
    try {
      return await this.dataSource.transaction(async (m) => {
        // One booking at a time (PostgreSQL; SQLite runs alone anyway): the capacity check and
        // the insert, the year's next reference, the client's unpaid bookings and a replay of
        // the same Idempotency-Key all see every booking committed before.
        await lockFor(m, DAY_BOOK);
        const existing = await m.findOneBy(OrderEntity, {
          clientId: principal.id,
          clientRequestId: idempotencyKey,
        });
        if (existing) {
          if (existing.requestHash !== requestHash) {
            throw conflict(
              'This Idempotency-Key was already used for a different booking. Use a new key for a new booking.',
            );
          }
          return { order: await this.views.detail(m, existing), created: false };
        }
        return {
          order: await this.insertOrder(m, principal, idempotencyKey, requestHash, body),
          created: true,
        };
      });
    } catch (error) {
      const code = (error as { driverError?: { code?: string } }).driverError?.code;
      if (
        error instanceof QueryFailedError &&
        (code === 'SQLITE_CONSTRAINT_UNIQUE' || code === '23505')
      ) {
        throw conflict('The same booking request arrived twice at once; send it again.');
      }
      throw error;
    }
  }

  private async insertOrder(
    m: EntityManager,
    principal: Principal,
    idempotencyKey: string,
    requestHash: string,
    body: CreateOrderRequest,
  ): Promise<OrderDetail> {
    const studio = await this.context.studio(m);
    const now = this.context.now();
    const today = this.context.today(studio.settings.timeZone);
    const menu = await this.context.menu(m, body.menuId);
    if (!menu) throw new NotFoundException('There is no menu with that id.');
    const quote = computeQuote({
      menu,
      settings: studio.settings,
      guestCount: body.guestCount,
      eventDate: body.eventDate,
      today,
    });

    const unpaid = await m
      .createQueryBuilder(OrderEntity, 'o')
      .where('o.clientId = :client AND o.status = :pending AND o.holdExpiresAt > :now', {
        client: principal.id,
        pending: OrderStatus.PendingPayment,
        now,
      })
      .getCount();
    if (unpaid >= this.env.MAX_UNPAID_ORDERS_PER_CLIENT) {
      throw new HttpException(
        {
          statusCode: HttpStatus.TOO_MANY_REQUESTS,
          message: `You already have ${plural(unpaid, 'booking')} waiting for payment. Pay for or cancel one of them before booking again.`,
          error: 'Too Many Requests',
        },
        HttpStatus.TOO_MANY_REQUESTS,
      );
    }

    const check = canBook(body.eventDate, body.guestCount, {
      settings: studio.settings,
      platesTaken: await platesTaken(m, body.eventDate, body.eventDate, now),
      today,
      menu: menuBookingRules(menu),
    });
    if (!check.ok) {
      if (CAN_BOOK_BAD_INPUT.has(check.reason)) throw new BadRequestException(check.message);
      throw conflict(check.message);
    }

    const id = randomUUID();
    const order: OrderEntity = {
      id,
      reference: await this.nextReference(m, today.slice(0, 4)),
      clientId: principal.id,
      menuId: menu.id,
      status: OrderStatus.PendingPayment,
      eventDate: body.eventDate,
      serviceTime: body.serviceTime,
      venueAddressLines: body.venueAddressLines,
      occasion: body.occasion,
      contactPhone: body.contactPhone,
      guestCount: body.guestCount,
      plates: check.platesNeeded,
      currency: quote.currency,
      totalMinor: quote.totalMinor,
      retainedMinor: 0,
      pricing: quote.pricing,
      quote,
      clientRequestId: idempotencyKey,
      requestHash,
      holdExpiresAt: new Date(now.getTime() + CHECKOUT_HOLD_MINUTES * 60_000),
      amountVersion: 1,
      createdAt: now,
      updatedAt: now,
    };
    await m.insert(OrderEntity, order);
    if (body.guestRequirements.length > 0) {
      await m.insert(OrderGuestEntity, guestRows(id, body.guestRequirements));
    }
    // The schema refuses a booking without the terms, and guests without their agreement.
    await recordConsents(m, now, principal.id, id, [
      'booking_terms',
      ...(body.guestRequirements.length > 0 ? (['guest_data'] as const) : []),
    ]);
    await recordEvent(m, now, id, actorOf(principal), {
      from: null,
      to: OrderStatus.PendingPayment,
      summary: `Booked ${menu.name} for ${plural(body.guestCount, 'guest')} on ${formatIsoDate(body.eventDate)}; awaiting payment`,
    });
    return this.views.detail(m, order);
  }

  /** `N-YYYY-NNNN`: the next number of the year. */
  private async nextReference(m: EntityManager, year: string): Promise<string> {
    const prefix = `N-${year}-`;
    const row = await m
      .createQueryBuilder(OrderEntity, 'o')
      .select('MAX(CAST(SUBSTR(o.reference, :start) AS INTEGER))', 'last')
      .where('o.reference LIKE :pattern', { pattern: `${prefix}%`, start: prefix.length + 1 })
      .getRawOne<{ last: number | string | null }>();
    const next = Number(row?.last ?? 0) + 1;
    return `${prefix}${String(next).padStart(4, '0')}`;
  }

  list(principal: Principal, query: ListOrdersQuery): Promise<Page<OrderSummary>> {
    return this.dataSource.transaction(async (m) => {
      const qb = m.createQueryBuilder(OrderEntity, 'o');
      if (principal.role === Role.Client) qb.where('o.clientId = :me', { me: principal.id });
      if (query.status) qb.andWhere('o.status = :status', { status: query.status });
      for (const [name, value] of [
        ['from', query.from],
        ['to', query.to],
      ] as const) {
        if (value !== undefined && !isIsoDate(value))
          throw new BadRequestException([`${name} must be a real date written like 2026-06-21.`]);
      }
      if (query.from && query.to && query.from > query.to) {
        throw new BadRequestException(['from must be on or before to.']);
      }
      if (query.from) qb.andWhere('o.eventDate >= :from', { from: query.from });
      if (query.to) qb.andWhere('o.eventDate <= :to', { to: query.to });
      if (query.q?.trim()) {
        qb.leftJoin(User, 'searchClient', 'searchClient.id = o.clientId').andWhere(
          `(LOWER(o.reference) LIKE :pattern ESCAPE '\\' OR LOWER(searchClient.name) LIKE :pattern ESCAPE '\\')`,
          { pattern: likePattern(query.q) },
        );
      }
      const [orders, total] = await qb
        .orderBy('o.createdAt', 'DESC')
        .addOrderBy('o.id', 'DESC')
        .skip((query.page - 1) * query.pageSize)
        .take(query.pageSize)
        .getManyAndCount();
      const ids = orders.map((o) => o.id);
      const payments =
        ids.length === 0 ? [] : await m.find(PaymentEntity, { where: { orderId: In(ids) } });
      const clientIds = [...new Set(orders.map((o) => o.clientId))];
      const clients =
        clientIds.length === 0 ? [] : await m.find(User, { where: { id: In(clientIds) } });
      const names = new Map(clients.map((c) => [c.id, c.name]));
      return {
        items: orders.map((o) =>
          toOrderSummary(
            o,
            summarizeLedger(payments.filter((p) => p.orderId === o.id)),
            names.get(o.clientId) ?? '',
          ),
        ),
        total,
        page: query.page,
        pageSize: query.pageSize,
      };
    });
  }

  get(principal: Principal, id: string): Promise<OrderDetail> {
    return this.dataSource.transaction(async (m) => {
      const detail = await this.views.detail(m, await orderFor(m, principal, id));
      // The detail lists the guests' requirements: the studio's openings are logged.
      if (detail.guests.length > 0)
        await this.allergyNotes.logAccess(m, principal, id, 'guest_list');
      return detail;
    });
  }

  // ---------------------------------------------------------------- cancel and decline

  cancellationPreview(principal: Principal, id: string): Promise<CancellationPreview> {
    return this.dataSource.transaction(async (m) => {
      const order = await orderFor(m, principal, id);
      const actor = actorOf(principal);
      const allowed = transition(
        order.status,
        OrderStatus.Cancelled,
        actor.role === 'chef' ? 'chef' : 'client',
      );
      if (!allowed.ok) throw allowed.error;
      const studio = await this.context.studio(m);
      const payments = await m.find(PaymentEntity, { where: { orderId: id } });
      const refund = refundFor(
        orderMoneyOf(order, summarizeLedger(payments)),
        this.context.today(studio.settings.timeZone),
      );
      return { refund, nextStatus: OrderStatus.Cancelled };
    });
  }

  /**
   * The client (or the chef) cancels; what was paid is refunded by the policy tier of today —
   * or, when the chef chooses it, in full.
   */
  cancel(
    principal: Principal,
    id: string,
    reason: string | undefined,
    refund: 'policy' | 'full' = 'policy',
  ): Promise<OrderDetail> {
    if (refund === 'full' && principal.role !== Role.Chef) {
      throw new ForbiddenException('Only the studio can refund a cancellation in full.');
    }
    return this.closeWithRefund(principal, id, OrderStatus.Cancelled, reason, refund);
  }

  /** The chef cannot take a requested booking: everything paid is refunded. */
  decline(principal: Principal, id: string, reason: string | undefined): Promise<OrderDetail> {
    return this.closeWithRefund(principal, id, OrderStatus.Declined, reason);
  }

  /**
   * Cancel or decline. An unpaid order closes at once (its open checkout is closed after).
   * A paid one reserves its refund, asks the payment service for it, and only then closes —
   * so when the service is down the answer is 503 and the booking is unchanged; the same
   * request later sends the same reserved refund (same idempotency key), never a second one.
   */
  private async closeWithRefund(
    principal: Principal,
    id: string,
    to: OrderStatus.Cancelled | OrderStatus.Declined,
    reason: string | undefined,
    refundChoice: 'policy' | 'full' = 'policy',
  ): Promise<OrderDetail> {
    const actor = actorOf(principal);
    const operation = to === OrderStatus.Declined ? 'decline' : 'cancel';
    const plan = await this.dataSource.transaction(async (m) => {
      const order = await orderFor(m, principal, id);
      const allowed = transition(order.status, to, actor.role === 'chef' ? 'chef' : 'client');
      if (actor.role === 'staff')
        throw conflict('Staff accounts cannot change a booking’s status.');
      if (!allowed.ok) throw allowed.error;
      const payments = await m.find(PaymentEntity, { where: { orderId: id } });
      const now = this.context.now();
      const studio = await this.context.studio(m);
      const today = this.context.today(studio.settings.timeZone);

      if (order.status === OrderStatus.PendingPayment) {
        const money = orderMoneyOf(order, summarizeLedger(payments));
        const refund = refundFor(money, today);
        await transitionOrder(
          m,
          now,
          order,
          to,
          actor,
          {
            summary: 'Cancelled before payment; the date and plates were released',
            reason,
          },
          { holdExpiresAt: null },
        );
        await this.notifications.cancelled(m, order, 0, refund.message, actor.role === 'chef');
        const open = payments.filter(
          (p) => p.kind !== 'refund' && p.status === 'pending' && p.providerSessionId !== null,
        );
        return { closed: true as const, order, open, detail: await this.views.detail(m, order) };
      }

      const pending = payments.filter((p) => p.kind === 'refund' && p.status === 'pending');
      if (pending.some((p) => p.operation !== operation)) {
        throw conflict(
          'A refund for an earlier change is still being confirmed; try again in a minute.',
        );
      }
      let refund: RefundResult;
      let reserved = pending;
      if (reserved.length > 0) {
        // A retry after the payment service did not answer: the same refund, again.
        const others = payments.filter((p) => !reserved.includes(p));
        refund = this.refundPolicy(
          to,
          orderMoneyOf(order, summarizeLedger(others)),
          today,
          refundChoice,
        );
      } else {
        refund = this.refundPolicy(
          to,
          orderMoneyOf(order, summarizeLedger(payments)),
          today,
          refundChoice,
        );
        reserved =
          refund.refundMinor > 0
            ? await this.refunds.reserve(m, order, payments, refund.refundMinor, operation)
            : [];
      }
      return { closed: false as const, reserved, refund };
    });

    if (plan.closed) {
      await this.closeCheckouts(plan.order.id, plan.open);
      return plan.detail;
    }

    await this.refunds.send(plan.reserved);
    const refundedMinor = plan.reserved.reduce((sum, r) => sum + r.amountMinor, 0);

    return this.dataSource.transaction(async (m) => {
      const order = await orderFor(m, principal, id);
      if (order.status === to) return this.views.detail(m, order); // a concurrent identical request won
      const now = this.context.now();
      const money = formatMoney(refundedMinor, order.currency);
      await transitionOrder(m, now, order, to, actor, {
        summary:
          to === OrderStatus.Declined
            ? `Declined by the studio; ${money} refunded`
            : refundChoice === 'full'
              ? `Cancelled by the studio; ${money} refunded in full (the studio’s choice)`
              : `Cancelled by the ${actor.role === 'chef' ? 'studio' : 'client'}; ${money} refunded (${plan.refund.refundPercent} % under the policy)`,
        reason,
      });
      if (to === OrderStatus.Declined) await this.notifications.declined(m, order, refundedMinor);
      else
        await this.notifications.cancelled(
          m,
          order,
          refundedMinor,
          plan.refund.message,
          actor.role === 'chef',
        );
      return this.views.detail(m, order);
    });
  }

  private refundPolicy(
    to: OrderStatus.Cancelled | OrderStatus.Declined,
    money: ReturnType<typeof orderMoneyOf>,
    today: string,
    choice: 'policy' | 'full' = 'policy',
  ): RefundResult {
    if (to === OrderStatus.Declined) return declineRefund(money);
    if (choice === 'policy') return refundFor(money, today);
    // The chef waives the policy: everything paid comes back, as when declining.
    const full = declineRefund(money);
    return {
      ...full,
      message:
        full.paidMinor === 0
          ? 'The studio cancelled this booking. Nothing was paid, so there is nothing to refund.'
          : `The studio cancelled this booking: everything you paid (${formatMoney(full.paidMinor, full.currency)}) is refunded.`,
    };
  }

  /** Closes the open checkouts of a cancelled booking (best effort: they also expire on their own). */
  private async closeCheckouts(orderId: string, open: readonly PaymentEntity[]): Promise<void> {
    for (const row of open) {
      try {
        await this.gateway.expireCheckoutSession(
          row.providerSessionId!,
          `order:${orderId}:close:${row.id}`,
        );
      } catch {
        // Closed already, paid meanwhile (fulfilment records it and flags it), or unreachable.
      }
    }
  }

  // ---------------------------------------------------------------- chef

  confirm(
    principal: Principal,
    id: string,
    reason: string | undefined,
    overrideReason?: string,
  ): Promise<OrderDetail> {
    return this.dataSource.transaction(async (m) => {
      const order = await orderFor(m, principal, id);
      // Unresolved allergy conflicts and a too-short lead time block it unless overridden.
      const overridden =
        order.status === OrderStatus.Requested
          ? await this.allergyNotes.assertConfirmable(m, order, overrideReason)
          : null;
      await transitionOrder(
        m,
        this.context.now(),
        order,
        OrderStatus.Confirmed,
        actorOf(principal),
        {
          summary: 'Confirmed by the chef; added to the prep plan',
          reason,
        },
      );
      if (overridden) {
        await recordEvent(m, this.context.now(), order.id, actorOf(principal), {
          summary: overridden,
          reason: overrideReason,
        });
      }
      await this.notifications.confirmed(m, order);
      return this.views.detail(m, order);
    });
  }

  complete(principal: Principal, id: string, reason: string | undefined): Promise<OrderDetail> {
    return this.dataSource.transaction(async (m) => {
      const order = await orderFor(m, principal, id);
      await transitionOrder(
        m,
        this.context.now(),
        order,
        OrderStatus.Completed,
        actorOf(principal),
        {
          summary: 'Marked as served',
          reason,
        },
      );
      return this.views.detail(m, order);
    });
  }

  // ---------------------------------------------------------------- guests

  private assertGuestsChangeable(order: OrderEntity): void {
    if (order.status === OrderStatus.PendingPayment) {
      throw conflict(
        'Pay for this booking first; then you can change the guests until the final-count deadline.',
      );
    }
    if (!isBooked(order.status))
      throw conflict('This booking is closed; its guests can no longer change.');
  }

  guestChangePreview(
    principal: Principal,
    id: string,
    body: ChangeGuestCountRequest,
  ): Promise<GuestChangePreview> {
    return this.dataSource.transaction(async (m) => {
      const order = await orderFor(m, principal, id);
      this.assertGuestsChangeable(order);
      const studio = await this.context.studio(m);
      const payments = await m.find(PaymentEntity, { where: { orderId: id } });
      const result = requote(
        orderMoneyOf(order, summarizeLedger(payments)),
        body.guestCount,
        this.context.today(studio.settings.timeZone),
        { allowAfterDeadline: principal.role === Role.Chef },
      );
      return { requote: result };
    });
  }

  /**
   * Changes the number of guests (and, when sent, their requirements) before the final-count
   * deadline. More guests: the plates are checked and held now and the difference is collected
   * through a new checkout. Fewer: what was paid for the removed guests is refunded by today's
   * tier — reserved, sent, then applied, like a cancellation.
   */
  async changeGuests(
    principal: Principal,
    id: string,
    body: ChangeGuestCountRequest,
  ): Promise<GuestChangeResult> {
    const actor = actorOf(principal);
    const allowAfterDeadline = principal.role === Role.Chef;
    const plan = await this.dataSource.transaction(async (m) => {
      const order = await orderFor(m, principal, id);
      this.assertGuestsChangeable(order);
      const studio = await this.context.studio(m);
      const now = this.context.now();
      const today = this.context.today(studio.settings.timeZone);
      const payments = await m.find(PaymentEntity, { where: { orderId: id } });
      const pending = payments.filter((p) => p.kind === 'refund' && p.status === 'pending');
      const mine = pending.filter(
        (p) => p.operation === 'guest_change' && p.targetGuestCount === body.guestCount,
      );
      if (pending.length > mine.length) {
        throw conflict(
          'A refund for an earlier change is still being confirmed; try again in a minute.',
        );
      }
      const others = payments.filter((p) => !mine.includes(p));
      const change = requote(orderMoneyOf(order, summarizeLedger(others)), body.guestCount, today, {
        allowAfterDeadline,
      });
      const requirements =
        body.guestRequirements ?? (await this.keptRequirements(m, order, body.guestCount));

      if (change.change === 'increase') {
        const perGuest = Math.max(1, Math.round(order.plates / order.guestCount));
        const plates = body.guestCount * perGuest;
        await lockFor(m, DAY_BOOK); // more plates from the day: one booking change at a time
        const taken =
          (await platesTaken(m, order.eventDate, order.eventDate, now, order.id)).get(
            order.eventDate,
          ) ?? 0;
        const left = Math.max(0, studio.settings.dailyPlateCapacity - taken);
        if (plates > left) {
          throw conflict(
            `Only ${plural(left, 'plate')} ${left === 1 ? 'is' : 'are'} left on ${formatIsoDate(order.eventDate)}; ${plural(body.guestCount, 'guest')} need ${plates}. Please contact the studio.`,
          );
        }
      }
      if (change.change !== 'decrease' || change.refundNowMinor === 0) {
        await this.applyGuestChange(
          m,
          order,
          actor,
          change,
          requirements,
          0,
          body.guestRequirements !== undefined,
        );
        return { applied: true as const, collect: change.collectNowMinor };
      }
      const reserved =
        mine.length > 0
          ? mine
          : await this.refunds.reserve(
              m,
              order,
              payments,
              change.refundNowMinor,
              'guest_change',
              body.guestCount,
            );
      return { applied: false as const, reserved };
    });

    let refundedMinor = 0;
    if (!plan.applied) {
      await this.refunds.send(plan.reserved);
      refundedMinor = plan.reserved.reduce((sum, r) => sum + r.amountMinor, 0);
      await this.dataSource.transaction(async (m) => {
        const order = await orderFor(m, principal, id);
        if (order.guestCount === body.guestCount) return; // a concurrent identical request won
        this.assertGuestsChangeable(order);
        const studio = await this.context.studio(m);
        const payments = await m.find(PaymentEntity, { where: { orderId: id } });
        const others = payments.filter((p) => !plan.reserved.some((r) => r.id === p.id));
        const change = requote(
          orderMoneyOf(order, summarizeLedger(others)),
          body.guestCount,
          this.context.today(studio.settings.timeZone),
          { allowAfterDeadline: true }, // checked before the refund was sent
        );
        const requirements =
          body.guestRequirements ?? (await this.keptRequirements(m, order, body.guestCount));
        await this.applyGuestChange(
          m,
          order,
          actor,
          change,
          requirements,
          refundedMinor,
          body.guestRequirements !== undefined,
        );
      });
    }

    const checkout =
      plan.applied && plan.collect > 0
        ? await this.checkouts.start(principal, id, 'top_up').catch((error: unknown) => {
            if (error instanceof HttpException && error.getStatus() >= 500) return null; // pay later from the event page
            throw error;
          })
        : null;
    const order = await this.dataSource.transaction(async (m) =>
      this.views.detail(m, await orderFor(m, principal, id)),
    );
    return { order, checkout, refundedMinor };
  }

  /** The stored requirements, when the request does not replace them; they must still fit. */
  private async keptRequirements(
    m: EntityManager,
    order: OrderEntity,
    guestCount: number,
  ): Promise<GuestRequirement[] | null> {
    const count = await m.count(OrderGuestEntity, { where: { orderId: order.id } });
    if (count > guestCount) {
      throw new BadRequestException(
        `You listed requirements for ${count} guests but the party would be ${guestCount}. Send the updated list of requirements with the new number of guests.`,
      );
    }
    return null;
  }

  private async applyGuestChange(
    m: EntityManager,
    order: OrderEntity,
    actor: Actor,
    change: ReturnType<typeof requote>,
    requirements: GuestRequirement[] | null,
    refundedMinor: number,
    requirementsSent: boolean,
  ): Promise<void> {
    const now = this.context.now();
    const previous = order.guestCount;
    const perGuest = Math.max(1, Math.round(order.plates / order.guestCount));
    if (change.change !== 'none') {
      const share = change.refundNowMinor + change.retainedNowMinor;
      await m.update(
        OrderEntity,
        { id: order.id },
        {
          guestCount: change.guestCount,
          plates: change.guestCount * perGuest,
          quote: change.quote,
          totalMinor: change.quote.totalMinor,
          retainedMinor: order.retainedMinor + share - refundedMinor,
          amountVersion: order.amountVersion + 1,
          updatedAt: now,
        },
      );
      Object.assign(order, { guestCount: change.guestCount, totalMinor: change.quote.totalMinor });
    }
    if (requirementsSent && requirements) {
      await m.delete(OrderGuestEntity, { orderId: order.id });
      if (requirements.length > 0) {
        await m.insert(OrderGuestEntity, guestRows(order.id, requirements));
        await recordConsents(m, now, actor.userId, order.id, ['guest_data']);
      }
    }
    if (change.change === 'none' && !requirementsSent) return;
    const money = (minor: number) => formatMoney(minor, order.currency);
    const summary =
      change.change === 'none'
        ? 'Guest requirements updated'
        : `Guests changed from ${previous} to ${change.guestCount}${refundedMinor > 0 ? `; ${money(refundedMinor)} refunded` : ''}${change.collectNowMinor > 0 ? `; ${money(change.collectNowMinor)} to pay` : ''}`;
    await recordEvent(m, now, order.id, actor, { summary });
    if (change.change !== 'none') {
      await this.notifications.guestsChanged(m, order, previous, {
        refundMinor: refundedMinor,
        collectMinor: change.collectNowMinor,
        message: change.message,
      });
    }
  }

  // ---------------------------------------------------------------- documents

  async receipt(
    principal: Principal,
    id: string,
    paymentId: string,
  ): Promise<RenderedDocument<Buffer>> {
    await this.dataSource.transaction((m) => orderFor(m, principal, id));
    return this.documents.receipt(id, paymentId);
  }

  async eventFile(principal: Principal, id: string): Promise<RenderedDocument<string>> {
    await this.dataSource.transaction((m) => orderFor(m, principal, id));
    return this.documents.eventFile(id);
  }
}
