import type { Page } from '@nappe/shared';

/** How many pages a list has (at least one, so an empty list still has a first page). */
export function pageCount(page: Pick<Page<unknown>, 'total' | 'pageSize'>): number {
  return Math.max(1, Math.ceil(page.total / page.pageSize));
}

/** A `?page=` value read leniently: anything that is not a whole number from 1 up is page 1. */
export function pageFromSearch(value: string | null): number {
  const n = Number(value);
  return Number.isInteger(n) && n >= 1 && n <= 100_000 ? n : 1;
}
