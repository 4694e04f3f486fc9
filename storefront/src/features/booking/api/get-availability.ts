import type { AvailabilityResponse } from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { bookingKeys } from './booking-keys';

/**
 * Which dates of a range can still be booked for a menu (`GET /api/availability`, public): the
 * server's answer from the daily plate capacity, blackout days and the menu's lead time.
 */
export function getAvailability(
  menuId: string,
  from: string,
  to: string,
): Promise<AvailabilityResponse> {
  const query = new URLSearchParams({ menuId, from, to });
  return api.get<AvailabilityResponse>(`/availability?${query.toString()}`, { auth: false });
}

export const availabilityQueryOptions = (menuId: string, from: string, to: string) =>
  queryOptions({
    queryKey: bookingKeys.availability(menuId, from, to),
    queryFn: () => getAvailability(menuId, from, to),
    // Plates are taken by other clients as time goes by: ask again after a short while.
    staleTime: 30_000,
  });

export const useAvailability = (menuId: string, from: string, to: string, enabled = true) =>
  useQuery({ ...availabilityQueryOptions(menuId, from, to), enabled: enabled && menuId !== '' });
