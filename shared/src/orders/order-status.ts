import { BookingError, InvalidBookingInputError } from './booking-errors.js';

/**
 * The order lifecycle (DESIGN.md): `pending_payment` (checkout open) → `requested` (deposit or
 * full payment received, awaiting the chef) → `confirmed` (chef accepted; feeds planning) →
 * `completed` (after service). Side exits: `expired` (checkout never paid), `declined` (chef
 * refused → full refund), `cancelled` (client or chef → refund by the policy tier).
 *
 * ORDER_TRANSITIONS is the one table of what may happen, and who may make it happen; everything
 * else here reads it. The string values are stored in the database.
 */
export enum OrderStatus {
  PendingPayment = 'pending_payment',
  Requested = 'requested',
  Confirmed = 'confirmed',
  Completed = 'completed',
  Expired = 'expired',
  Declined = 'declined',
  Cancelled = 'cancelled',
}

export const ORDER_STATUSES: readonly OrderStatus[] = [
  OrderStatus.PendingPayment,
  OrderStatus.Requested,
  OrderStatus.Confirmed,
  OrderStatus.Completed,
  OrderStatus.Expired,
  OrderStatus.Declined,
  OrderStatus.Cancelled,
];

export function isOrderStatus(value: unknown): value is OrderStatus {
  return typeof value === 'string' && (ORDER_STATUSES as readonly string[]).includes(value);
}

/** Who makes a transition: the server on its own (payments, timers), the client, or the chef. */
export const ORDER_ACTORS = ['system', 'client', 'chef'] as const;
export type OrderActor = (typeof ORDER_ACTORS)[number];

export interface OrderTransitionRule {
  from: OrderStatus;
  to: OrderStatus;
  actors: readonly OrderActor[];
  /** The button or event, in plain words. */
  action: string;
  /** When it happens. */
  when: string;
}

export const ORDER_TRANSITIONS: readonly OrderTransitionRule[] = [
  {
    from: OrderStatus.PendingPayment,
    to: OrderStatus.Requested,
    actors: ['system'],
    action: 'Payment received',
    when: 'The deposit or the full payment is recorded.',
  },
  {
    from: OrderStatus.PendingPayment,
    to: OrderStatus.Expired,
    actors: ['system'],
    action: 'Checkout expired',
    when: 'The checkout closed without a payment; the plates are released.',
  },
  {
    from: OrderStatus.PendingPayment,
    to: OrderStatus.Cancelled,
    actors: ['client'],
    action: 'Cancel booking',
    when: 'The client gives up before paying; nothing was paid, nothing is refunded.',
  },
  {
    from: OrderStatus.Requested,
    to: OrderStatus.Confirmed,
    actors: ['chef'],
    action: 'Confirm',
    when: 'The chef accepts the booking; it joins the prep plan.',
  },
  {
    from: OrderStatus.Requested,
    to: OrderStatus.Declined,
    actors: ['chef'],
    action: 'Decline',
    when: 'The chef cannot take the booking; everything paid is refunded.',
  },
  {
    from: OrderStatus.Requested,
    to: OrderStatus.Cancelled,
    actors: ['client'],
    action: 'Cancel booking',
    when: 'The client cancels before the chef answers; refund by the policy tier.',
  },
  {
    from: OrderStatus.Confirmed,
    to: OrderStatus.Completed,
    actors: ['chef', 'system'],
    action: 'Mark as served',
    when: 'The event has been served.',
  },
  {
    from: OrderStatus.Confirmed,
    to: OrderStatus.Cancelled,
    actors: ['client', 'chef'],
    action: 'Cancel booking',
    when: 'The client or the chef cancels; refund by the policy tier.',
  },
];

export function transitionRule(
  from: OrderStatus,
  to: OrderStatus,
): OrderTransitionRule | undefined {
  return ORDER_TRANSITIONS.find((t) => t.from === from && t.to === to);
}

/** Statuses with no way out. */
export function isFinalStatus(status: OrderStatus): boolean {
  return !ORDER_TRANSITIONS.some((t) => t.from === status);
}

/** Statuses whose plates count against the day's capacity (an open checkout holds its plates). */
export const STATUSES_HOLDING_CAPACITY: readonly OrderStatus[] = [
  OrderStatus.PendingPayment,
  OrderStatus.Requested,
  OrderStatus.Confirmed,
];

/** The transitions an actor may start from a status (for the buttons a screen shows). */
export function transitionsFor(from: OrderStatus, actor: OrderActor): OrderTransitionRule[] {
  return ORDER_TRANSITIONS.filter((t) => t.from === from && t.actors.includes(actor));
}

// ---------------------------------------------------------------- labels

export interface StatusLabel {
  label: string;
  description: string;
}

