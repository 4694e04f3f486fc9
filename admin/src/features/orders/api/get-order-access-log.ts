import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { orderKeys } from './order-keys';
import type { AccessLogEntry } from './types';

/** `GET /api/orders/:id/access-log` (chef): who opened the guests' details, newest first. */
export const getOrderAccessLog = (id: string, signal?: AbortSignal) =>
  api.get<AccessLogEntry[]>(`/orders/${encodeURIComponent(id)}/access-log`, { signal });

export const orderAccessLogQueryOptions = (id: string) =>
  queryOptions({
    queryKey: orderKeys.accessLog(id),
    queryFn: ({ signal }) => getOrderAccessLog(id, signal),
  });

export const useOrderAccessLog = (id: string) => useQuery(orderAccessLogQueryOptions(id));
