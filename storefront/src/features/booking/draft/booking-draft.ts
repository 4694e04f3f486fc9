import type { GuestRequirement } from '@nappe/shared';
import { useCallback, useMemo, useSyncExternalStore } from 'react';

/**
 * The booking in progress, kept in this tab's sessionStorage so that Back, a reload or a detour
 * through Sign in lose nothing. Never localStorage: the guests' allergies and diets are health
 * data and must not outlive the tab. Cleared once the booking is made (the Booked page).
 * The raw form values are kept; the shared schemas check them when each step is left.
 */

export const DRAFT_STORAGE_KEY = 'nappe.booking-draft';

export interface EventDraft {
  eventDate: string;
  serviceTime: string;
  /** The venue's address as typed: one line per address line. */
  venueAddress: string;
  occasion: string;
  contactPhone: string;
}

export interface GuestsDraft {
  guestCount: number | null;
  guestRequirements: GuestRequirement[];
  guestDataConsent: boolean;
}

export type PaymentChoice = 'deposit' | 'full';

/** One try at booking: its idempotency key, what it booked, and the order once made. */
export interface BookingAttempt {
  key: string;
  /** The exact request body the key was used for: any change is a new attempt. */
  fingerprint: string;
  orderId: string | null;
}

export interface BookingDraft {
  version: 1;
  menuId: string;
  event: EventDraft;
  guests: GuestsDraft | null;
  acceptTerms: boolean;
  plan: PaymentChoice;
  attempt: BookingAttempt | null;
}

export const EMPTY_EVENT: EventDraft = {
  eventDate: '',
  serviceTime: '',
  venueAddress: '',
  occasion: '',
  contactPhone: '',
};

export function emptyDraft(menuId: string): BookingDraft {
  return {
    version: 1,
    menuId,
    event: EMPTY_EVENT,
    guests: null,
    acceptTerms: false,
    plan: 'deposit',
    attempt: null,
  };
}

function storage(): Storage | null {
  try {
    return window.sessionStorage;
  } catch {
    // Storage can be switched off; the wizard still works within one page view.
    return null;
  }
}

let memory: string | null = null;
let lastRaw: string | null | undefined;
let lastDraft: BookingDraft | null = null;
const listeners = new Set<() => void>();

function readRaw(): string | null {
  const store = storage();
  return store ? store.getItem(DRAFT_STORAGE_KEY) : memory;
}

function isDraft(value: unknown): value is BookingDraft {
  if (typeof value !== 'object' || value === null) return false;
  const v = value as Partial<BookingDraft>;
  return (
    v.version === 1 &&
    typeof v.menuId === 'string' &&
    typeof v.event === 'object' &&
    v.event !== null &&
    typeof v.acceptTerms === 'boolean' &&
    (v.plan === 'deposit' || v.plan === 'full')
  );
}

/** The stored draft (the same object while storage is unchanged), or null. */
export function readBookingDraft(): BookingDraft | null {
  const raw = readRaw();
  if (raw !== lastRaw) {
    lastRaw = raw;
    try {
      const parsed: unknown = raw ? JSON.parse(raw) : null;
      lastDraft = isDraft(parsed)
        ? { ...parsed, event: { ...EMPTY_EVENT, ...parsed.event } }
        : null;
    } catch {
      lastDraft = null;
    }
  }
  return lastDraft;
}

/**
 * Stores the draft. A quiet write (each keystroke of a form, so that a reload loses nothing)
 * does not re-render the wizard: its other screens learn of it at the next step.
 */
export function writeBookingDraft(draft: BookingDraft, { quiet = false } = {}): void {
  const raw = JSON.stringify(draft);
  const store = storage();
  try {
    if (store) store.setItem(DRAFT_STORAGE_KEY, raw);
    else memory = raw;
  } catch {
    memory = raw;
  }
  if (!quiet) listeners.forEach((l) => l());
}

/** Forget the booking in progress (after booking, or when starting over). */
export function clearBookingDraft(): void {
  storage()?.removeItem(DRAFT_STORAGE_KEY);
  memory = null;
  listeners.forEach((l) => l());
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/**
 * The draft for a menu (a fresh one when the stored draft is for another menu) and a function
 * to change it. Changing it writes it to sessionStorage at once.
 */
export function useBookingDraft(menuId: string) {
  const stored = useSyncExternalStore(subscribe, readBookingDraft, () => null);
  const draft = useMemo(
    () => (stored && stored.menuId === menuId ? stored : emptyDraft(menuId)),
    [stored, menuId],
  );
  const update = useCallback(
    (change: (current: BookingDraft) => BookingDraft, options?: { quiet?: boolean }) => {
      const current = readBookingDraft();
      writeBookingDraft(
        change(current && current.menuId === menuId ? current : emptyDraft(menuId)),
        options,
      );
    },
    [menuId],
  );
  return [draft, update] as const;
}
