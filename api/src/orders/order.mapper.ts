import {
  addIsoDays,
  compareIsoDates,
  OrderStatus,
  transitionsFor,
  type IsoDate,
  type OrderDetail,
  type OrderEvent,
  type OrderGuest,
  type OrderSummary,
  type PaymentRecord,
} from '@nappe/shared';
import type { PaymentEntity } from '../payments/entities/payment.entity.js';
import type { OrderEventEntity } from './entities/order-event.entity.js';
import type { OrderGuestEntity } from './entities/order-guest.entity.js';
import type { OrderEntity } from './entities/order.entity.js';
import {
  balanceOf,
  isBooked,
  paidMinorOf,
  payActionFor,
  summarizeLedger,
  type LedgerSummary,
} from './order-money.js';

/** Everything an order's detail is made of, loaded in one transaction. */
export interface OrderView {
  order: OrderEntity;
  client: { name: string; email: string };
  guests: OrderGuestEntity[];
  payments: PaymentEntity[];
  events: Array<{ event: OrderEventEntity; actorName: string | null }>;
}

const iso = (d: Date) => d.toISOString();

export function toOrderSummary(
  order: OrderEntity,
  ledger: LedgerSummary,
  clientName: string,
): OrderSummary {
  return {
    id: order.id,
    reference: order.reference,
    status: order.status,
    menuId: order.menuId,
    menuName: order.pricing.menuName,
    eventDate: order.eventDate,
    serviceTime: order.serviceTime,
    guestCount: order.guestCount,
    plates: order.plates,
    currency: order.currency,
    totalMinor: order.totalMinor,
    paidMinor: paidMinorOf(ledger),
    balanceMinor: balanceOf(order, ledger),
    balanceDueDate: order.quote.balanceDueDate,
    clientName,
    createdAt: iso(order.createdAt),
  };
}

function toPaymentRecord(p: PaymentEntity): PaymentRecord {
  return {
    id: p.id,
    kind: p.kind,
    status: p.status,
    amountMinor: p.amountMinor,
    currency: p.currency,
    createdAt: iso(p.createdAt),
    settledAt: p.settledAt ? iso(p.settledAt) : null,
    receiptAvailable: p.status === 'succeeded' && p.settledAt !== null,
  };
}

function toGuest(g: OrderGuestEntity): OrderGuest {
  return {
    label: g.label,
    ...(g.tableLabel ? { table: g.tableLabel } : {}),
    allergens: g.allergens,
    diets: g.diets,
    ...(g.notes ? { notes: g.notes } : {}),
  };
}

function toEvent(e: OrderEventEntity, actorName: string | null): OrderEvent {
  return {
    id: e.id,
    at: iso(e.at),
    actor: { role: e.actorRole, name: e.actorRole === 'system' ? null : actorName },
    fromStatus: e.fromStatus,
    toStatus: e.toStatus,
    summary: e.summary,
    reason: e.reason,
  };
}

/** The last day guests can change (the final-count deadline), or null once it has passed. */
export function changeGuestsUntil(order: OrderEntity, today: IsoDate): IsoDate | null {
  if (!isBooked(order.status)) return null;
  const deadline = addIsoDays(order.eventDate, -order.pricing.finalGuestCountDaysBefore);
  return compareIsoDates(today, deadline) <= 0 ? deadline : null;
}

export function toOrderDetail(view: OrderView, today: IsoDate): OrderDetail {
  const { order } = view;
  const ledger = summarizeLedger(view.payments);
  const refundInFlight = ledger.pendingRefundMinor > 0;
  const until = changeGuestsUntil(order, today);
  const clientMayCancel =
    transitionsFor(order.status, 'client').some((t) => t.to === OrderStatus.Cancelled) &&
    compareIsoDates(today, order.eventDate) <= 0;
  return {
    ...toOrderSummary(order, ledger, view.client.name),
    venueAddressLines: order.venueAddressLines,
    occasion: order.occasion,
    contactPhone: order.contactPhone,
    clientEmail: view.client.email,
    quote: order.quote,
    guests: [...view.guests].sort((a, b) => a.position - b.position).map(toGuest),
    payments: [...view.payments]
      .sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime() || a.id.localeCompare(b.id))
      .map(toPaymentRecord),
    timeline: view.events.map(({ event, actorName }) => toEvent(event, actorName)),
    actions: {
      pay: refundInFlight ? null : payActionFor(order, ledger, today),
      cancel: clientMayCancel,
      changeGuests: until !== null && !refundInFlight,
    },
    changeGuestsUntil: until,
  };
}
