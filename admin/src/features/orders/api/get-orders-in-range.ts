import type { OrderSummary, Page } from '@nappe/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { orderKeys } from './order-keys';

/** The API's largest page (ORDERS_MAX_PAGE_SIZE in api/src/orders/dto/order-queries.ts). */
const PAGE_SIZE = 100;
/** 50 pages of 100: far beyond a month of one kitchen; a guard against a runaway loop. */
const MAX_PAGES = 50;

/** Every order with an event from `from` to `to` (both included), all pages. */
export async function getOrdersInRange(
  from: string,
  to: string,
  signal?: AbortSignal,
): Promise<OrderSummary[]> {
  const items: OrderSummary[] = [];
  for (let page = 1; page <= MAX_PAGES; page += 1) {
    const query = new URLSearchParams({
      page: String(page),
      pageSize: String(PAGE_SIZE),
      from,
      to,
    });
    const answer = await api.get<Page<OrderSummary>>(`/orders?${query}`, { signal });
    items.push(...answer.items);
    if (answer.items.length < PAGE_SIZE || items.length >= answer.total) break;
  }
  return items;
}

export const ordersInRangeQueryOptions = (from: string, to: string) =>
  queryOptions({
    queryKey: orderKeys.range(from, to),
    queryFn: ({ signal }) => getOrdersInRange(from, to, signal),
    placeholderData: keepPreviousData,
  });

export const useOrdersInRange = (from: string, to: string) =>
  useQuery(ordersInRangeQueryOptions(from, to));
