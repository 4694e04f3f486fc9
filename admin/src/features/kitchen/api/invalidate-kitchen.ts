import type { QueryClient } from '@tanstack/react-query';
import { kitchenKeys } from './kitchen-keys';

/**
 * After any write to the catalogue. An ingredient's price moves every recipe, plate and menu
 * cost, and a recipe's lines move its allergens everywhere it is used, so every kitchen list
 * and computed view is marked stale; only what is on screen is fetched again.
 */
export function invalidateKitchen(queryClient: QueryClient): Promise<void> {
  return queryClient.invalidateQueries({ queryKey: kitchenKeys.all });
}

const startsWith = (key: readonly unknown[], prefix: readonly unknown[]) =>
  prefix.every((part, i) => key[i] === part);

/**
 * After a delete: everything else is marked stale, but not the deleted item's own queries —
 * its screen is still mounted until the app navigates away, and asking the server for it again
 * would only earn a 404. They are dropped from the cache once nothing shows them.
 */
export function forgetAndInvalidate(
  queryClient: QueryClient,
  detailKey: readonly unknown[],
): Promise<void> {
  queryClient.setQueryDefaults(detailKey, { gcTime: 0 });
  return queryClient.invalidateQueries({
    queryKey: kitchenKeys.all,
    predicate: (query) => !startsWith(query.queryKey, detailKey),
  });
}
