import { isIsoDate, isOrderStatus, type IsoDate, type OrderStatus } from '@nappe/shared';

/** What the Orders inbox asks the API for; every field lives in the address bar. */
export interface OrderFilters {
  status: OrderStatus | null;
  /** Events on or after this date (the studio's calendar). */
  from: IsoDate | null;
  /** Events on or before this date. */
  to: IsoDate | null;
  /** Part of the reference or of the client's name. */
  q: string;
  page: number;
}

export const ORDERS_PAGE_SIZE = 20;
/** The API refuses longer searches (api/src/orders/dto/order-queries.ts). */
export const ORDER_SEARCH_MAX = 100;

export const NO_FILTERS: OrderFilters = { status: null, from: null, to: null, q: '', page: 1 };

/**
 * Reads the filters from the address bar. A value that is not one the API accepts (a status
 * that does not exist, a date that is not a real date, page "0") is dropped rather than sent,
 * so a hand-edited link still opens a working list.
 */
export function filtersFromSearch(params: URLSearchParams): OrderFilters {
  const status = params.get('status');
  const from = params.get('from');
  const to = params.get('to');
  const page = Number(params.get('page'));
  return {
    status: isOrderStatus(status) ? status : null,
    from: from !== null && isIsoDate(from) ? from : null,
    to: to !== null && isIsoDate(to) ? to : null,
    q: (params.get('q') ?? '').trim().slice(0, ORDER_SEARCH_MAX),
    page: Number.isInteger(page) && page >= 1 ? page : 1,
  };
}

/** The address bar's query for these filters: only what differs from the default view. */
export function searchFromFilters(filters: OrderFilters): URLSearchParams {
  const params = new URLSearchParams();
  if (filters.status) params.set('status', filters.status);
  if (filters.from) params.set('from', filters.from);
  if (filters.to) params.set('to', filters.to);
  if (filters.q.trim()) params.set('q', filters.q.trim());
  if (filters.page > 1) params.set('page', String(filters.page));
  return params;
}

/** The request to `GET /api/orders` (api/src/orders/dto/order-queries.ts). */
export function apiQueryFor(filters: OrderFilters, pageSize = ORDERS_PAGE_SIZE): URLSearchParams {
  const params = new URLSearchParams({ page: String(filters.page), pageSize: String(pageSize) });
  if (filters.status) params.set('status', filters.status);
  if (filters.from) params.set('from', filters.from);
  if (filters.to) params.set('to', filters.to);
  if (filters.q.trim()) params.set('q', filters.q.trim());
  return params;
}

/** A date range the API would refuse, in words; null when it is fine. */
export function dateRangeProblem(filters: Pick<OrderFilters, 'from' | 'to'>): string | null {
  if (filters.from && filters.to && filters.from > filters.to) {
    return 'The “from” date is after the “to” date. Change one of them to see orders.';
  }
  return null;
}

export function hasFilters(filters: OrderFilters): boolean {
  return filters.status !== null || filters.from !== null || filters.to !== null || !!filters.q;
}
