import type {
  GuestAdvisory,
  GuestConflict,
  GuestConflictReport,
  OrderStatus,
  Substitution,
} from '@nappe/shared';

/**
 * What the allergy-notes endpoints answer (api/src/allergy-notes/allergy-notes.types.ts).
 * Guest-level fields are health data: shown to the chef and staff of the event, never logged.
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

/** `PUT …/guests/:guestId/substitutions/:dessertId` */
export interface SubstitutionBody {
  leaveOut: string[];
  replace: Array<{ componentRecipeId: string; replacementRecipeId: string }>;
  note?: string;
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

export type AccessKind = 'allergy_notes' | 'briefing' | 'briefing_pdf' | 'guest_list';

export interface AccessLogEntry {
  at: string;
  userId: string | null;
  name: string | null;
  role: string;
  what: AccessKind | string;
}

/** `GET /api/allergy-notes/counts`: numbers only, per order. */
export interface AllergyCounts {
  orderId: string;
  guestsWithRequirements: number;
  unresolvedPlates: number;
  unresolvedGuests: number;
  substitutions: number;
  advisoryCount: number;
  /** Why the plates could not be checked, else null. */
  problem: string | null;
}

/** The few fields of a dessert the substitution form needs (`GET /api/desserts/:id`). */
export interface DessertComponents {
  id: string;
  name: string;
  components: Array<{ recipeId: string; quantity: number; unit: string }>;
  referenceNames: Record<string, string>;
}

/** A recipe that can take a component's place. */
export interface RecipeChoice {
  id: string;
  name: string;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}
