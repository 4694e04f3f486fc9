import { z } from 'zod';
import {
  addIsoDays,
  assertIsoDate,
  compareIsoDates,
  daysBetween,
  formatIsoDate,
  type IsoDate,
} from '../availability/iso-date.js';
import { kitchenIdSchema, MONEY_MINOR_MAX, type Menu } from '../kitchen/types.js';
import {
  EventDatePassedError,
  EventPassedError,
  FinalGuestCountDeadlineError,
  GuestCountOutOfRangeError,
  InvalidBookingInputError,
  MenuNotOfferedError,
} from '../orders/booking-errors.js';
import {
  sortTiers,
  studioSettingsSchema,
  type CancellationTier,
  type StudioSettings,
} from '../settings/studio-settings.js';
import {
  assertMinor,
  formatMoney,
  formatRateBp,
  mulDivHalfUp,
  percentOf,
  taxAdded,
  taxIncluded,
} from './money.js';
import { plural } from '../words.js';

/**
 * The quote (DESIGN.md §6): per-guest price × guests, tax included or added, deposit, balance
 * and its due date; the refund for a cancellation on a given date by the policy tiers; and the
 * money side of a change of guest count. Amounts are integer minor units, rounded by the one
 * rule stated in money.ts (exact fraction, rounded once, half up; complements by subtraction).
 */

export const GUEST_COUNT_MAX = 5000;

const settingsShape = studioSettingsSchema.shape;

/**
 * What an order keeps of the menu and the settings when it is booked: later changes to prices
 * or policy never change an existing order's money.
 */
export const pricingSnapshotSchema = z.object({
  menuId: kitchenIdSchema,
  menuName: z.string().trim().min(1).max(120),
  pricePerGuestMinor: z
    .number()
    .int({ error: 'a whole number of minor units (cents)' })
    .min(0, { error: '0 or more' })
    .max(MONEY_MINOR_MAX, { error: 'no more than 10,000,000 minor units' }),
  minGuests: z.number().int().min(1).max(GUEST_COUNT_MAX),
  maxGuests: z.number().int().min(1).max(GUEST_COUNT_MAX),
  currency: settingsShape.currency,
  taxRateBp: settingsShape.taxRateBp,
  pricesIncludeTax: settingsShape.pricesIncludeTax,
  depositPercent: settingsShape.depositPercent,
  balanceDueDaysBefore: settingsShape.balanceDueDaysBefore,
  finalGuestCountDaysBefore: settingsShape.finalGuestCountDaysBefore,
  cancellationTiers: settingsShape.cancellationTiers,
});
export type PricingSnapshot = z.infer<typeof pricingSnapshotSchema>;

export function snapshotPricing(menu: Menu, settings: StudioSettings): PricingSnapshot {
  return checkPricing({
    menuId: menu.id,
    menuName: menu.name,
    pricePerGuestMinor: menu.pricePerGuestMinor,
    minGuests: menu.minGuests,
    maxGuests: menu.maxGuests,
    currency: settings.currency,
    taxRateBp: settings.taxRateBp,
    pricesIncludeTax: settings.pricesIncludeTax,
    depositPercent: settings.depositPercent,
    balanceDueDaysBefore: settings.balanceDueDaysBefore,
    finalGuestCountDaysBefore: settings.finalGuestCountDaysBefore,
    cancellationTiers: sortTiers(settings.cancellationTiers),
  });
}

function checkPricing(pricing: PricingSnapshot): PricingSnapshot {
  const parsed = pricingSnapshotSchema.safeParse(pricing);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    const field = issue.path.join('.');
    const value = issue.path.reduce<unknown>(
      (at, key) => (at as Record<PropertyKey, unknown> | undefined)?.[key],
      pricing,
    );
    throw new InvalidBookingInputError(
      `The price setting ${field || '(snapshot)'}`,
      value,
      `valid (${issue.message})`,
    );
  }
  if (parsed.data.maxGuests < parsed.data.minGuests) {
    throw new InvalidBookingInputError(
      'The menu’s maximum number of guests',
      parsed.data.maxGuests,
      `at least its minimum (${parsed.data.minGuests})`,
    );
  }
  return { ...parsed.data, cancellationTiers: sortTiers(parsed.data.cancellationTiers) };
}

