import type { OrderDetail } from '@nappe/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { afterOrderChange } from './invalidate-orders';

/** `POST /api/orders/:id/decline` (chef): requested → declined; the server refunds everything. */
export const declineOrder = ({ id, reason }: { id: string; reason: string }) =>
  api.post<OrderDetail>(`/orders/${encodeURIComponent(id)}/decline`, { reason });

export function useDeclineOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: declineOrder,
    onSuccess: (order) => afterOrderChange(queryClient, order),
  });
}
