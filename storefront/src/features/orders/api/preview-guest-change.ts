import {
  changeGuestCountSchema,
  type ChangeGuestCountRequest,
  type GuestChangePreview,
} from '@nappe/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** The money side of a change of guests, before it is made (`POST …/guest-change-preview`). */
export function previewGuestChange(
  orderId: string,
  body: ChangeGuestCountRequest,
): Promise<GuestChangePreview> {
  return api.post<GuestChangePreview>(
    `/orders/${encodeURIComponent(orderId)}/guest-change-preview`,
    changeGuestCountSchema.parse(body),
  );
}

export function usePreviewGuestChange(orderId: string) {
  return useMutation({
    mutationFn: (body: ChangeGuestCountRequest) => previewGuestChange(orderId, body),
  });
}
