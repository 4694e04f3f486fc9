import {
  ALLERGENIC_FOODS,
  ANIMAL_ORIGINS,
  componentGramsPerPlate,
  EU_ALLERGEN_GROUPS,
  EU_GROUP_LABELS,
  foodRule,
  GELATIN_ORIGINS,
  rollUpDessert,
  tidy,
  US_ALLERGEN_LABELS,
  US_MAJOR_ALLERGENS,
  type AllergenDeclaration,
  type AllergenicFood,
  type AllergenReport,
  type AnimalOrigin,
  type GelatinOrigin,
  type KitchenIndex,
  type Menu,
} from '@nappe/shared';
import type { PhotoResponse, StoredPhoto } from '../../files/stored-photo.js';
import { toPhotoResponse } from '../../files/stored-photo.js';

/**
 * What anyone may see of an active menu: its desserts and their components (names and portions),
 * allergens (contains kept apart from may contain, EU 14 groups and US 9), dietary flags, price
 * per guest, guest limits, lead days and photos. Never costs, ingredient prices, recipes,
 * quantities of ingredients, plating or internal notes. Every field is listed here by name, so
 * nothing reaches the public by being added to a domain type.
 */

export type PublicPhoto = Omit<PhotoResponse, 'id'>;

export interface PublicAllergen {
  group: string;
  label: string;
  /** The foods, by their label words ("almonds", "hazelnuts"). */
  foods: string[];
}

export interface PublicDeclaration {
  contains: PublicAllergen[];
  mayContain: PublicAllergen[];
}

export interface PublicAllergens {
  eu: PublicDeclaration;
  us: PublicDeclaration;
  /** Advice that is not a declaration (e.g. celery-family spices). */
  advisories: string[];
}

export interface PublicDietary {
  vegetarian: boolean;
  vegan: boolean;
  alcohol: boolean;
  gelatin: GelatinOrigin[];
  animalOrigins: AnimalOrigin[];
}

export interface PublicComponent {
  name: string;
  quantity: number;
  unit: 'g' | 'piece';
  /** Grams on the plate. */
  grams: number;
}

export interface PublicDessert {
  id: string;
  name: string;
  description: string | null;
  photos: PublicPhoto[];
  allergens: PublicAllergens;
  dietary: PublicDietary;
  components: PublicComponent[];
}

export interface PublicMenu {
  id: string;
  name: string;
  description: string | null;
  pricePerGuestMinor: number;
  currency: string;
  minGuests: number;
  maxGuests: number;
  leadDays: number;
  photos: PublicPhoto[];
  /** Everything any of its desserts contains or may contain. */
  allergens: PublicAllergens;
  /** True only when every dessert is (vegetarian, vegan); any alcohol or gelatin is shown. */
  dietary: PublicDietary;
  desserts: PublicDessert[];
}

function publicPhoto(photo: StoredPhoto): PublicPhoto {
  const { url, thumbnailUrl, width, height } = toPhotoResponse(photo);
  return { url, thumbnailUrl, width, height };
}

const foodOrder = (a: AllergenicFood, b: AllergenicFood) =>
  ALLERGENIC_FOODS.indexOf(a) - ALLERGENIC_FOODS.indexOf(b);

/**
 * The declarations of several roll-ups (the desserts of a menu, or one dessert) as one: a food any
 * of them contains is "contains"; a trace is "may contain" unless some dessert contains that food.
 * The same rule the shared roll-up applies within one dessert.
 */
function mergeDeclarations<G extends string>(
  declarations: ReadonlyArray<AllergenDeclaration<G>>,
  order: readonly G[],
  labels: Record<G, string>,
): PublicDeclaration {
  const contains = new Map<G, Set<AllergenicFood>>();
  const traces = new Map<G, Set<AllergenicFood>>();
  const add = (map: Map<G, Set<AllergenicFood>>, group: G, foods: readonly AllergenicFood[]) => {
    const set = map.get(group) ?? new Set<AllergenicFood>();
    for (const f of foods) set.add(f);
    map.set(group, set);
  };
  for (const d of declarations) for (const e of d.contains) add(contains, e.group, e.foods);
  const contained = new Set([...contains.values()].flatMap((s) => [...s]));
  for (const d of declarations) {
    for (const e of d.mayContain) {
      const foods = e.foods.filter((f) => !contained.has(f));
      if (foods.length > 0) add(traces, e.group, foods);
    }
  }
  const list = (map: Map<G, Set<AllergenicFood>>): PublicAllergen[] =>
    order
      .filter((g) => map.has(g))
      .map((g) => ({
        group: g,
        label: labels[g],
        foods: [...map.get(g)!].sort(foodOrder).map((f) => foodRule(f).label),
      }));
  return { contains: list(contains), mayContain: list(traces) };
}

function publicAllergens(reports: readonly AllergenReport[]): PublicAllergens {
  return {
    eu: mergeDeclarations(
      reports.map((r) => r.eu),
      EU_ALLERGEN_GROUPS,
      EU_GROUP_LABELS,
    ),
    us: mergeDeclarations(
      reports.map((r) => r.us),
      US_MAJOR_ALLERGENS,
      US_ALLERGEN_LABELS,
    ),
    advisories: [...new Set(reports.flatMap((r) => r.advisories.map((a) => a.text)))],
  };
}

function publicDietary(reports: readonly AllergenReport[]): PublicDietary {
  const gelatin = new Set(reports.flatMap((r) => r.dietary.gelatin));
  const origins = new Set(reports.flatMap((r) => r.dietary.animalOrigins));
  return {
    vegetarian: reports.every((r) => r.dietary.vegetarian),
    vegan: reports.every((r) => r.dietary.vegan),
    alcohol: reports.some((r) => r.dietary.alcohol),
    gelatin: GELATIN_ORIGINS.filter((g) => gelatin.has(g)),
    animalOrigins: ANIMAL_ORIGINS.filter((o) => origins.has(o)),
  };
}

/**
 * The public card of a menu, computed by the shared roll-up. Throws a KitchenError when the
 * catalogue cannot work out its allergens: such a menu must not be shown.
 */
export function toPublicMenu(
  index: KitchenIndex,
  menu: Menu,
  photos: { menu: readonly StoredPhoto[]; desserts: ReadonlyMap<string, readonly StoredPhoto[]> },
  currency: string,
): PublicMenu {
  const desserts = menu.dessertIds.map((id) => index.dessert(id, menu.name));
  const reports = desserts.map((d) => rollUpDessert(index, d));
  return {
    id: menu.id,
    name: menu.name,
    description: menu.description ?? null,
    pricePerGuestMinor: menu.pricePerGuestMinor,
    currency,
    minGuests: menu.minGuests,
    maxGuests: menu.maxGuests,
    leadDays: menu.leadDays,
    photos: photos.menu.map(publicPhoto),
    allergens: publicAllergens(reports),
    dietary: publicDietary(reports),
    desserts: desserts.map((dessert, i) => ({
      id: dessert.id,
      name: dessert.name,
      description: dessert.description ?? null,
      photos: (photos.desserts.get(dessert.id) ?? []).map(publicPhoto),
      allergens: publicAllergens([reports[i]!]),
      dietary: publicDietary([reports[i]!]),
      components: dessert.components.map((c) => ({
        name: index.recipe(c.recipeId, dessert.name).name,
        quantity: c.quantity,
        unit: c.unit,
        grams: tidy(componentGramsPerPlate(index, dessert, c), 1),
      })),
    })),
  };
}
