import type { OrderDetail } from '@nappe/shared';
import { queryOptions, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { orderKeys } from './order-keys';

/**
 * Tells the server the client is back from the payment page (`POST /api/orders/:id/checkout/
 * return`), so it can record the payment even before the payment service's webhook arrives.
 * Safe to repeat: the server applies a payment once however often it hears of it.
 */
export function returnFromCheckout(orderId: string, sessionId: string): Promise<OrderDetail> {
  return api.post<OrderDetail>(`/orders/${encodeURIComponent(orderId)}/checkout/return`, {
    sessionId,
  });
}

export const checkoutReturnQueryOptions = (orderId: string, sessionId: string) =>
  queryOptions({
    queryKey: orderKeys.checkoutReturn(orderId, sessionId),
    queryFn: () => returnFromCheckout(orderId, sessionId),
    staleTime: Infinity,
    retry: 2,
  });

/** Runs once per payment session; its answer also refreshes the order. */
export function useCheckoutReturn(orderId: string, sessionId: string | null) {
  const queryClient = useQueryClient();
  return useQuery({
    ...checkoutReturnQueryOptions(orderId, sessionId ?? ''),
    queryFn: async () => {
      const order = await returnFromCheckout(orderId, sessionId ?? '');
      queryClient.setQueryData(orderKeys.detail(orderId), order);
      return order;
    },
    enabled: sessionId !== null && sessionId !== '',
  });
}
