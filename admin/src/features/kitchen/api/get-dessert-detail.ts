import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { kitchenKeys } from './kitchen-keys';
import type { DessertResponse } from './types';

/** `GET /api/desserts/:id`. */
export const getDessert = (id: string, signal?: AbortSignal) =>
  api.get<DessertResponse>(`/desserts/${encodeURIComponent(id)}`, { signal });

export const dessertQueryOptions = (id: string) =>
  queryOptions({
    queryKey: kitchenKeys.desserts.detail(id),
    queryFn: ({ signal }) => getDessert(id, signal),
  });

export const useDessert = (id: string) => useQuery(dessertQueryOptions(id));
