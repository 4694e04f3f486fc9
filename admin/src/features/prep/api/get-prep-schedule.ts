import type { PrepDaySchedule } from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { prepKeys } from './prep-keys';

/** `GET /api/prep/schedule?date=`: the production day's tasks in order, with ticks and conflicts. */
export const getPrepSchedule = (date: string, signal?: AbortSignal) =>
  api.get<PrepDaySchedule>(`/prep/schedule?${new URLSearchParams({ date })}`, { signal });

export const prepScheduleQueryOptions = (date: string) =>
  queryOptions({
    queryKey: prepKeys.schedule(date),
    queryFn: ({ signal }) => getPrepSchedule(date, signal),
    // Ticks come from other people on other phones: look again when the screen is revisited.
    staleTime: 15_000,
  });

export const usePrepSchedule = (date: string | null) =>
  useQuery({ ...prepScheduleQueryOptions(date ?? ''), enabled: date !== null });
