import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invalidateKitchen } from './invalidate-kitchen';

/** `DELETE /api/desserts/:id/photo/:photoId` (chef). */
export const deleteDessertPhoto = ({ id, photoId }: { id: string; photoId: string }) =>
  api.delete(`/desserts/${encodeURIComponent(id)}/photo/${encodeURIComponent(photoId)}`);

export function useDeleteDessertPhoto() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteDessertPhoto,
    onSuccess: () => invalidateKitchen(queryClient),
  });
}
