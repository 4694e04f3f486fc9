import { describe, expect, it } from 'vitest';
import { InvalidBookingInputError } from '../booking-errors.js';
import {
  ORDER_ACTORS,
  ORDER_STATUSES,
  ORDER_STATUS_LABELS_FOR_CHEF,
  ORDER_STATUS_LABELS_FOR_CLIENT,
  ORDER_TRANSITIONS,
  OrderStatus,
  OrderTransitionError,
  assertTransition,
  isFinalStatus,
  transition,
  transitionsFor,
  type OrderActor,
} from '../order-status.js';

/**
 * The expected matrix, written out again from DESIGN.md's lifecycle (not derived from the table
 * under test): from → to → who may do it. Every pair absent here must be refused.
 */
const EXPECTED: Record<string, OrderActor[]> = {
  'pending_payment→requested': ['system'], // payment received
  'pending_payment→expired': ['system'], // checkout never paid
  'pending_payment→cancelled': ['client'], // gives up before paying
  'requested→confirmed': ['chef'],
  'requested→declined': ['chef'], // chef refused → full refund
  'requested→cancelled': ['client'],
  'confirmed→completed': ['chef', 'system'], // after service
  'confirmed→cancelled': ['client', 'chef'], // refund by the policy tier
};

describe('the order lifecycle, every pair of statuses for every actor', () => {
  const cases = ORDER_STATUSES.flatMap((from) =>
    ORDER_STATUSES.flatMap((to) => ORDER_ACTORS.map((actor) => ({ from, to, actor }))),
  );

  it('covers 7 × 7 × 3 = 147 cases', () => {
    expect(ORDER_STATUSES).toHaveLength(7);
    expect(cases).toHaveLength(147);
  });

  it.each(cases)('$from → $to by $actor', ({ from, to, actor }) => {
    const allowedActors = EXPECTED[`${from}→${to}`];
    const result = transition(from, to, actor);
    if (allowedActors?.includes(actor)) {
      expect(result).toMatchObject({ ok: true, status: to });
      expect(assertTransition(from, to, actor)).toBe(to);
    } else {
      expect(result.ok).toBe(false);
      if (result.ok) return;
      expect(result.error).toBeInstanceOf(OrderTransitionError);
      expect(result.error.code).toBe(allowedActors ? 'actor_not_allowed' : 'illegal_transition');
      expect(() => assertTransition(from, to, actor)).toThrowError(OrderTransitionError);
    }
  });

  it('the table holds exactly the expected transitions', () => {
    expect(ORDER_TRANSITIONS).toHaveLength(Object.keys(EXPECTED).length);
  });
});

describe('around the table', () => {
  it('refusals read as sentences', () => {
    const r = transition(OrderStatus.Completed, OrderStatus.Cancelled, 'client');
    expect(!r.ok && r.error.message).toBe('An order that is served cannot become cancelled.');
    const again = transition(OrderStatus.Confirmed, OrderStatus.Confirmed, 'chef');
    expect(!again.ok && again.error.message).toBe('This order is already confirmed.');
    const who = transition(OrderStatus.Requested, OrderStatus.Confirmed, 'client');
    expect(!who.ok && who.error.message).toBe('“Confirm” can only be done by the chef.');
    const cancel = transition(OrderStatus.Confirmed, OrderStatus.Cancelled, 'system');
    expect(!cancel.ok && cancel.error.message).toBe(
      '“Cancel booking” can only be done by the client or the chef.',
    );
  });

  it('final statuses: completed, expired, declined, cancelled', () => {
    expect(ORDER_STATUSES.filter(isFinalStatus)).toEqual([
      OrderStatus.Completed,
      OrderStatus.Expired,
      OrderStatus.Declined,
      OrderStatus.Cancelled,
    ]);
  });

  it('the buttons a chef sees on a paid request', () => {
    expect(transitionsFor(OrderStatus.Requested, 'chef').map((t) => t.action)).toEqual([
      'Confirm',
      'Decline',
    ]);
    expect(transitionsFor(OrderStatus.Confirmed, 'client').map((t) => t.to)).toEqual([
      OrderStatus.Cancelled,
    ]);
  });

  it('every status has a plain label for the client and for the chef', () => {
    for (const labels of [ORDER_STATUS_LABELS_FOR_CLIENT, ORDER_STATUS_LABELS_FOR_CHEF]) {
      expect(Object.keys(labels).sort()).toEqual([...ORDER_STATUSES].sort());
      const texts = Object.values(labels).map((l) => l.label);
      expect(new Set(texts).size).toBe(texts.length);
      for (const l of Object.values(labels)) {
        expect(l.label).not.toMatch(/_/); // never the raw enum value
        expect(l.description).toMatch(/\.$/);
      }
    }
  });

  it('values from outside are checked', () => {
    expect(() => transition('paid' as OrderStatus, OrderStatus.Confirmed, 'chef')).toThrowError(
      InvalidBookingInputError,
    );
    expect(() =>
      transition(OrderStatus.Requested, OrderStatus.Confirmed, 'staff' as OrderActor),
    ).toThrowError(InvalidBookingInputError);
  });
});
