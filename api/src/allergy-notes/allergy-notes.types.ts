import type {
  GuestAdvisory,
  GuestConflict,
  GuestConflictReport,
  Substitution,
} from '@nappe/shared';

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
  clear: boolean;
  conflicts: GuestConflict[];
  advisories: GuestAdvisory[];
  substitution: RecordedSubstitution | null;
  /** The plate checked again with the substitution applied (null without one). */
  afterSubstitution: GuestConflictReport | null;
  /** Nothing conflicts on the plate the guest will get. */
  resolved: boolean;
}

export interface GuestNote {
  guestId: number;
  label: string;
  table: string | null;
  allergens: string[];
  diets: string[];
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
  status: string;
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

export interface AccessLogEntry {
  at: string;
  userId: string | null;
  name: string | null;
  role: string;
  what: string;
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
