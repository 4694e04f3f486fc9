import type { CancellationPreview } from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { orderKeys } from './order-keys';

/** What cancelling today would refund, by the order's policy (`POST …/cancellation-preview`). */
export const getCancellationPreview = (orderId: string): Promise<CancellationPreview> =>
  api.post<CancellationPreview>(`/orders/${encodeURIComponent(orderId)}/cancellation-preview`);

export const cancellationPreviewQueryOptions = (orderId: string) =>
  queryOptions({
    queryKey: orderKeys.cancellationPreview(orderId),
    queryFn: () => getCancellationPreview(orderId),
    // Always ask afresh when the dialog opens: the tier depends on today's date.
    staleTime: 0,
    gcTime: 0,
  });

export const useCancellationPreview = (orderId: string, enabled: boolean) =>
  useQuery({ ...cancellationPreviewQueryOptions(orderId), enabled });
