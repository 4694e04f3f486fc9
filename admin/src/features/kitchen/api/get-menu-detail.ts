import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { kitchenKeys } from './kitchen-keys';
import type { MenuResponse } from './types';

/** `GET /api/menus/admin/:id` (the kitchen view; `/api/menus/:id` is the public card). */
export const getMenu = (id: string, signal?: AbortSignal) =>
  api.get<MenuResponse>(`/menus/admin/${encodeURIComponent(id)}`, { signal });

export const menuQueryOptions = (id: string) =>
  queryOptions({
    queryKey: kitchenKeys.menus.detail(id),
    queryFn: ({ signal }) => getMenu(id, signal),
  });

export const useMenu = (id: string) => useQuery(menuQueryOptions(id));
