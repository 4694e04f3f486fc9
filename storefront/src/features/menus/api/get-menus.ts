import type { Page } from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { menuKeys } from './menu-keys';
import type { PublicMenu } from './types';

export const MENUS_PAGE_SIZE = 12;

/** The address of a page of active menus, under the API's base path. */
export function menusPath(page: number, pageSize = MENUS_PAGE_SIZE): string {
  const query = new URLSearchParams({ page: String(page), pageSize: String(pageSize) });
  return `/menus?${query.toString()}`;
}

/** The active menus, a page at a time (`GET /api/menus`, public). */
export function getMenus(page: number, pageSize = MENUS_PAGE_SIZE): Promise<Page<PublicMenu>> {
  return api.get<Page<PublicMenu>>(menusPath(page, pageSize), { auth: false });
}

export const menusQueryOptions = (page = 1, pageSize = MENUS_PAGE_SIZE) =>
  queryOptions({
    queryKey: menuKeys.list({ page, pageSize }),
    queryFn: () => getMenus(page, pageSize),
    staleTime: 5 * 60_000,
  });

export const useMenus = (page = 1, pageSize = MENUS_PAGE_SIZE) =>
  useQuery(menusQueryOptions(page, pageSize));