export const ORDER_STATUS_LABELS_FOR_CLIENT: Record<OrderStatus, StatusLabel> = {
  [OrderStatus.PendingPayment]: {
    label: 'Awaiting payment',
    description:
      'Your booking is held while you pay. It is not booked until the payment goes through.',
  },
  [OrderStatus.Requested]: {
    label: 'Paid — waiting for the chef',
    description: 'We have your payment. The chef will confirm your event shortly.',
  },
  [OrderStatus.Confirmed]: {
    label: 'Confirmed',
    description: 'The chef has confirmed your event. We look forward to it.',
  },
  [OrderStatus.Completed]: {
    label: 'Served',
    description: 'Your event has taken place. Thank you for booking with us.',
  },
  [OrderStatus.Expired]: {
    label: 'Payment not completed',
    description:
      'The payment was not completed in time, so the date was released. You can book again.',
  },
  [OrderStatus.Declined]: {
    label: 'Declined',
    description: 'The chef could not take this booking. Everything you paid is refunded.',
  },
  [OrderStatus.Cancelled]: {
    label: 'Cancelled',
    description: 'This booking is cancelled. Any refund follows the cancellation policy.',
  },
};

export const ORDER_STATUS_LABELS_FOR_CHEF: Record<OrderStatus, StatusLabel> = {
  [OrderStatus.PendingPayment]: {
    label: 'Checkout open',
    description: 'The client has not paid yet. The plates are held until the checkout expires.',
  },
  [OrderStatus.Requested]: {
    label: 'To confirm',
    description: 'Paid. Confirm to add it to the prep plan, or decline to refund it in full.',
  },
  [OrderStatus.Confirmed]: {
    label: 'Confirmed',
    description: 'In the prep plan. Mark it served after the event.',
  },
  [OrderStatus.Completed]: {
    label: 'Served',
    description: 'Served. Kept for the figures and the payment records.',
  },
  [OrderStatus.Expired]: {
    label: 'Checkout expired',
    description: 'Never paid; its plates were released.',
  },
  [OrderStatus.Declined]: {
    label: 'Declined',
    description: 'You declined it; the payment is refunded in full.',
  },
  [OrderStatus.Cancelled]: {
    label: 'Cancelled',
    description: 'Cancelled; refunded by the policy tier on the day it was cancelled.',
  },
};

// ---------------------------------------------------------------- the transition

/** A transition the table refuses; the API answers 409. */
export class OrderTransitionError extends BookingError {
  constructor(
    readonly code: 'illegal_transition' | 'actor_not_allowed',
    readonly from: OrderStatus,
    readonly to: OrderStatus,
    readonly actor: OrderActor,
  ) {
    const fromLabel = ORDER_STATUS_LABELS_FOR_CHEF[from].label.toLowerCase();
    const toLabel = ORDER_STATUS_LABELS_FOR_CHEF[to].label.toLowerCase();
    super(
      code === 'illegal_transition'
        ? from === to
          ? `This order is already ${fromLabel}.`
          : `An order that is ${fromLabel} cannot become ${toLabel}.`
        : `“${transitionRule(from, to)?.action ?? toLabel}” can only be done by ${(
            transitionRule(from, to)?.actors ?? []
          )
            .map((a) => (a === 'system' ? 'the system' : `the ${a}`))
            .join(' or ')}.`,
    );
  }
}

export type TransitionResult =
  | { ok: true; status: OrderStatus; rule: OrderTransitionRule }
  | { ok: false; error: OrderTransitionError };

/** The next status, or why the table refuses it. */
export function transition(
  from: OrderStatus,
  to: OrderStatus,
  actor: OrderActor,
): TransitionResult {
  // Values read from a database or a request are checked, not trusted to the type.
  if (!isOrderStatus(from))
    throw new InvalidBookingInputError('The order status', from, 'a known status');
  if (!isOrderStatus(to))
    throw new InvalidBookingInputError('The new status', to, 'a known status');
  if (!(ORDER_ACTORS as readonly string[]).includes(actor)) {
    throw new InvalidBookingInputError('Who acts', actor, 'system, client or chef');
  }
  const rule = transitionRule(from, to);
  if (!rule)
    return { ok: false, error: new OrderTransitionError('illegal_transition', from, to, actor) };
  if (!rule.actors.includes(actor)) {
    return { ok: false, error: new OrderTransitionError('actor_not_allowed', from, to, actor) };
  }
  return { ok: true, status: rule.to, rule };
}

/** Like `transition`, throwing the error instead of returning it. */
export function assertTransition(
  from: OrderStatus,
  to: OrderStatus,
  actor: OrderActor,
): OrderStatus {
  const result = transition(from, to, actor);
  if (!result.ok) throw result.error;
  return result.status;
}
