import { createQuoteSchema, type CreateQuoteRequest, type Quote } from '@nappe/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { bookingKeys } from './booking-keys';

/**
 * The server's quote for a menu, a date and a number of guests (`POST /api/quotes`, public). The
 * storefront shows it as it comes: every amount is worked out by the server.
 */
export function getQuote(input: CreateQuoteRequest): Promise<Quote> {
  return api.post<Quote>('/quotes', createQuoteSchema.parse(input), { auth: false });
}

export const quoteQueryOptions = (input: CreateQuoteRequest) =>
  queryOptions({
    queryKey: bookingKeys.quote(input),
    queryFn: () => getQuote(input),
    // A quote depends on today's date (deposit or full, due date): keep it fresh.
    staleTime: 60_000,
  });

export const useQuote = (input: CreateQuoteRequest | null) =>
  useQuery({
    ...quoteQueryOptions(input ?? { menuId: '', eventDate: '', guestCount: 0 }),
    enabled: input !== null,
  });