// ---------------------------------------------------------------- totals

export interface QuoteTotals {
  /** Price per guest × guests, as the prices are written (including tax when they include it). */
  subtotalMinor: number;
  /** The taxable amount, tax excluded. */
  netMinor: number;
  taxMinor: number;
  /** What the client pays in all. */
  totalMinor: number;
}

function checkGuestCount(pricing: PricingSnapshot, guestCount: number): void {
  if (!Number.isInteger(guestCount) || guestCount < 1 || guestCount > GUEST_COUNT_MAX) {
    throw new InvalidBookingInputError(
      'The number of guests',
      guestCount,
      `a whole number from 1 to ${GUEST_COUNT_MAX}`,
    );
  }
  if (guestCount < pricing.minGuests || guestCount > pricing.maxGuests) {
    throw new GuestCountOutOfRangeError(
      guestCount,
      pricing.minGuests,
      pricing.maxGuests,
      pricing.menuName,
    );
  }
}

/** Subtotal, net, tax and total for a guest count, with one rounding (the tax). */
export function totalsFor(pricing: PricingSnapshot, guestCount: number): QuoteTotals {
  checkGuestCount(pricing, guestCount);
  const subtotalMinor = pricing.pricePerGuestMinor * guestCount;
  assertMinor('The subtotal', subtotalMinor);
  if (pricing.pricesIncludeTax) {
    const taxMinor = taxIncluded(subtotalMinor, pricing.taxRateBp);
    return {
      subtotalMinor,
      netMinor: subtotalMinor - taxMinor,
      taxMinor,
      totalMinor: subtotalMinor,
    };
  }
  const taxMinor = taxAdded(subtotalMinor, pricing.taxRateBp);
  return { subtotalMinor, netMinor: subtotalMinor, taxMinor, totalMinor: subtotalMinor + taxMinor };
}

// ---------------------------------------------------------------- the quote

export interface QuoteLine {
  description: string;
  quantity: number;
  unitPriceMinor: number;
  amountMinor: number;
}

export type PaymentPlan = 'deposit_and_balance' | 'full';

export interface Quote extends QuoteTotals {
  currency: string;
  pricing: PricingSnapshot;
  guestCount: number;
  eventDate: IsoDate;
  /** "Today" in the studio's time zone when the quote was made. */
  quotedOn: IsoDate;
  lines: QuoteLine[];
  taxRateBp: number;
  pricesIncludeTax: boolean;
  paymentPlan: PaymentPlan;
  /** Paid when booking: the deposit, or the whole total when the plan is `full`. */
  depositMinor: number;
  /** total − deposit; 0 when the plan is `full`. */
  balanceMinor: number;
  /** When the balance is due; null when everything is paid when booking. */
  balanceDueDate: IsoDate | null;
  /** The cancellation tiers in plain words, earliest first. */
  cancellationPolicy: string[];
  /** The quote in plain words: price, tax, what to pay when. */
  notes: string[];
}

export interface QuoteRequest {
  guestCount: number;
  eventDate: IsoDate;
  /** Today's date in the studio's time zone (see `dateInTimeZone`). */
  today: IsoDate;
}

