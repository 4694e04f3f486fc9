import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { orderKeys } from './order-keys';
import type { AllergySummary } from './types';

/**
 * `GET /api/orders/:id/allergy-notes`, read for its counts: how many guest plates still
 * conflict. The server records each reading in the order's access log, so it is read once per
 * visit (not again on focus) and asked again only when the confirmation gate objects.
 */
export const getOrderAllergySummary = (id: string, signal?: AbortSignal) =>
  api.get<AllergySummary>(`/orders/${encodeURIComponent(id)}/allergy-notes`, { signal });

export const orderAllergySummaryQueryOptions = (id: string) =>
  queryOptions({
    queryKey: orderKeys.allergySummary(id),
    queryFn: ({ signal }) => getOrderAllergySummary(id, signal),
    staleTime: 5 * 60_000,
    refetchOnWindowFocus: false,
  });

export const useOrderAllergySummary = (id: string, enabled = true) =>
  useQuery({ ...orderAllergySummaryQueryOptions(id), enabled });
