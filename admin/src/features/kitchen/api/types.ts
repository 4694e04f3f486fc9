import type { Dessert, Ingredient, Menu, MenuCost, Recipe, ScaleResult } from '@nappe/shared';

/**
 * The kitchen API's answers, as its mappers shape them (api/src/kitchen/<f>/<f>.mapper.ts):
 * the domain shape from `@nappe/shared`, plus what the server owns.
 */

export interface PhotoResponse {
  id: string;
  url: string;
  thumbnailUrl: string;
  width: number;
  height: number;
}

interface Stamped {
  createdAt: string;
  updatedAt: string;
}

/** Staff see `packPriceMinor: null`: costs are the chef's business. */
export type IngredientResponse = Omit<Ingredient, 'purchase'> &
  Stamped & {
    purchase: Omit<Ingredient['purchase'], 'packPriceMinor'> & { packPriceMinor: number | null };
  };

export type RecipeResponse = Recipe &
  Stamped & {
    /** Name of every ingredient and sub-recipe its lines use, by id. */
    referenceNames: Record<string, string>;
    suggestedCautions: { steps: Array<string | null>; storage: string | null };
  };

export type DessertResponse = Omit<Dessert, 'photos'> &
  Stamped & { photos: PhotoResponse[]; referenceNames: Record<string, string> };

export type MenuResponse = Menu &
  Stamped & { photos: PhotoResponse[]; referenceNames: Record<string, string> };

/** Create (POST) and replace (PUT) take the same body, without the server's fields. */
export type IngredientBody = Omit<Ingredient, 'id'>;
export type RecipeBody = Omit<Recipe, 'id'>;
export type DessertBody = Omit<Dessert, 'id' | 'photos'>;
export type MenuBody = Omit<Menu, 'id'>;

export type ScaleBasis =
  | { mode: 'grams'; grams: number }
  | {
      mode: 'plates';
      plates: number;
      dessertId: string;
      dessertName: string;
      gramsPerPlate: number;
    };

export type ScaledRecipeView = ScaleResult & {
  recipeId: string;
  name: string;
  basis: ScaleBasis;
  grams: number;
};

export type MenuCosting = MenuCost & {
  suggestion: { targetPercent: number; stepMinor: number; pricePerGuestMinor: number } | null;
};

/** Ingredients, recipes and desserts together, as the editors compute with them. */
export interface KitchenCatalogueData {
  currency: string;
  ingredients: IngredientResponse[];
  recipes: RecipeResponse[];
  desserts: DessertResponse[];
}
