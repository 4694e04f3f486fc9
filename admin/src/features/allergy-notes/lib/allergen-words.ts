import {
  DIET_LABELS,
  GUEST_ALLERGENS,
  foodRule,
  guestAllergenLabel,
  type AllergenicFood,
  type ComponentHit,
  type Diet,
  type GuestAdvisory,
  type GuestAllergen,
  type GuestConflict,
} from '@nappe/shared';
import type { GuestNote, GuestPlateNote } from '../api/types';

/** "Tree nuts", "Cereals containing gluten"; an unknown code is shown as it came. */
export function allergenLabel(code: string): string {
  return (GUEST_ALLERGENS as readonly string[]).includes(code)
    ? guestAllergenLabel(code as GuestAllergen)
    : code.replace(/_/g, ' ');
}

export function dietLabel(code: string): string {
  return (DIET_LABELS as Record<string, string>)[code] ?? code.replace(/_/g, ' ');
}

export function foodLabel(food: string): string {
  try {
    return foodRule(food as AllergenicFood).label;
  } catch {
    return food.replace(/_/g, ' ');
  }
}

/** Why a component breaks a diet, in a few words. */
const DIET_REASONS: Record<Diet, string> = {
  vegetarian: 'not vegetarian',
  vegan: 'not vegan',
  no_gelatin: 'contains gelatin',
  no_alcohol: 'contains alcohol',
  no_pork: 'contains pork, or gelatin of unknown origin',
  no_beef: 'contains beef, or gelatin of unknown origin',
};

/** "Tree nuts (almonds)"; "Almonds" alone when the allergen is the food itself. */
export function allergenWithFoods(allergen: string, foods: readonly string[]): string {
  const label = allergenLabel(allergen);
  const names = [...new Set(foods)].map(foodLabel);
  if (names.length === 0) return label;
  if (names.length === 1 && label.toLowerCase() === names[0]!.toLowerCase()) return label;
  return `${label} (${names.join(', ')})`;
}

/** One ingredient line inside a component: "Almond flour, blanched", or "… in Sablé dough". */
export function carrierText(line: ComponentHit['lines'][number]): string {
  const inside = line.path.slice(1);
  return inside.length > 0
    ? `${line.ingredientName} (in ${inside.join(' › ')})`
    : line.ingredientName;
}

function lowerFirst(text: string): string {
  return text.charAt(0).toLowerCase() + text.slice(1);
}

/** One line per component that carries a conflict: what, and the ingredients that bring it. */
export interface ConflictRow {
  key: string;
  kind: 'allergen' | 'diet';
  /** The component (recipe) on the plate: "Brown-butter almond crumble". */
  component: string;
  componentId: string;
  /** "contains tree nuts (almonds)", "not vegetarian", "contains alcohol". */
  what: string;
  carriers: string[];
}

export function conflictRows(conflicts: readonly GuestConflict[]): ConflictRow[] {
  return conflicts.flatMap((conflict, i) =>
    conflict.components.map((component) => {
      const carriers = component.lines.map(carrierText);
      const what =
        conflict.kind === 'allergen'
          ? `contains ${lowerFirst(
              allergenWithFoods(
                conflict.allergen,
                component.lines.flatMap((l) => l.foods),
              ),
            )}`
          : (DIET_REASONS[conflict.diet] ?? `does not fit: ${dietLabel(conflict.diet)}`);
      return {
        key: `${i}-${component.recipeId}`,
        kind: conflict.kind,
        component: component.recipeName,
        componentId: component.recipeId,
        what,
        carriers,
      };
    }),
  );
}

/** Advisories kept apart from conflicts: what to say to the guest or check with them. */
export interface AdvisoryRow {
  key: string;
  kind: GuestAdvisory['kind'];
  /** "May contain hazelnuts (cross-contact)". */
  title: string;
  components: Array<{ name: string; carriers: string[] }>;
  /** The API's full sentence (citations, what to ask). */
  detail: string;
}

export function advisoryRows(advisories: readonly GuestAdvisory[]): AdvisoryRow[] {
  return advisories.map((a, i) => {
    const foods = [...new Set(a.foods)].map(foodLabel).join(', ');
    const title =
      a.kind === 'may_contain'
        ? `${allergenLabel(a.allergen)}: may contain ${foods} (cross-contact)`
        : a.kind === 'exempt_derivative'
          ? `${allergenLabel(a.allergen)}: made from ${foods}, exempt from declaration`
          : `${allergenLabel(a.allergen)}: related spice (${foods})`;
    return {
      key: `${a.kind}-${a.allergen}-${i}`,
      kind: a.kind,
      title,
      components: a.components.map((c) => ({
        name: c.recipeName,
        carriers: c.lines.map(carrierText),
      })),
      detail: a.message,
    };
  });
}

/** Where a guest's plate of one dessert stands. */
export type PlateState =
  | 'clear' // nothing conflicts on the standard plate
  | 'conflict' // conflicts, nothing recorded
  | 'resolved' // conflicts, and the changed plate is clear
  | 'still_conflicts'; // the changed plate (or a note alone) still conflicts

export function plateState(plate: GuestPlateNote): PlateState {
  if (plate.clear) return 'clear';
  if (!plate.substitution) return 'conflict';
  return plate.resolved ? 'resolved' : 'still_conflicts';
}

/** The conflicts of the plate the guest will actually get. */
export function finalConflicts(plate: GuestPlateNote): GuestConflict[] {
  return (plate.afterSubstitution ?? plate).conflicts;
}

export function hasRequirement(guest: GuestNote): boolean {
  return guest.allergens.length > 0 || guest.diets.length > 0 || !!guest.notes?.trim();
}

/** Plates that still conflict, counted from the guests (kept current after a save). */
export function unresolvedPlates(guests: readonly GuestNote[]): number {
  return guests.reduce((n, g) => n + g.plates.filter((p) => !p.resolved).length, 0);
}
