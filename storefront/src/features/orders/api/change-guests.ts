import {
  changeGuestCountSchema,
  type ChangeGuestCountRequest,
  type GuestChangeResult,
} from '@nappe/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { orderKeys } from './order-keys';

/**
 * Changes the guests (`PUT /api/orders/:id/guests`). More guests may need paying for: the
 * answer then carries a checkout to send the browser to; fewer guests are refunded by the policy.
 */
export function changeGuests(
  orderId: string,
  body: ChangeGuestCountRequest,
): Promise<GuestChangeResult> {
  return api.put<GuestChangeResult>(
    `/orders/${encodeURIComponent(orderId)}/guests`,
    changeGuestCountSchema.parse(body),
  );
}

export function useChangeGuests(orderId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ChangeGuestCountRequest) => changeGuests(orderId, body),
    onSuccess: (result) => {
      queryClient.setQueryData(orderKeys.detail(orderId), result.order);
      return queryClient.invalidateQueries({ queryKey: orderKeys.lists() });
    },
  });
}
