import { OrderStatus } from '@nappe/shared';
import { describe, expect, it } from 'vitest';
import {
  apiQueryFor,
  dateRangeProblem,
  filtersFromSearch,
  NO_FILTERS,
  searchFromFilters,
} from './order-filters';

describe('order filters in the address bar', () => {
  it('round-trips every filter, and leaves the default view with an empty address', () => {
    const filters = {
      status: OrderStatus.Confirmed,
      from: '2026-03-01',
      to: '2026-03-31',
      q: 'marchetti',
      page: 3,
    };
    const search = searchFromFilters(filters);
    expect(search.toString()).toBe(
      'status=confirmed&from=2026-03-01&to=2026-03-31&q=marchetti&page=3',
    );
    expect(filtersFromSearch(search)).toEqual(filters);
    expect(searchFromFilters(NO_FILTERS).toString()).toBe('');
  });

  it('drops what the API would refuse: unknown status, impossible dates, page 0, long searches', () => {
    const f = filtersFromSearch(
      new URLSearchParams({
        status: 'paid',
        from: '2026-02-30',
        to: 'soon',
        page: '0',
        q: 'x'.repeat(150),
      }),
    );
    expect(f).toEqual({ ...NO_FILTERS, q: 'x'.repeat(100) });
  });

  it('asks the API for one page of the filtered list', () => {
    expect(
      apiQueryFor({ ...NO_FILTERS, status: OrderStatus.Requested, q: ' ab ' }).toString(),
    ).toBe('page=1&pageSize=20&status=requested&q=ab');
  });

  it('says in words when the range is back to front', () => {
    expect(dateRangeProblem({ from: '2026-04-01', to: '2026-03-01' })).toMatch(
      /after the “to” date/,
    );
    expect(dateRangeProblem({ from: '2026-03-01', to: '2026-03-01' })).toBeNull();
    expect(dateRangeProblem({ from: null, to: '2026-03-01' })).toBeNull();
  });
});
