import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invalidateKitchen } from './invalidate-kitchen';
import { kitchenKeys } from './kitchen-keys';
import type { MenuResponse } from './types';

/** The multipart field the API reads (api/src/files/photo-upload.decorator.ts). */
export const PHOTO_FIELD = 'photo';

/**
 * `POST /api/menus/:id/photo` (chef): one JPEG, PNG or WebP up to 5 MB; 413 when larger,
 * 415 for another type. `onProgress` gets the share sent, 0–1.
 */
export function uploadMenuPhoto({
  id,
  file,
  onProgress,
}: {
  id: string;
  file: File;
  onProgress?: (share: number) => void;
}) {
  const form = new FormData();
  form.append(PHOTO_FIELD, file);
  return api.upload<MenuResponse>(`/menus/${encodeURIComponent(id)}/photo`, form, {
    onProgress: (loaded, total) => onProgress?.(total > 0 ? loaded / total : 0),
  });
}

export function useUploadMenuPhoto() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadMenuPhoto,
    onSuccess: (saved) => {
      queryClient.setQueryData(kitchenKeys.menus.detail(saved.id), saved);
      return invalidateKitchen(queryClient);
    },
  });
}
