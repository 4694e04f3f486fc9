import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invalidateKitchen } from './invalidate-kitchen';
import { kitchenKeys } from './kitchen-keys';
import type { MenuBody, MenuResponse } from './types';

/** `POST /api/menus` (chef). */
export const createMenu = (body: MenuBody) => api.post<MenuResponse>('/menus', body);

export function useCreateMenu() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createMenu,
    onSuccess: (saved) => {
      queryClient.setQueryData(kitchenKeys.menus.detail(saved.id), saved);
      return invalidateKitchen(queryClient);
    },
  });
}
