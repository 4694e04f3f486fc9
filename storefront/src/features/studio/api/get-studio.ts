import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** The studio's public card (`GET /api/studio`). */
export interface StudioCard {
  name: string;
  tagline: string;
  city: string;
  currency: string;
  timeZone: string;
}

export const studioKeys = {
  all: ['studio'] as const,
  card: () => [...studioKeys.all, 'card'] as const,
};

export const STUDIO_PATH = '/studio';

export const getStudio = (): Promise<StudioCard> =>
  api.get<StudioCard>(STUDIO_PATH, { auth: false });

export const studioQueryOptions = () =>
  queryOptions({ queryKey: studioKeys.card(), queryFn: getStudio, staleTime: 10 * 60_000 });

export const useStudio = () => useQuery(studioQueryOptions());
