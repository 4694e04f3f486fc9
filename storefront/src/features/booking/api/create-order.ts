import { createOrderSchema, type CreateOrderInput, type OrderDetail } from '@nappe/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { bookingKeys } from './booking-keys';

/**
 * Books (`POST /api/orders`, signed-in client). The body is checked with the shared schema first:
 * ids, the date, the venue and counts only — never a price, a total or a status. The
 * `Idempotency-Key` is the booking attempt's: a retry with the same key cannot book twice.
 */
export function createOrder(input: CreateOrderInput, idempotencyKey: string): Promise<OrderDetail> {
  return api.post<OrderDetail>('/orders', createOrderSchema.parse(input), {
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useCreateOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ input, idempotencyKey }: { input: CreateOrderInput; idempotencyKey: string }) =>
      createOrder(input, idempotencyKey),
    // The day now holds fewer plates: the calendar must ask again.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: bookingKeys.availabilities() }),
  });
}
