// What the allergy-notes endpoints answer: the contract lives in shared, with the API that builds it.
export type {
  AccessLogEntry,
  AllergyCounts,
  AllergyNotes,
  Briefing,
  BriefingGuest,
  BriefingTable,
  GuestNote,
  GuestPlateNote,
  RecordedSubstitution,
  UnresolvedConflict,
} from '@nappe/shared';

/** Request bodies and the parts of other endpoints these screens read. */

/** `PUT …/guests/:guestId/substitutions/:dessertId` */
export interface SubstitutionBody {
  leaveOut: string[];
  replace: Array<{ componentRecipeId: string; replacementRecipeId: string }>;
  note?: string;
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