/** A quote from the price snapshot an order keeps (also used to re-quote). */
export function quoteFromSnapshot(pricingIn: PricingSnapshot, request: QuoteRequest): Quote {
  const pricing = checkPricing(pricingIn);
  const { guestCount, eventDate, today } = request;
  assertIsoDate('The event date', eventDate);
  assertIsoDate('Today’s date', today);
  if (compareIsoDates(eventDate, today) < 0) throw new EventDatePassedError(eventDate, today);
  const totals = totalsFor(pricing, guestCount);
  const { currency } = pricing;
  const money = (m: number) => formatMoney(m, currency);

  const dueDate = addIsoDays(eventDate, -pricing.balanceDueDaysBefore);
  // The balance is due on `dueDate`; on or after it, there is no time left to pay in two steps.
  const eventIsSoon = compareIsoDates(dueDate, today) <= 0;
  const depositMinor =
    pricing.depositPercent >= 100 || eventIsSoon
      ? totals.totalMinor
      : percentOf(totals.totalMinor, pricing.depositPercent);
  const balanceMinor = totals.totalMinor - depositMinor;
  const paymentPlan: PaymentPlan = balanceMinor === 0 ? 'full' : 'deposit_and_balance';

  const notes = [
    `${pricing.menuName} for ${plural(guestCount, 'guest')} at ${money(pricing.pricePerGuestMinor)} per guest: ${money(totals.subtotalMinor)}.`,
    pricing.taxRateBp === 0
      ? 'No tax is charged.'
      : pricing.pricesIncludeTax
        ? `Prices include tax at ${formatRateBp(pricing.taxRateBp)}: ${money(totals.taxMinor)} of the total is tax.`
        : `Tax at ${formatRateBp(pricing.taxRateBp)} is added: ${money(totals.taxMinor)}.`,
  ];
  if (paymentPlan === 'deposit_and_balance') {
    notes.push(
      `Pay a deposit of ${pricing.depositPercent} % (${money(depositMinor)}) to book; the balance of ${money(balanceMinor)} is due by ${formatIsoDate(dueDate)} (${plural(pricing.balanceDueDaysBefore, 'day')} before the event).`,
    );
  } else if (pricing.depositPercent >= 100) {
    notes.push(`The whole total (${money(totals.totalMinor)}) is paid when you book.`);
  } else if (eventIsSoon) {
    notes.push(
      `The event is ${plural(daysBetween(today, eventDate), 'day')} away and the balance is due ${plural(pricing.balanceDueDaysBefore, 'day')} before it, so the deposit is the whole total: ${money(totals.totalMinor)} is paid when you book.`,
    );
  } else {
    notes.push(
      `The total is small enough that it is paid in full when you book: ${money(totals.totalMinor)}.`,
    );
  }

  return {
    ...totals,
    currency,
    pricing,
    guestCount,
    eventDate,
    quotedOn: today,
    lines: [
      {
        description: `${pricing.menuName}, per guest`,
        quantity: guestCount,
        unitPriceMinor: pricing.pricePerGuestMinor,
        amountMinor: totals.subtotalMinor,
      },
    ],
    taxRateBp: pricing.taxRateBp,
    pricesIncludeTax: pricing.pricesIncludeTax,
    paymentPlan,
    depositMinor,
    balanceMinor,
    balanceDueDate: paymentPlan === 'full' ? null : dueDate,
    cancellationPolicy: describeCancellationPolicy(pricing.cancellationTiers),
    notes,
  };
}

export interface QuoteInput extends QuoteRequest {
  menu: Menu;
  settings: StudioSettings;
}

/** The quote for a new booking, from the menu and the current settings. */
export function computeQuote(input: QuoteInput): Quote {
  if (!input.menu.active) throw new MenuNotOfferedError(input.menu.name);
  return quoteFromSnapshot(snapshotPricing(input.menu, input.settings), input);
}

// ---------------------------------------------------------------- cancellation

function refundPhrase(percent: number): string {
  return percent === 0 ? 'nothing is refunded' : `${percent} % of what you paid is refunded`;
}

