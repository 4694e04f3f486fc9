import type { OrderSummary, Page } from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { orderKeys } from './order-keys';

export const ORDERS_PAGE_SIZE = 20;

/** The signed-in client's own events, newest first (`GET /api/orders`). */
export function getOrders(page: number, pageSize = ORDERS_PAGE_SIZE): Promise<Page<OrderSummary>> {
  const query = new URLSearchParams({ page: String(page), pageSize: String(pageSize) });
  return api.get<Page<OrderSummary>>(`/orders?${query.toString()}`);
}

export const ordersQueryOptions = (page = 1, pageSize = ORDERS_PAGE_SIZE) =>
  queryOptions({
    queryKey: orderKeys.list({ page, pageSize }),
    queryFn: () => getOrders(page, pageSize),
    staleTime: 30_000,
  });

export const useOrders = (page = 1) => useQuery(ordersQueryOptions(page));
