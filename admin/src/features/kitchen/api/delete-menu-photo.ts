import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invalidateKitchen } from './invalidate-kitchen';

/** `DELETE /api/menus/:id/photo/:photoId` (chef). */
export const deleteMenuPhoto = ({ id, photoId }: { id: string; photoId: string }) =>
  api.delete(`/menus/${encodeURIComponent(id)}/photo/${encodeURIComponent(photoId)}`);

export function useDeleteMenuPhoto() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteMenuPhoto,
    onSuccess: () => invalidateKitchen(queryClient),
  });
}