/** The policy in plain words, one line per tier, earliest cancellation first. */
export function describeCancellationPolicy(tiers: readonly CancellationTier[]): string[] {
  const sorted = sortTiers(tiers);
  return sorted.map((tier, i) => {
    const d = tier.daysBefore;
    const upper = i === 0 ? undefined : sorted[i - 1]!.daysBefore - 1;
    let when: string;
    if (upper === undefined) {
      when =
        d === 0
          ? 'Cancel at any time up to the day of the event'
          : `Cancel ${plural(d, 'day')} or more before the event`;
    } else if (d === upper) {
      when =
        d === 0 ? 'Cancel on the day of the event' : `Cancel ${plural(d, 'day')} before the event`;
    } else if (d === 0) {
      when = `Cancel less than ${plural(upper + 1, 'day')} before the event, up to the day itself`;
    } else {
      when = `Cancel ${d} to ${upper} days before the event`;
    }
    return `${when}: ${refundPhrase(tier.refundPercent)}.`;
  });
}

/** The money of a booked order, as the refund and re-quote rules need it. */
export interface OrderMoney {
  pricing: PricingSnapshot;
  eventDate: IsoDate;
  guestCount: number;
  /** Received minus already refunded, from the payment ledger. */
  paidMinor: number;
  /** Part of `paidMinor` kept earlier under the policy when guests were removed. Default 0. */
  retainedMinor?: number;
}

function creditOf(order: OrderMoney): { paid: number; retained: number; credit: number } {
  assertMinor('The amount paid', order.paidMinor);
  const retained = order.retainedMinor ?? 0;
  assertMinor('The amount kept under the policy', retained);
  if (retained > order.paidMinor) {
    throw new InvalidBookingInputError(
      'The amount kept under the policy',
      retained,
      `no more than what was paid (${order.paidMinor})`,
    );
  }
  return { paid: order.paidMinor, retained, credit: order.paidMinor - retained };
}

/** The tier that applies to a cancellation `daysBefore` days before the event. */
export function tierFor(tiers: readonly CancellationTier[], daysBefore: number): CancellationTier {
  const tier = sortTiers(tiers).find((t) => t.daysBefore <= daysBefore);
  if (!tier) {
    throw new InvalidBookingInputError(
      'The cancellation policy',
      tiers,
      'complete, with a last tier starting 0 days before the event',
    );
  }
  return tier;
}

export interface RefundResult {
  currency: string;
  /** Null when the chef declined (no tier applies). */
  daysBeforeEvent: number | null;
  tier: CancellationTier | null;
  refundPercent: number;
  /** What was paid, net of earlier refunds. */
  paidMinor: number;
  /** The part of it the policy applies to (paid minus what an earlier change already kept). */
  refundableBaseMinor: number;
  refundMinor: number;
  /** paid − refund: what the studio keeps. */
  keptMinor: number;
  message: string;
}

/** The refund for a cancellation on `cancellationDate`, by the order's policy tiers. */
export function refundFor(order: OrderMoney, cancellationDate: IsoDate): RefundResult {
  assertIsoDate('The cancellation date', cancellationDate);
  assertIsoDate('The event date', order.eventDate);
  const pricing = checkPricing(order.pricing);
  const { paid, credit } = creditOf(order);
  const days = daysBetween(cancellationDate, order.eventDate);
  if (days < 0) throw new EventPassedError(order.eventDate);
  const tier = tierFor(pricing.cancellationTiers, days);
  const refundMinor = Math.min(credit, percentOf(credit, tier.refundPercent));
  const money = (m: number) => formatMoney(m, pricing.currency);
  const when = days === 0 ? 'on the day of the event' : `${plural(days, 'day')} before the event`;
  let outcome: string;
  if (paid === 0) outcome = 'nothing was paid, so there is nothing to refund';
  else if (tier.refundPercent === 0)
    outcome = `no refund under the cancellation policy (0 % of what you paid)`;
  else
    outcome = `${tier.refundPercent} % of what you paid is refunded (${money(refundMinor)} of ${money(credit)})`;
  return {
    currency: pricing.currency,
    daysBeforeEvent: days,
    tier,
    refundPercent: tier.refundPercent,
    paidMinor: paid,
    refundableBaseMinor: credit,
    refundMinor,
    keptMinor: paid - refundMinor,
    message: `Cancelled ${when}: ${outcome}.`,
  };
}

