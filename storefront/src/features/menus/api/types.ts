import type { PhotoSource } from '../../../components/ui/photo-source';

/**
 * What `GET /api/menus` and `GET /api/menus/:id` return for an active menu (the API's public
 * menu mapper): desserts and their components, allergens with "contains" kept apart from
 * "may contain" (EU 14 groups and US 9), dietary flags, price per guest, guest limits, lead days
 * and photos (relative URLs under /api/files).
 */
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
  /** Gelatin sources: pork, beef, fish, unknown. */
  gelatin: string[];
  animalOrigins: string[];
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
  photos: PhotoSource[];
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
  photos: PhotoSource[];
  allergens: PublicAllergens;
  dietary: PublicDietary;
  desserts: PublicDessert[];
}
