import type { StudioSettingsView } from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { studioKeys } from './get-studio';

/** `GET /api/studio/settings` (chef only): every setting, and who changed them last. */
export const getStudioSettings = (signal?: AbortSignal) =>
  api.get<StudioSettingsView>('/studio/settings', { signal });

export const studioSettingsQueryOptions = () =>
  queryOptions({
    queryKey: studioKeys.settings(),
    queryFn: ({ signal }) => getStudioSettings(signal),
  });

export const useStudioSettings = () => useQuery(studioSettingsQueryOptions());
