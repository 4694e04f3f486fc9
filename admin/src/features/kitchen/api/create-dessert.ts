import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invalidateKitchen } from './invalidate-kitchen';
import { kitchenKeys } from './kitchen-keys';
import type { DessertBody, DessertResponse } from './types';

/** `POST /api/desserts` (chef). */
export const createDessert = (body: DessertBody) => api.post<DessertResponse>('/desserts', body);

export function useCreateDessert() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDessert,
    onSuccess: (saved) => {
      queryClient.setQueryData(kitchenKeys.desserts.detail(saved.id), saved);
      return invalidateKitchen(queryClient);
    },
  });
}
