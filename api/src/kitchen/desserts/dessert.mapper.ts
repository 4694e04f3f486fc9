import type { Dessert } from '@nappe/shared';
import { toPhotoResponse, type PhotoResponse } from '../../files/stored-photo.js';
import { dessertFromRows } from '../catalogue/catalogue-rows.js';
import type { DessertComponentEntity } from '../entities/dessert-component.entity.js';
import type { DessertEntity } from '../entities/dessert.entity.js';

/** Photos a dessert or a menu can hold (the shared schema's limit). */
export const MAX_PHOTOS = 12;

/**
 * A plated dessert as the API shows it: the domain shape (editable and sendable back without the
 * server's fields: `id`, `photos`, `referenceNames`, `createdAt`, `updatedAt`), the names of the
 * recipes its components use, and its photos' URLs.
 */
export type DessertResponse = Omit<Dessert, 'photos'> & {
  photos: PhotoResponse[];
  referenceNames: Record<string, string>;
  createdAt: string;
  updatedAt: string;
};

export function toDessertResponse(
  row: DessertEntity,
  components: readonly DessertComponentEntity[],
  names: ReadonlyMap<string, string>,
): DessertResponse {
  const dessert = dessertFromRows(row, components);
  const referenceNames: Record<string, string> = {};
  for (const c of dessert.components)
    referenceNames[c.recipeId] = names.get(c.recipeId) ?? c.recipeId;
  return {
    ...dessert,
    photos: row.photos.map(toPhotoResponse),
    referenceNames,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}
