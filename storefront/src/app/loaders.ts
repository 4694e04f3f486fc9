import type { QueryClient, FetchQueryOptions, QueryKey } from '@tanstack/react-query';
import { data } from 'react-router';
import { paths } from '../config/paths';
import { ApiError } from '../lib/api-client';

/** What the error page shows for a thing that does not exist (an unknown menu or event). */
export interface NotFoundData {
  title: string;
  message: string;
  back: { href: string; label: string };
}

/**
 * Warms the cache for a screen. A 404 becomes the route's "not found" page; any other failure
 * is left to the screen, which shows it with a "Try again" button instead of a dead end.
 */
export async function warm<T, K extends QueryKey>(
  queryClient: QueryClient,
  options: FetchQueryOptions<T, Error, T, K>,
  notFound?: NotFoundData,
): Promise<void> {
  try {
    await queryClient.ensureQueryData(options);
  } catch (error) {
    if (notFound && error instanceof ApiError && error.status === 404) {
      throw data(notFound, { status: 404 });
    }
  }
}

export const MENU_NOT_FOUND: NotFoundData = {
  title: 'This menu is not on offer',
  message: 'It may have been withdrawn for the season, or the address may be mistyped.',
  back: { href: paths.menus.getHref(), label: 'See the menus' },
};
