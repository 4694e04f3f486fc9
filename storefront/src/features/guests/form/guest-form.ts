import {
  changeGuestCountSchema,
  DIETS,
  EU_ALLERGEN_GROUPS,
  GUEST_ALLERGENS,
  guestAllergenLabel,
  DIET_LABELS,
  type Diet,
  type GuestAllergen,
  type GuestRequirement,
} from '@nappe/shared';
import { get, set, type FieldErrors, type Resolver } from 'react-hook-form';

/** One guest's requirements as the form holds them (empty strings for empty fields). */
export interface GuestRow {
  label: string;
  table: string;
  allergens: GuestAllergen[];
  diets: Diet[];
  notes: string;
}

/** The guest form. Field names are the request's, so the shared schema's errors land on them. */
export interface GuestFormValues {
  guestCount: number;
  guestRequirements: GuestRow[];
  guestDataConsent: boolean;
}

/** What the API takes (`changeGuestCountSchema`, and the guest part of `createOrderSchema`). */
export interface GuestRequest {
  guestCount: number;
  guestRequirements: GuestRequirement[];
  guestDataConsent?: boolean;
}

export const LABEL_MAX = 120;
export const TABLE_MAX = 40;
export const NOTES_MAX = 500;

export function emptyGuestRow(): GuestRow {
  return { label: '', table: '', allergens: [], diets: [], notes: '' };
}

export function toGuestRow(requirement: GuestRequirement): GuestRow {
  return {
    label: requirement.label,
    table: requirement.table ?? '',
    allergens: [...requirement.allergens],
    diets: [...requirement.diets],
    notes: requirement.notes ?? '',
  };
}

export function toRequirement(row: GuestRow): GuestRequirement {
  const table = row.table.trim();
  const notes = row.notes.trim();
  return {
    label: row.label.trim(),
    ...(table ? { table } : {}),
    allergens: [...row.allergens],
    diets: [...row.diets],
    ...(notes ? { notes } : {}),
  };
}

/** The request the form stands for; consent is sent only when guests are listed. */
export function toGuestRequest(values: GuestFormValues): GuestRequest {
  const guestRequirements = values.guestRequirements.map(toRequirement);
  return {
    guestCount: values.guestCount,
    guestRequirements,
    ...(guestRequirements.length > 0 ? { guestDataConsent: values.guestDataConsent } : {}),
  };
}

export function toGuestFormValues(
  request: {
    guestCount: number | null;
    guestRequirements: GuestRequirement[];
    guestDataConsent?: boolean;
  } | null,
): GuestFormValues {
  return {
    guestCount: request?.guestCount ?? Number.NaN,
    guestRequirements: (request?.guestRequirements ?? []).map(toGuestRow),
    guestDataConsent: request?.guestDataConsent ?? false,
  };
}

export interface GuestLimits {
  minGuests: number;
  maxGuests: number;
  /** A further check of the count, e.g. the plates left on the chosen day; a message or null. */
  checkCount?: (guestCount: number) => string | null;
}

/**
 * Checks the form with the shared `changeGuestCountSchema` (the count, each guest's
 * requirements, no more guests listed than invited, consent when anyone is listed), then the
 * menu's guest limits. Errors are placed under the fields they concern.
 */
export function guestFormResolver(getLimits: () => GuestLimits): Resolver<GuestFormValues> {
  return async (values) => {
    const limits = getLimits();
    const errors: FieldErrors<GuestFormValues> = {};
    const add = (path: string, message: string, type = 'validate') => {
      if (!(get(errors, path) as { message?: string } | undefined)?.message) {
        set(errors, path, { type, message });
      }
    };
    const parsed = changeGuestCountSchema.safeParse(toGuestRequest(values));
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const path = issue.path.map(String);
        // A problem with the whole list (more guests listed than invited) sits on its root.
        const name =
          path.length === 1 && path[0] === 'guestRequirements'
            ? 'guestRequirements.root'
            : path.join('.');
        add(name, issue.message, issue.code);
      }
    }
    const count = values.guestCount;
    if (!get(errors, 'guestCount') && Number.isInteger(count)) {
      if (count < limits.minGuests) {
        add('guestCount', `This menu is served to at least ${limits.minGuests} guests.`);
      } else if (count > limits.maxGuests) {
        add(
          'guestCount',
          `This menu is served to at most ${limits.maxGuests} guests. For a larger party, please contact the studio.`,
        );
      } else {
        const message = limits.checkCount?.(count);
        if (message) add('guestCount', message);
      }
    }
    return Object.keys(errors).length > 0 ? { values: {}, errors } : { values, errors: {} };
  };
}

/** Allergens and diets in the order the forms list them. */
export const FORM_ALLERGENS: readonly GuestAllergen[] = EU_ALLERGEN_GROUPS;
export const FORM_DIETS: readonly Diet[] = DIETS;

const allergenOrder = new Map<string, number>(GUEST_ALLERGENS.map((a, i) => [a, i]));

export function sortAllergens(list: readonly GuestAllergen[]): GuestAllergen[] {
  return [...list].sort((a, b) => (allergenOrder.get(a) ?? 0) - (allergenOrder.get(b) ?? 0));
}

export function allergenLabel(a: GuestAllergen): string {
  return guestAllergenLabel(a);
}

export function dietLabel(d: Diet): string {
  return DIET_LABELS[d];
}

/** "Milk, Eggs · Vegetarian", or "No allergies or diets yet". */
export function requirementSummary(row: Pick<GuestRow, 'allergens' | 'diets'>): string {
  const parts = [
    sortAllergens(row.allergens).map(allergenLabel).join(', '),
    row.diets.map(dietLabel).join(', '),
  ].filter((p) => p !== '');
  return parts.length > 0 ? parts.join(' · ') : 'No allergies or diets ticked';
}
