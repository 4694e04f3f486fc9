import type { CancellationPreview } from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { orderKeys } from './order-keys';

/**
 * `POST /api/orders/:id/cancellation-preview`: the refund the policy gives if cancelled today.
 * A POST that changes nothing, so it is read like a query while the dialog is open.
 */
export const getCancellationPreview = (id: string, signal?: AbortSignal) =>
  api.post<CancellationPreview>(
    `/orders/${encodeURIComponent(id)}/cancellation-preview`,
    undefined,
    { signal },
  );

export const cancellationPreviewQueryOptions = (id: string) =>
  queryOptions({
    queryKey: orderKeys.cancellationPreview(id),
    queryFn: ({ signal }) => getCancellationPreview(id, signal),
    // "Today" decides the tier: ask again each time the dialog opens.
    staleTime: 0,
    gcTime: 0,
  });

export const useCancellationPreview = (id: string, enabled: boolean) =>
  useQuery({ ...cancellationPreviewQueryOptions(id), enabled });
