/**
 * One page of a list, as every list endpoint of the API answers it (each is paginated and capped):
 * orders, users, menus, recipes, desserts, ingredients.
 */
export interface Page<T> {
  items: T[];
  /** Items in the whole list, over all its pages. */
  total: number;
  /** 1-based. */
  page: number;
  pageSize: number;
}
