/** Query keys of the orders feature; never write these arrays inline. */
export const orderKeys = {
  all: ['orders'] as const,
  lists: () => [...orderKeys.all, 'list'] as const,
  list: (filters: { page: number; pageSize: number }) => [...orderKeys.lists(), filters] as const,
  details: () => [...orderKeys.all, 'detail'] as const,
  detail: (id: string) => [...orderKeys.details(), id] as const,
  // Kept out of detail(id), so that refreshing an order never repeats these POSTs.
  checkoutReturn: (id: string, sessionId: string) =>
    [...orderKeys.all, 'checkout-return', id, sessionId] as const,
  cancellationPreview: (id: string) => [...orderKeys.all, 'cancellation-preview', id] as const,
};
