import type {
  GuestAdvisory,
  GuestConflict,
  GuestConflictReport,
  Substitution,
} from '../conflicts/conflicts.js';
import type { OrderStatus } from '../orders/order-status.js';

/**
 * The allergy-notes API's answers: the server builds them, the admin shows them. Guest-level
 * fields are health data: shown to the chef and staff of the event, never logged. Dates are ISO
 * `YYYY-MM-DD`, times `HH:MM` (studio time), instants ISO 8601 date-times.
 *
 * Routes (all under /api):
 *   GET    /orders/:id/allergy-notes                              owner client, chef, staff → AllergyNotes
 *   PUT    /orders/:id/guests/:guestId/substitutions/:dessertId   chef → GuestNote
 *   DELETE /orders/:id/guests/:guestId/substitutions/:dessertId   chef → GuestNote
 *   GET    /orders/:id/briefing                                   chef, staff → Briefing
 *   GET    /orders/:id/briefing.pdf                               chef, staff → application/pdf
 *   GET    /orders/:id/access-log                                 chef → AccessLogEntry[] (newest first)
 *   GET    /allergy-notes/counts?orderIds=a,b,c                   chef, staff → AllergyCounts[]
 */

/** What the chef recorded for one guest and dessert. */
export interface RecordedSubstitution {
  changes: Substitution[];
  /** The changes in words: "Leave out Brown-butter almond crumble". */
  described: string[];
  note: string | null;
  recordedAt: string;
}

export interface GuestPlateNote {
  dessertId: string;
  dessertName: string;
  /** Nothing conflicts on the standard plate. */
  clear: boolean;
  /** Conflicts of the standard plate. */
  conflicts: GuestConflict[];
  /** "May contain" traces and the like, on the standard plate. */
  advisories: GuestAdvisory[];
  substitution: RecordedSubstitution | null;
  /** The plate checked again with the substitution applied (null without one). */
  afterSubstitution: GuestConflictReport | null;
  /** Nothing conflicts on the plate the guest will get. */
  resolved: boolean;
}

export interface GuestNote {
  /** The guest's position in the order (the id in the substitution routes). */
  guestId: number;
  label: string;
  table: string | null;
  allergens: string[];
  diets: string[];
  /** Free text as the client entered it: shown as entered, never interpreted. */
  notes: string | null;
  plates: GuestPlateNote[];
}

export interface UnresolvedConflict {
  guestId: number;
  guest: string;
  dessertId: string;
  dessertName: string;
  messages: string[];
}

export interface AllergyNotes {
  orderId: string;
  reference: string;
  status: OrderStatus;
  eventDate: string;
  serviceTime: string;
  guestCount: number;
  desserts: Array<{ id: string; name: string }>;
  guests: GuestNote[];
  unresolved: UnresolvedConflict[];
  advisoryCount: number;
}

export interface BriefingGuest {
  guest: string;
  dessert: string;
  /** What changes on the plate. */
  change: string;
  /** Why. */
  why: string[];
  /** Ask or tell the guest (cross-contact and the like). */
  advisories: string[];
  /** Still unsafe as planned: the chef has not resolved it. */
  unresolved: boolean;
}

export interface BriefingTable {
  table: string;
  guests: BriefingGuest[];
}

export interface Briefing {
  orderId: string;
  reference: string;
  occasion: string;
  eventDate: string;
  serviceTime: string;
  venue: string[];
  guestCount: number;
  standardPlates: number;
  tables: BriefingTable[];
}

/** Which of a guest's health data the studio opened. */
export type GuestDataView = 'allergy_notes' | 'briefing' | 'briefing_pdf' | 'guest_list';

/** One opening of an order's guest data by the chef or staff. */
export interface AccessLogEntry {
  at: string;
  userId: string | null;
  name: string | null;
  role: string;
  what: GuestDataView;
}

/**
 * Anonymous counts of one order's allergy notes, for the list of events: no guest's name,
 * allergens or notes, so reading them is not an opening of health data (not logged).
 */
export interface AllergyCounts {
  orderId: string;
  /** Guests who stated an allergen, a diet or a note. */
  guestsWithRequirements: number;
  /** Guest plates that still conflict on the plate the guest will get. */
  unresolvedPlates: number;
  /** Guests with at least one such plate. */
  unresolvedGuests: number;
  /** Plates the chef changed for a guest (recorded substitutions). */
  substitutions: number;
  advisoryCount: number;
  /** Why the plates could not be checked (a recipe the menu needs is broken), else null. */
  problem: string | null;
}
