import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invalidateKitchen } from './invalidate-kitchen';
import { kitchenKeys } from './kitchen-keys';
import type { MenuBody, MenuResponse } from './types';

/** `PUT /api/menus/:id` (chef): replaces the whole menu. */
export const updateMenu = ({ id, body }: { id: string; body: MenuBody }) =>
  api.put<MenuResponse>(`/menus/${encodeURIComponent(id)}`, body);

export function useUpdateMenu() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMenu,
    onSuccess: (saved) => {
      queryClient.setQueryData(kitchenKeys.menus.detail(saved.id), saved);
      return invalidateKitchen(queryClient);
    },
  });
}
