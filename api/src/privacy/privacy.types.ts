import type { GuestDetailsRemoved } from './guest-retention.js';

/**
 * `GET /api/me/export`: everything Nappe holds about the signed-in client, as one JSON document
 * (GDPR Art. 15 access and Art. 20 portability). Money in integer minor units; instants in ISO
 * 8601 UTC; dates `YYYY-MM-DD` in the studio's zone. Nothing about any other client; the studio's
 * people appear by role only.
 */
export interface PersonalDataExport {
  format: 'nappe-personal-data-export';
  version: 1;
  exportedAt: string;
  studio: { name: string; timeZone: string; guestDataRetentionDays: number };
  account: {
    id: string;
    name: string;
    email: string;
    role: string;
    createdAt: string;
    updatedAt: string;
  };
  /** Signed-in devices (sessions); tokens themselves are never stored in the clear. */
  sessions: Array<{
    createdAt: string;
    lastUsedAt: string;
    expiresAt: string;
    revokedAt: string | null;
    revokedReason: string | null;
  }>;
  consents: Array<{ orderId: string; kind: string; statement: string; at: string }>;
  orders: ExportedOrder[];
  /** E-mails the studio sent (or is about to send) to this account's address. */
  emails: Array<{
    kind: string;
    orderId: string | null;
    to: string;
    subject: string;
    text: string;
    status: string;
    createdAt: string;
    sentAt: string | null;
  }>;
  /** Earlier exports and erasure requests. */
  privacyRequests: Array<{ action: string; at: string; detail: Record<string, unknown> }>;
}

export interface ExportedOrder {
  id: string;
  reference: string;
  status: string;
  menu: { id: string; name: string };
  eventDate: string;
  serviceTime: string;
  venueAddressLines: string[];
  occasion: string;
  contactPhone: string;
  guestCount: number;
  plates: number;
  currency: string;
  totalMinor: number;
  retainedMinor: number;
  quote: unknown;
  createdAt: string;
  updatedAt: string;
  /** The guests' requirements while they are held; an empty list once removed. */
  guests: Array<{
    position: number;
    label: string;
    table: string | null;
    allergens: string[];
    diets: string[];
    notes: string | null;
  }>;
  /** What the chef changes on a guest's plate (held with the guests, removed with them). */
  substitutions: Array<{
    guestPosition: number;
    guestLabel: string;
    dessert: string;
    changes: Array<{ component: string; replacement: string | null }>;
    note: string | null;
    recordedAt: string;
  }>;
  /** Null while held; otherwise why and since when the guest details are gone. */
  guestDetailsRemoved: GuestDetailsRemoved | null;
  /** The anonymous counts kept after removal (null while the details are held). */
  keptGuestCounts: {
    guestsListed: number;
    guestsWithNotes: number;
    allergenCounts: Record<string, number>;
    dietCounts: Record<string, number>;
  } | null;
  payments: Array<{
    id: string;
    kind: string;
    status: string;
    amountMinor: number;
    currency: string;
    refundOfPaymentId: string | null;
    operation: string | null;
    providerPaymentIntentId: string | null;
    providerRefundId: string | null;
    createdAt: string;
    settledAt: string | null;
  }>;
  /** The order's audit trail. */
  timeline: Array<{
    at: string;
    by: string;
    fromStatus: string | null;
    toStatus: string | null;
    summary: string;
    reason: string | null;
  }>;
  /** Each time the studio (chef or staff, by role) opened these guests' details. */
  guestDataOpenings: Array<{ at: string; role: string; what: string }>;
}

/** `DELETE /api/me`: what was erased and what the studio keeps, and why. */
export interface AccountDeletionResult {
  deleted: true;
  erased: string[];
  kept: string[];
  ordersAnonymised: number;
  guestEntriesRemoved: number;
  paymentRecordsKept: number;
}
