import type { OrderFilters } from '../lib/order-filters';

/** Query keys of the Orders and Calendar screens; never write these arrays inline. */
export const orderKeys = {
  all: ['orders'] as const,
  lists: () => [...orderKeys.all, 'list'] as const,
  list: (filters: OrderFilters) => [...orderKeys.lists(), filters] as const,
  /** Every order whose event falls between two dates (the Calendar's month grid). */
  range: (from: string, to: string) => [...orderKeys.lists(), 'range', from, to] as const,
  details: () => [...orderKeys.all, 'detail'] as const,
  detail: (id: string) => [...orderKeys.details(), id] as const,
  allergySummary: (id: string) => [...orderKeys.detail(id), 'allergy-notes'] as const,
  accessLog: (id: string) => [...orderKeys.detail(id), 'access-log'] as const,
  cancellationPreview: (id: string) => [...orderKeys.detail(id), 'cancellation-preview'] as const,
  /** The studio's calendar settings (capacity, closed days), as the Calendar reads them. */
  calendarSettings: () => [...orderKeys.all, 'calendar-settings'] as const,
};
