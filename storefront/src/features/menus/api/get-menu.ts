import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { menuKeys } from './menu-keys';
import type { PublicMenu } from './types';

/** One active menu (`GET /api/menus/:id`, public); 404 when it is unknown or withdrawn. */
export const getMenu = (id: string): Promise<PublicMenu> =>
  api.get<PublicMenu>(`/menus/${encodeURIComponent(id)}`, { auth: false });

export const menuQueryOptions = (id: string) =>
  queryOptions({
    queryKey: menuKeys.detail(id),
    queryFn: () => getMenu(id),
    staleTime: 5 * 60_000,
  });

export const useMenu = (id: string) => useQuery(menuQueryOptions(id));
