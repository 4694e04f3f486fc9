import { Role, type Ingredient } from '@nappe/shared';
import { ingredientFromRow } from '../catalogue/catalogue-rows.js';
import type { IngredientEntity } from '../entities/ingredient.entity.js';

/**
 * An ingredient as the API shows it: the domain shape (so the admin can edit it and send it back
 * without `id`, `createdAt`, `updatedAt`), with the pack price hidden from staff (costs are the
 * chef's business).
 */
export type IngredientResponse = Omit<Ingredient, 'purchase'> & {
  purchase: Omit<Ingredient['purchase'], 'packPriceMinor'> & { packPriceMinor: number | null };
  createdAt: string;
  updatedAt: string;
};

export function toIngredientResponse(row: IngredientEntity, viewer: Role): IngredientResponse {
  const ingredient = ingredientFromRow(row);
  return {
    ...ingredient,
    purchase: {
      ...ingredient.purchase,
      packPriceMinor: viewer === Role.Chef ? ingredient.purchase.packPriceMinor : null,
    },
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}
