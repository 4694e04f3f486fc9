import type { OrderDetail } from '@nappe/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { afterOrderChange } from './invalidate-orders';

/** By the cancellation policy's tier for today, or everything paid (the chef's choice). */
export type RefundChoice = 'policy' | 'full';

/**
 * `POST /api/orders/:id/cancel` (api/src/orders/dto/order-bodies.ts `cancelOrderBody`). The
 * policy is the server's default, so `refund` is sent only when the chef refunds in full.
 */
export const cancelOrder = ({
  id,
  reason,
  refund,
}: {
  id: string;
  reason?: string;
  refund: RefundChoice;
}) =>
  api.post<OrderDetail>(`/orders/${encodeURIComponent(id)}/cancel`, {
    ...(reason ? { reason } : {}),
    ...(refund === 'full' ? { refund } : {}),
  });

export function useCancelOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: cancelOrder,
    onSuccess: (order) => afterOrderChange(queryClient, order),
  });
}
