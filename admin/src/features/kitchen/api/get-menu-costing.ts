import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { kitchenKeys } from './kitchen-keys';
import type { MenuCosting } from './types';

/**
 * `GET /api/menus/:id/costing?targetPercent=N` (chef): cost per guest of the saved menu, its
 * food-cost % and the price per guest that meets the target, rounded up to a whole cent.
 */
export const getMenuCosting = (id: string, targetPercent: number, signal?: AbortSignal) =>
  api.get<MenuCosting>(
    `/menus/${encodeURIComponent(id)}/costing?${new URLSearchParams({
      targetPercent: String(targetPercent),
    })}`,
    { signal },
  );

export const menuCostingQueryOptions = (id: string, targetPercent: number) =>
  queryOptions({
    queryKey: kitchenKeys.menus.costing(id, targetPercent),
    queryFn: ({ signal }) => getMenuCosting(id, targetPercent, signal),
    placeholderData: keepPreviousData,
  });

export const useMenuCosting = (id: string, targetPercent: number, enabled = true) =>
  useQuery({ ...menuCostingQueryOptions(id, targetPercent), enabled });
