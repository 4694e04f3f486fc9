import type { StudioSettingsBody, StudioSettingsView } from '@nappe/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { studioKeys } from './get-studio';

/** `PUT /api/studio/settings` (chef only): the whole settings at once. */
export const updateStudioSettings = (body: StudioSettingsBody) =>
  api.put<StudioSettingsView>('/studio/settings', body);

export function useUpdateStudioSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateStudioSettings,
    onSuccess: async (view) => {
      queryClient.setQueryData(studioKeys.settings(), view);
      // The studio's card (name, currency, time zone) is read by every screen.
      await queryClient.invalidateQueries({ queryKey: studioKeys.card() });
    },
  });
}
