import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { allergyNotesKeys } from './allergy-notes-keys';
import type { Briefing } from './types';

/** `GET /api/orders/:id/briefing` (chef, staff): by table, what changes and why. Logged by the API. */
export const getBriefing = (orderId: string, signal?: AbortSignal) =>
  api.get<Briefing>(`/orders/${encodeURIComponent(orderId)}/briefing`, { signal });

export const briefingQueryOptions = (orderId: string) =>
  queryOptions({
    queryKey: allergyNotesKeys.briefing(orderId),
    queryFn: ({ signal }) => getBriefing(orderId, signal),
    // Health data, and every read is logged by the API as an opening: read once when the screen
    // opens (the loader's read is not repeated on mount), not again on every window focus.
    staleTime: 30_000,
    refetchOnWindowFocus: false,
  });

export const useBriefing = (orderId: string) => useQuery(briefingQueryOptions(orderId));
