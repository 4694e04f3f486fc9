import type { CheckoutResponse } from '@nappe/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export type CheckoutPlan = 'deposit' | 'full' | 'balance' | 'top_up';

/**
 * Opens a payment for an order (`POST /api/orders/:id/checkout`): the plan only — the server
 * works out the amount. The answer holds the payment page to send the browser to.
 */
export function startCheckout(orderId: string, plan: CheckoutPlan): Promise<CheckoutResponse> {
  return api.post<CheckoutResponse>(`/orders/${encodeURIComponent(orderId)}/checkout`, { plan });
}

export function useStartCheckout() {
  return useMutation({
    mutationFn: ({ orderId, plan }: { orderId: string; plan: CheckoutPlan }) =>
      startCheckout(orderId, plan),
  });
}
