import { dessertSchema, ingredientSchema, menuSchema, recipeSchema } from '@nappe/shared';
import type { z } from 'zod';
import { requestBody } from '../../common/request-body.js';

/**
 * The request bodies of the kitchen, one per shape, each made from the domain schema in
 * `@nappe/shared` (the same schema the admin forms validate with). Create (POST) and replace
 * (PUT) take the same body. The server owns `id` (it makes UUIDs) and a dessert's `photos`
 * (set by uploads only).
 */
const PLACEHOLDER_ID = '00000000-0000-0000-0000-000000000000';

export const ingredientBody = requestBody(ingredientSchema, { id: PLACEHOLDER_ID });
export type IngredientBody = z.infer<typeof ingredientBody>;

export const recipeBody = requestBody(recipeSchema, { id: PLACEHOLDER_ID });
export type RecipeBody = z.infer<typeof recipeBody>;

export const dessertBody = requestBody(dessertSchema, { id: PLACEHOLDER_ID, photos: [] });
export type DessertBody = z.infer<typeof dessertBody>;

export const menuBody = requestBody(menuSchema, { id: PLACEHOLDER_ID });
export type MenuBody = z.infer<typeof menuBody>;
