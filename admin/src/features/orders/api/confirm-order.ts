import type { OrderDetail } from '@nappe/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { afterOrderChange } from './invalidate-orders';

/**
 * `POST /api/orders/:id/confirm` (chef): requested → confirmed. The server refuses (409) while
 * guest plates still conflict or the lead time is too short, unless `overrideReason` says why
 * the chef confirms anyway (api/src/allergy-notes/allergy-notes.dto.ts `confirmBodySchema`).
 */
export interface ConfirmOrderInput {
  id: string;
  reason?: string;
  overrideReason?: string;
}

export const confirmOrder = ({ id, reason, overrideReason }: ConfirmOrderInput) =>
  api.post<OrderDetail>(`/orders/${encodeURIComponent(id)}/confirm`, {
    ...(reason ? { reason } : {}),
    ...(overrideReason ? { overrideReason } : {}),
  });

export function useConfirmOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: confirmOrder,
    onSuccess: (order) => afterOrderChange(queryClient, order),
  });
}
