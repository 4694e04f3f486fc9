import type { BookingTerms } from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { bookingKeys } from './booking-keys';

/** What a client must know before paying, from the studio's settings (`GET /api/booking-terms`). */
export const getBookingTerms = (): Promise<BookingTerms> =>
  api.get<BookingTerms>('/booking-terms', { auth: false });

export const bookingTermsQueryOptions = () =>
  queryOptions({ queryKey: bookingKeys.terms(), queryFn: getBookingTerms, staleTime: 10 * 60_000 });

export const useBookingTerms = () => useQuery(bookingTermsQueryOptions());