/** A booking the chef declines is refunded in full, whatever the date. */
export function declineRefund(order: OrderMoney): RefundResult {
  const pricing = checkPricing(order.pricing);
  const { paid } = creditOf(order);
  return {
    currency: pricing.currency,
    daysBeforeEvent: null,
    tier: null,
    refundPercent: 100,
    paidMinor: paid,
    refundableBaseMinor: paid,
    refundMinor: paid,
    keptMinor: 0,
    message:
      paid === 0
        ? 'The studio could not take this booking. Nothing was paid, so there is nothing to refund.'
        : `The studio could not take this booking: everything you paid (${formatMoney(paid, pricing.currency)}) is refunded.`,
  };
}

// ---------------------------------------------------------------- change of guest count

export interface Requote {
  change: 'increase' | 'decrease' | 'none';
  previousGuestCount: number;
  guestCount: number;
  previousTotalMinor: number;
  /** The quote at the new count, with the order's price snapshot, as of today. */
  quote: Quote;
  /** Collect this now (a new checkout); 0 on a decrease. */
  collectNowMinor: number;
  /** Refund this now; 0 on an increase. */
  refundNowMinor: number;
  /** Kept under the cancellation policy for the guests removed by this change. */
  retainedNowMinor: number;
  /** The tier applied to the guests removed (decrease only). */
  tier: CancellationTier | null;
  /** The order's money after the change (assuming the collection is paid). */
  paidAfterMinor: number;
  retainedAfterMinor: number;
  /** paidAfter − retainedAfter: what counts towards the new total. */
  creditedAfterMinor: number;
  /** new total − credited: still to pay. */
  balanceAfterMinor: number;
  balanceDueDate: IsoDate;
  message: string;
}

export interface RequoteOptions {
  /** The chef may change the count after the final-count deadline (not after the event). */
  allowAfterDeadline?: boolean;
}

/**
 * A change of guest count on a booked order. An increase collects what brings the payments up
 * to the new deposit (or the whole new total once the balance is due). A decrease treats the
 * removed guests as a partial cancellation: the share of what was paid that stood for them is
 * refunded by today's policy tier, the rest is kept; the remaining payments count towards the
 * new total. The order's price snapshot is used, never today's menu price.
 */
