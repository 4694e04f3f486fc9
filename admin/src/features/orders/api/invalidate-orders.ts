import type { OrderDetail } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { orderKeys } from './order-keys';

/**
 * After a change of status: the detail takes the server's answer at once, and every list, the
 * calendar and the order's access log are marked stale — only what is on screen is fetched
 * again. The allergy check is left alone: a status change does not change a plate, and each
 * reading of it is recorded as an opening of the guests' health data.
 * Returned so the mutation waits for the refresh.
 */
export function afterOrderChange(queryClient: QueryClient, order: OrderDetail): Promise<void> {
  queryClient.setQueryData(orderKeys.detail(order.id), order);
  const allergy = orderKeys.allergySummary(order.id);
  return queryClient.invalidateQueries({
    queryKey: orderKeys.all,
    predicate: (query) => !allergy.every((part, i) => query.queryKey[i] === part),
  });
}
