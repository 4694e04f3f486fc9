import { queryOptions, useQuery } from '@tanstack/react-query';
import { fetchAllPages } from './fetch-all-pages';
import { kitchenKeys } from './kitchen-keys';
import type { DessertResponse } from './types';

/** `GET /api/desserts`, every page: the whole list, by name. */
export const getDesserts = (signal?: AbortSignal) =>
  fetchAllPages<DessertResponse>('/desserts', signal);

export const dessertsQueryOptions = () =>
  queryOptions({
    queryKey: kitchenKeys.desserts.list(),
    queryFn: ({ signal }) => getDesserts(signal),
  });

export const useDesserts = () => useQuery(dessertsQueryOptions());
