/** One page of a list. Every list endpoint is paginated and capped. */
export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}
