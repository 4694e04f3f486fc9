import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { allergyNotesKeys } from './allergy-notes-keys';
import type { AllergyCounts } from './types';

/**
 * `GET /api/allergy-notes/counts?orderIds=…` (at most 100): per event, how many guests have
 * requirements and how many plates still conflict. Numbers only, so the list does not fetch
 * (nor log an opening of) every event's guest data.
 */
export const getAllergyCounts = (orderIds: readonly string[], signal?: AbortSignal) =>
  api.get<AllergyCounts[]>(
    `/allergy-notes/counts?${new URLSearchParams({ orderIds: orderIds.join(',') })}`,
    { signal },
  );

export const allergyCountsQueryOptions = (orderIds: readonly string[]) =>
  queryOptions({
    queryKey: allergyNotesKeys.countsOf(orderIds),
    queryFn: ({ signal }) => getAllergyCounts(orderIds, signal),
    enabled: orderIds.length > 0,
    placeholderData: keepPreviousData,
  });

export const useAllergyCounts = (orderIds: readonly string[]) =>
  useQuery(allergyCountsQueryOptions(orderIds));
