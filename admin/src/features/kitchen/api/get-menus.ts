import { queryOptions, useQuery } from '@tanstack/react-query';
import { fetchAllPages } from './fetch-all-pages';
import { kitchenKeys } from './kitchen-keys';
import type { MenuResponse } from './types';

/** `GET /api/menus/admin` (chef and staff: inactive menus too), every page: the whole list, by name. */
export const getMenus = (signal?: AbortSignal) =>
  fetchAllPages<MenuResponse>('/menus/admin', signal);

export const menusQueryOptions = () =>
  queryOptions({
    queryKey: kitchenKeys.menus.list(),
    queryFn: ({ signal }) => getMenus(signal),
  });

export const useMenus = () => useQuery(menusQueryOptions());
