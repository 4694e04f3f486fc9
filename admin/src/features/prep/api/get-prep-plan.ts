import type { PrepPlanView } from '@nappe/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { prepKeys } from './prep-keys';
import type { DateRange } from './types';

export const planQuery = (range: DateRange) =>
  new URLSearchParams({ from: range.from, to: range.to }).toString();

/** `GET /api/prep/plan?from&to`: confirmed events with an event date in the range (chef and staff; costs for the chef only). */
export const getPrepPlan = (range: DateRange, signal?: AbortSignal) =>
  api.get<PrepPlanView>(`/prep/plan?${planQuery(range)}`, { signal });

export const prepPlanQueryOptions = (range: DateRange) =>
  queryOptions({
    queryKey: prepKeys.plan(range),
    queryFn: ({ signal }) => getPrepPlan(range, signal),
    placeholderData: keepPreviousData,
  });

/** The plan of `range`; nothing is asked while `range` is null (an invalid range in the URL). */
export const usePrepPlan = (range: DateRange | null) =>
  useQuery({
    ...prepPlanQueryOptions(range ?? { from: '', to: '' }),
    enabled: range !== null,
  });
