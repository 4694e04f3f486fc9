import type { OrderDetail } from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { orderKeys } from './order-keys';

/** `GET /api/orders/:id`: the whole order, its guests, ledger and audit trail. */
export const getOrder = (id: string, signal?: AbortSignal) =>
  api.get<OrderDetail>(`/orders/${encodeURIComponent(id)}`, { signal });

export const orderQueryOptions = (id: string) =>
  queryOptions({
    queryKey: orderKeys.detail(id),
    queryFn: ({ signal }) => getOrder(id, signal),
  });

export const useOrder = (id: string) => useQuery(orderQueryOptions(id));
