/** Query keys of the booking feature; never write these arrays inline. */
export const bookingKeys = {
  all: ['booking'] as const,
  availabilities: () => [...bookingKeys.all, 'availability'] as const,
  availability: (menuId: string, from: string, to: string) =>
    [...bookingKeys.availabilities(), menuId, from, to] as const,
  terms: () => [...bookingKeys.all, 'terms'] as const,
  quote: (input: { menuId: string; eventDate: string; guestCount: number }) =>
    [...bookingKeys.all, 'quote', input] as const,
};
