import type { Page } from '@nappe/shared';
import { api } from '../../../lib/api-client';

/** The API caps a page at 100 items. */
export const KITCHEN_PAGE_SIZE = 100;

/**
 * Every item of a kitchen list, page by page. The catalogue is small (tens to a few hundred
 * items) and the editors compute with all of it in the browser, so lists are loaded whole and
 * searched, sorted and paged on the client.
 */
export async function fetchAllPages<T>(path: string, signal?: AbortSignal): Promise<T[]> {
  const items: T[] = [];
  for (let page = 1; ; page += 1) {
    const query = new URLSearchParams({ page: String(page), pageSize: String(KITCHEN_PAGE_SIZE) });
    const answer = await api.get<Page<T>>(`${path}?${query}`, { signal });
    items.push(...answer.items);
    if (answer.items.length === 0 || items.length >= answer.total) return items;
  }
}
