import type { OrderDetail } from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { orderKeys } from './order-keys';

/** One of the client's events, with its guests, ledger and timeline (`GET /api/orders/:id`). */
export const getOrder = (id: string): Promise<OrderDetail> =>
  api.get<OrderDetail>(`/orders/${encodeURIComponent(id)}`);

export const orderQueryOptions = (id: string) =>
  queryOptions({ queryKey: orderKeys.detail(id), queryFn: () => getOrder(id), staleTime: 15_000 });

export const useOrder = (id: string) => useQuery(orderQueryOptions(id));
