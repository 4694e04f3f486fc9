import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { orderKeys } from './order-keys';
import type { CalendarSettings } from './types';

/** `GET /api/studio/settings` (chef), of which the Calendar shows capacity and closed days. */
export const getCalendarSettings = (signal?: AbortSignal) =>
  api.get<CalendarSettings>('/studio/settings', { signal });

export const calendarSettingsQueryOptions = () =>
  queryOptions({
    queryKey: orderKeys.calendarSettings(),
    queryFn: ({ signal }) => getCalendarSettings(signal),
  });

export const useCalendarSettings = () => useQuery(calendarSettingsQueryOptions());
