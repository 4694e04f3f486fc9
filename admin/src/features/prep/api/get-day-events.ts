import { OrderStatus, type OrderSummary } from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { prepKeys } from './prep-keys';
import type { DateRange } from './types';

interface OrderPage {
  items: OrderSummary[];
  total: number;
  page: number;
  pageSize: number;
}

/** At most this many events are listed for a few days; a studio serves a handful a day. */
export const EVENTS_PAGE_SIZE = 100;

/**
 * `GET /api/orders?status=confirmed&from&to`: the confirmed events the kitchen prepares for,
 * by service date and time.
 */
export async function getConfirmedEvents(range: DateRange, signal?: AbortSignal) {
  const params = new URLSearchParams({
    status: OrderStatus.Confirmed,
    from: range.from,
    to: range.to,
    pageSize: String(EVENTS_PAGE_SIZE),
  });
  const page = await api.get<OrderPage>(`/orders?${params}`, { signal });
  return [...page.items].sort(
    (a, b) =>
      a.eventDate.localeCompare(b.eventDate) ||
      a.serviceTime.localeCompare(b.serviceTime) ||
      a.reference.localeCompare(b.reference),
  );
}

export const confirmedEventsQueryOptions = (range: DateRange) =>
  queryOptions({
    queryKey: prepKeys.events(range),
    queryFn: ({ signal }) => getConfirmedEvents(range, signal),
  });

export const useConfirmedEvents = (range: DateRange) =>
  useQuery(confirmedEventsQueryOptions(range));

/** `GET /api/orders?status=requested&pageSize=1`: how many requests wait for the chef. */
export async function getWaitingRequestCount(signal?: AbortSignal): Promise<number> {
  const params = new URLSearchParams({ status: OrderStatus.Requested, pageSize: '1' });
  return (await api.get<OrderPage>(`/orders?${params}`, { signal })).total;
}

export const waitingRequestsQueryOptions = () =>
  queryOptions({
    queryKey: prepKeys.waitingRequests(),
    queryFn: ({ signal }) => getWaitingRequestCount(signal),
  });

export const useWaitingRequestCount = (enabled: boolean) =>
  useQuery({ ...waitingRequestsQueryOptions(), enabled });