export function requote(
  order: OrderMoney,
  newGuestCount: number,
  today: IsoDate,
  options: RequoteOptions = {},
): Requote {
  assertIsoDate('Today’s date', today);
  assertIsoDate('The event date', order.eventDate);
  const pricing = checkPricing(order.pricing);
  const daysBefore = daysBetween(today, order.eventDate);
  if (daysBefore < 0) throw new EventPassedError(order.eventDate);
  const deadline = addIsoDays(order.eventDate, -pricing.finalGuestCountDaysBefore);
  if (!options.allowAfterDeadline && compareIsoDates(today, deadline) > 0) {
    throw new FinalGuestCountDeadlineError(deadline, pricing.finalGuestCountDaysBefore);
  }
  const { paid, retained, credit } = creditOf(order);
  const previousTotalMinor = totalsFor(pricing, order.guestCount).totalMinor;
  if (credit > previousTotalMinor) {
    throw new InvalidBookingInputError(
      'What was paid towards the order',
      credit,
      `no more than its total (${previousTotalMinor})`,
    );
  }
  const quote = quoteFromSnapshot(pricing, {
    guestCount: newGuestCount,
    eventDate: order.eventDate,
    today,
  });
  const newTotal = quote.totalMinor;
  const money = (m: number) => formatMoney(m, pricing.currency);
  const balanceDueDate = addIsoDays(order.eventDate, -pricing.balanceDueDaysBefore);
  const dueBy =
    compareIsoDates(balanceDueDate, today) <= 0 ? 'now' : `by ${formatIsoDate(balanceDueDate)}`;
  const head = `From ${plural(order.guestCount, 'guest')} to ${newGuestCount}`;

  if (newGuestCount > order.guestCount) {
    // The new quote's deposit is the whole total when the balance is already due.
    const collect = Math.max(0, quote.depositMinor - credit);
    const creditedAfter = credit + collect;
    const balanceAfter = newTotal - creditedAfter;
    const parts = [
      `${head}: the total rises from ${money(previousTotalMinor)} to ${money(newTotal)}.`,
      collect > 0 ? `To pay now: ${money(collect)}.` : 'Nothing more to pay now.',
    ];
    if (balanceAfter > 0) parts.push(`Still to pay: ${money(balanceAfter)} ${dueBy}.`);
    return {
      change: 'increase',
      previousGuestCount: order.guestCount,
      guestCount: newGuestCount,
      previousTotalMinor,
      quote,
      collectNowMinor: collect,
      refundNowMinor: 0,
      retainedNowMinor: 0,
      tier: null,
      paidAfterMinor: paid + collect,
      retainedAfterMinor: retained,
      creditedAfterMinor: creditedAfter,
      balanceAfterMinor: balanceAfter,
      balanceDueDate,
      message: parts.join(' '),
    };
  }

  if (newGuestCount === order.guestCount) {
    return {
      change: 'none',
      previousGuestCount: order.guestCount,
      guestCount: newGuestCount,
      previousTotalMinor,
      quote,
      collectNowMinor: 0,
      refundNowMinor: 0,
      retainedNowMinor: 0,
      tier: null,
      paidAfterMinor: paid,
      retainedAfterMinor: retained,
      creditedAfterMinor: credit,
      balanceAfterMinor: newTotal - credit,
      balanceDueDate,
      message: `The number of guests stays at ${order.guestCount}: nothing changes.`,
    };
  }

  // Decrease: the share of the credit that stood for the removed guests.
  const removedValue = previousTotalMinor - newTotal;
  const share = previousTotalMinor > 0 ? mulDivHalfUp(credit, removedValue, previousTotalMinor) : 0;
  const tier = tierFor(pricing.cancellationTiers, daysBefore);
  const refund = Math.min(share, percentOf(share, tier.refundPercent));
  const kept = share - refund;
  const creditedAfter = credit - share;
  const balanceAfter = newTotal - creditedAfter;
  const removed = order.guestCount - newGuestCount;
  const parts = [
    `${head}, ${daysBefore === 0 ? 'on the day of the event' : `${plural(daysBefore, 'day')} before the event`}: the total falls from ${money(previousTotalMinor)} to ${money(newTotal)}.`,
  ];
  if (share === 0) {
    parts.push(
      `Nothing paid so far stood for the ${plural(removed, 'guest')} removed, so there is nothing to refund.`,
    );
  } else if (tier.refundPercent === 0) {
    parts.push(
      `Of the ${money(share)} you paid for the ${plural(removed, 'guest')} removed, nothing is refunded under the cancellation policy.`,
    );
  } else {
    parts.push(
      `Of the ${money(share)} you paid for the ${plural(removed, 'guest')} removed, ${tier.refundPercent} % is refunded under the cancellation policy: ${money(refund)}${kept > 0 ? `; ${money(kept)} is kept` : ''}.`,
    );
  }
  if (balanceAfter > 0) parts.push(`Still to pay: ${money(balanceAfter)} ${dueBy}.`);
  return {
    change: 'decrease',
    previousGuestCount: order.guestCount,
    guestCount: newGuestCount,
    previousTotalMinor,
    quote,
    collectNowMinor: 0,
    refundNowMinor: refund,
    retainedNowMinor: kept,
    tier,
    paidAfterMinor: paid - refund,
    retainedAfterMinor: retained + kept,
    creditedAfterMinor: creditedAfter,
    balanceAfterMinor: balanceAfter,
    balanceDueDate,
    message: parts.join(' '),
  };
}
