import type { OrderDetail } from '@nappe/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { afterOrderChange } from './invalidate-orders';

/** `POST /api/orders/:id/complete` (chef): confirmed → completed ("Served"). */
export const completeOrder = ({ id, reason }: { id: string; reason?: string }) =>
  api.post<OrderDetail>(`/orders/${encodeURIComponent(id)}/complete`, reason ? { reason } : {});

export function useCompleteOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: completeOrder,
    onSuccess: (order) => afterOrderChange(queryClient, order),
  });
}
