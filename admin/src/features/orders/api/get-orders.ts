import type { OrderSummary, Page } from '@nappe/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { apiQueryFor, ORDERS_PAGE_SIZE, type OrderFilters } from '../lib/order-filters';
import { orderKeys } from './order-keys';

/** `GET /api/orders?page&pageSize&status&from&to&q` (chef and staff: every order, newest first). */
export const getOrders = (filters: OrderFilters, signal?: AbortSignal) =>
  api.get<Page<OrderSummary>>(`/orders?${apiQueryFor(filters, ORDERS_PAGE_SIZE)}`, { signal });

export const ordersQueryOptions = (filters: OrderFilters) =>
  queryOptions({
    queryKey: orderKeys.list(filters),
    queryFn: ({ signal }) => getOrders(filters, signal),
    // Keep the current page on screen while the next page or filter loads.
    placeholderData: keepPreviousData,
  });

export const useOrders = (filters: OrderFilters, enabled = true) =>
  useQuery({ ...ordersQueryOptions(filters), enabled });
