import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { allergyNotesKeys } from './allergy-notes-keys';
import type { AllergyNotes } from './types';

/** `GET /api/orders/:id/allergy-notes` (chef, staff; the API logs each opening). */
export const getAllergyNotes = (orderId: string, signal?: AbortSignal) =>
  api.get<AllergyNotes>(`/orders/${encodeURIComponent(orderId)}/allergy-notes`, { signal });

export const allergyNotesQueryOptions = (orderId: string) =>
  queryOptions({
    queryKey: allergyNotesKeys.detail(orderId),
    queryFn: ({ signal }) => getAllergyNotes(orderId, signal),
    // Health data, and every read is logged by the API as an opening: read once when the screen
    // opens (the loader's read is not repeated on mount), not again on every window focus.
    staleTime: 30_000,
    refetchOnWindowFocus: false,
  });

export const useAllergyNotes = (orderId: string) => useQuery(allergyNotesQueryOptions(orderId));
