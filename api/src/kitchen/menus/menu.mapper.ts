import type { Menu } from '@nappe/shared';
import { toPhotoResponse, type PhotoResponse } from '../../files/stored-photo.js';
import { menuFromRows } from '../catalogue/catalogue-rows.js';
import type { MenuDessertEntity } from '../entities/menu-dessert.entity.js';
import type { MenuEntity } from '../entities/menu.entity.js';

/**
 * A menu as the chef and staff see it (active or not): the domain shape (editable and sendable
 * back without `id`, `photos`, `referenceNames`, `createdAt`, `updatedAt`), its desserts' names
 * and its photos' URLs.
 */
export type MenuResponse = Menu & {
  photos: PhotoResponse[];
  referenceNames: Record<string, string>;
  createdAt: string;
  updatedAt: string;
};

export function toMenuResponse(
  row: MenuEntity,
  desserts: readonly MenuDessertEntity[],
  names: ReadonlyMap<string, string>,
): MenuResponse {
  const menu = menuFromRows(row, desserts);
  const referenceNames: Record<string, string> = {};
  for (const id of menu.dessertIds) referenceNames[id] = names.get(id) ?? id;
  return {
    ...menu,
    photos: row.photos.map(toPhotoResponse),
    referenceNames,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}
