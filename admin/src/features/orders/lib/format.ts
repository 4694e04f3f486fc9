import {
  isoDayNumber,
  ORDER_STATUS_LABELS_FOR_CHEF,
  type IsoDate,
  type OrderStatus,
  type PaymentKind,
  type PaymentRecordStatus,
} from '@nappe/shared';

const noonUtc = (date: IsoDate) => isoDayNumber(date) * 86_400_000 + 43_200_000;

/**
 * "Sat 14 Mar 2026". An event date is a day of the studio's calendar, not an instant: it is
 * formatted as that calendar day, whatever the device's time zone.
 */
export function shortDate(date: IsoDate): string {
  // Built from the parts so that the punctuation does not change with the runtime's CLDR data
  // (some versions write "Sat, 14 Mar 2026").
  const parts: Record<string, string> = {};
  for (const p of new Intl.DateTimeFormat('en-GB', {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    timeZone: 'UTC',
  }).formatToParts(noonUtc(date))) {
    parts[p.type] = p.value;
  }
  return `${parts.weekday} ${parts.day} ${parts.month} ${parts.year}`;
}

/** "14 Mar 2026, 10:02" on the studio's clock (audit trail, payments, access log). */
export function studioDateTime(instant: string, timeZone: string): string {
  return new Intl.DateTimeFormat('en-GB', {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
    timeZone,
  }).format(new Date(instant));
}

export function statusLabel(status: OrderStatus): string {
  return ORDER_STATUS_LABELS_FOR_CHEF[status].label;
}

export const PAYMENT_KIND_LABELS: Record<PaymentKind, string> = {
  deposit: 'Deposit',
  full: 'Full payment',
  balance: 'Balance',
  top_up: 'Added guests',
  refund: 'Refund',
};

export const PAYMENT_STATUS_LABELS: Record<PaymentRecordStatus, string> = {
  pending: 'Pending',
  succeeded: 'Settled',
  failed: 'Failed',
  expired: 'Not paid (expired)',
};

/** Who opened the guests' details, in words (GuestDataView in the API). */
export const ACCESS_KINDS: Record<string, string> = {
  allergy_notes: 'allergy notes',
  briefing: 'staff briefing',
  briefing_pdf: 'briefing PDF',
  guest_list: 'guest list',
};

export const ROLE_WORDS: Record<string, string> = {
  chef: 'chef',
  staff: 'staff',
  client: 'client',
  system: 'Nappe',
};
