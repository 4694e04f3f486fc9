import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invalidateKitchen } from './invalidate-kitchen';
import { kitchenKeys } from './kitchen-keys';
import type { DessertResponse } from './types';

/** The multipart field the API reads (api/src/files/photo-upload.decorator.ts). */
export const PHOTO_FIELD = 'photo';

/**
 * `POST /api/desserts/:id/photo` (chef): one JPEG, PNG or WebP up to 5 MB; 413 when larger,
 * 415 for another type. `onProgress` gets the share sent, 0–1.
 */
export function uploadDessertPhoto({
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
  return api.upload<DessertResponse>(`/desserts/${encodeURIComponent(id)}/photo`, form, {
    onProgress: (loaded, total) => onProgress?.(total > 0 ? loaded / total : 0),
  });
}

export function useUploadDessertPhoto() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadDessertPhoto,
    onSuccess: (saved) => {
      queryClient.setQueryData(kitchenKeys.desserts.detail(saved.id), saved);
      return invalidateKitchen(queryClient);
    },
  });
}
