import { orderReasonSchema, type OrderDetail, type OrderReasonRequest } from '@nappe/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { orderKeys } from './order-keys';

/** Cancels the booking (`POST /api/orders/:id/cancel`); the refund follows the policy. */
export function cancelOrder(orderId: string, body: OrderReasonRequest): Promise<OrderDetail> {
  return api.post<OrderDetail>(
    `/orders/${encodeURIComponent(orderId)}/cancel`,
    orderReasonSchema.parse(body),
  );
}

export function useCancelOrder(orderId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: OrderReasonRequest) => cancelOrder(orderId, body),
    onSuccess: (order) => {
      queryClient.setQueryData(orderKeys.detail(orderId), order);
      return queryClient.invalidateQueries({ queryKey: orderKeys.lists() });
    },
  });
}
