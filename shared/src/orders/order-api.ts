import type { DayStatus } from '../availability/availability.js';
import type { IsoDate } from '../availability/iso-date.js';
import type { Quote, RefundResult, Requote } from '../quote/quote.js';
import type { OrderStatus } from './order-status.js';

/**
 * The booking API's response shapes, shared by the API (which returns them) and the storefront
 * (which reads them). Money is integer minor units in `currency`; dates are ISO `YYYY-MM-DD`;
 * instants are ISO 8601 date-times with an offset.
 *
 * Routes (all under /api):
 *   GET  /availability?menuId&from&to            public   → AvailabilityResponse (≤ 92 days)
 *   GET  /booking-terms                            public   → BookingTerms
 *   POST /quotes                                   public   → Quote                 (createQuoteSchema)
 *   POST /orders                                   client   → OrderDetail, 201      (createOrderSchema; `Idempotency-Key` header)
 *   GET  /orders?page&pageSize&status              client: own; chef/staff: all → Page<OrderSummary>
 *   GET  /orders/:id                               owner client, chef, staff → OrderDetail (another client's → 404)
 *   POST /orders/:id/checkout                      owner    → CheckoutResponse      ({ plan: 'deposit' | 'full' | 'balance' | 'top_up' })
 *   POST /orders/:id/checkout/return               owner    → OrderDetail           ({ sessionId }) — the return from the payment page
 *   POST /orders/:id/cancellation-preview          owner, chef → CancellationPreview
 *   POST /orders/:id/cancel                        owner, chef → OrderDetail        (orderReasonSchema + refund: 'policy' | 'full'; 'full' is the chef's only)
 *   POST /orders/:id/guest-change-preview          owner, chef → GuestChangePreview (changeGuestCountSchema)
 *   PUT  /orders/:id/guests                        owner, chef → GuestChangeResult  (changeGuestCountSchema; the chef also after the deadline)
 *   POST /orders/:id/confirm                       chef     → OrderDetail           (orderReasonSchema) requested → confirmed
 *   POST /orders/:id/decline                       chef     → OrderDetail           (orderReasonSchema) requested → declined, full refund
 *   POST /orders/:id/complete                      chef     → OrderDetail           (orderReasonSchema) confirmed → completed
 *   GET  /orders/:id/receipts/:paymentId.pdf       owner, chef → application/pdf
 *   GET  /orders/:id/event.ics                     owner, chef, staff → text/calendar
 *   POST /payments/webhook                         public (signature on the raw body)
 *
 * Errors: Nest's shape `{ statusCode, message, error }`; rule errors add `code` (booking-errors.ts).
 * 400 bad input, 404 not found (or another client's), 409 refused by the order's state or the
 * calendar, 429 too many unpaid bookings, 502 the payment service refused, 503 it did not answer
 * (nothing changed; try again).
 */

export interface AvailabilityDay {
  date: IsoDate;
  status: DayStatus;
  /** Plates the kitchen can still take that day (0 when not open). */
  remainingPlates: number;
  /** Whether the asked guest count (if any) fits that day. */
  fitsGuests?: boolean;
}

export interface AvailabilityResponse {
  menuId: string;
  timeZone: string;
  /** Today in the studio's time zone. */
  today: IsoDate;
  /** The first date this menu can be booked for, by its lead days. */
  earliestDate: IsoDate;
  platesPerGuest: number;
  days: AvailabilityDay[];
}

/** What a client must know before paying: read from the studio's settings. */
export interface BookingTerms {
  currency: string;
  pricesIncludeTax: boolean;
  taxRateBp: number;
  depositPercent: number;
  balanceDueDaysBefore: number;
  finalGuestCountDaysBefore: number;
  /** The cancellation tiers in plain words, earliest first. */
  cancellationPolicy: string[];
  /** The full terms the client accepts, as paragraphs. */
  terms: string[];
}

export type PaymentKind = 'deposit' | 'full' | 'balance' | 'top_up' | 'refund';
export type PaymentRecordStatus = 'pending' | 'succeeded' | 'failed' | 'expired';

/** One line of the order's ledger: money in (payments) or out (refunds). */
export interface PaymentRecord {
  id: string;
  kind: PaymentKind;
  status: PaymentRecordStatus;
  /** Always positive; refunds are money out. */
  amountMinor: number;
  currency: string;
  createdAt: string;
  /** When the money moved (succeeded), else null. */
  settledAt: string | null;
  /** A receipt exists for settled payments and refunds. */
  receiptAvailable: boolean;
}

/** One recorded state change or notable event of the order (the audit trail, shown as a timeline). */
export interface OrderEvent {
  id: string;
  at: string;
  /** `null` for a change the system made (a payment received, a checkout expired). */
  actor: { role: 'client' | 'chef' | 'staff' | 'system'; name: string | null };
  fromStatus: OrderStatus | null;
  toStatus: OrderStatus | null;
  /** Plain words, e.g. "Deposit of €57.00 received". */
  summary: string;
  reason: string | null;
}

export interface OrderGuest {
  /** Name or label, e.g. "Table 3, seat 2" or "Aunt Mireille". */
  label: string;
  table?: string;
  allergens: string[];
  diets: string[];
  notes?: string;
}

export interface OrderSummary {
  id: string;
  /** Short human reference, e.g. "N-2026-0042". */
  reference: string;
  status: OrderStatus;
  menuId: string;
  menuName: string;
  eventDate: IsoDate;
  serviceTime: string;
  guestCount: number;
  /**
   * Plates it takes from the day's capacity (guests × the menu's desserts). Sent by the API;
   * optional only so that fixtures written before it was added still type-check.
   */
  plates?: number;
  currency: string;
  totalMinor: number;
  paidMinor: number;
  /** Still to pay (total − credited); 0 when settled. */
  balanceMinor: number;
  balanceDueDate: IsoDate | null;
  clientName: string;
  createdAt: string;
}

export interface OrderDetail extends OrderSummary {
  venueAddressLines: string[];
  occasion: string;
  contactPhone: string;
  clientEmail: string;
  /** The quote as it was made when booking (the price snapshot the order keeps). */
  quote: Quote;
  guests: OrderGuest[];
  payments: PaymentRecord[];
  timeline: OrderEvent[];
  /** What the client may do now. */
  actions: {
    pay: 'deposit_or_full' | 'balance' | 'top_up' | null;
    cancel: boolean;
    changeGuests: boolean;
  };
  /** Until when guests and counts can change (the final-count deadline), or null once passed. */
  changeGuestsUntil: IsoDate | null;
}

export interface CheckoutResponse {
  /** The payment page to send the browser to. */
  checkoutUrl: string;
  sessionId: string;
  amountMinor: number;
  currency: string;
  expiresAt: string;
}

export interface CancellationPreview {
  refund: RefundResult;
  /** The status the order would move to. */
  nextStatus: OrderStatus;
}

export interface GuestChangePreview {
  requote: Requote;
}

export interface GuestChangeResult {
  order: OrderDetail;
  /** Present when the change must be paid: send the browser there. */
  checkout: CheckoutResponse | null;
  /** Refunded now for removed guests, 0 otherwise. */
  refundedMinor: number;
}
