import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { allergyNotesKeys } from './allergy-notes-keys';
import type { AccessLogEntry } from './types';

/** `GET /api/orders/:id/access-log` (chef only): who opened the guests' data, newest first. */
export const getAccessLog = (orderId: string, signal?: AbortSignal) =>
  api.get<AccessLogEntry[]>(`/orders/${encodeURIComponent(orderId)}/access-log`, { signal });

export const accessLogQueryOptions = (orderId: string) =>
  queryOptions({
    queryKey: allergyNotesKeys.accessLog(orderId),
    queryFn: ({ signal }) => getAccessLog(orderId, signal),
    staleTime: 0,
  });

export const useAccessLog = (orderId: string, enabled: boolean) =>
  useQuery({ ...accessLogQueryOptions(orderId), enabled });
