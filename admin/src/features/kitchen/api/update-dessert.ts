import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invalidateKitchen } from './invalidate-kitchen';
import { kitchenKeys } from './kitchen-keys';
import type { DessertBody, DessertResponse } from './types';

/** `PUT /api/desserts/:id` (chef): replaces the whole dessert. */
export const updateDessert = ({ id, body }: { id: string; body: DessertBody }) =>
  api.put<DessertResponse>(`/desserts/${encodeURIComponent(id)}`, body);

export function useUpdateDessert() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateDessert,
    onSuccess: (saved) => {
      queryClient.setQueryData(kitchenKeys.desserts.detail(saved.id), saved);
      return invalidateKitchen(queryClient);
    },
  });
}
