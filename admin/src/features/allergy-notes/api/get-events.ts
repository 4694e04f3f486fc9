import { OrderStatus, type OrderSummary, type Page } from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { allergyNotesKeys } from './allergy-notes-keys';

/** The API caps a page of orders at 100. */
const PAGE_SIZE = 100;

/**
 * Bookings whose allergy notes the kitchen works from: waiting for the chef, confirmed, and
 * (for the recent past) completed. Cancelled, declined and expired bookings have no plates.
 */
const WITH_PLATES = new Set<string>([
  OrderStatus.Requested,
  OrderStatus.Confirmed,
  OrderStatus.Completed,
]);

/** `GET /api/orders?from=…`, every page: the events on or after `from`, soonest first. */
export async function getEvents(from: string, signal?: AbortSignal): Promise<OrderSummary[]> {
  const items: OrderSummary[] = [];
  for (let page = 1; ; page += 1) {
    const query = new URLSearchParams({ from, page: String(page), pageSize: String(PAGE_SIZE) });
    const answer = await api.get<Page<OrderSummary>>(`/orders?${query}`, { signal });
    items.push(...answer.items);
    if (answer.items.length === 0 || items.length >= answer.total) break;
  }
  return items
    .filter((o) => WITH_PLATES.has(o.status))
    .sort(
      (a, b) =>
        a.eventDate.localeCompare(b.eventDate) ||
        a.serviceTime.localeCompare(b.serviceTime) ||
        a.reference.localeCompare(b.reference),
    );
}

export const eventsQueryOptions = (from: string) =>
  queryOptions({
    queryKey: allergyNotesKeys.eventList(from),
    queryFn: ({ signal }) => getEvents(from, signal),
  });

export const useEvents = (from: string) => useQuery(eventsQueryOptions(from));
