/** The steps of the booking wizard, in order; each has its own address so Back works. */
export const BOOKING_STEPS = ['event', 'guests', 'review', 'payment'] as const;
export type BookingStep = (typeof BOOKING_STEPS)[number];

/** The tabs of an event in My events; each has its own address. */
export const EVENT_TABS = ['overview', 'guests', 'payments', 'documents'] as const;
export type EventTab = (typeof EVENT_TABS)[number];

const enc = encodeURIComponent;

function withQuery(path: string, query: Record<string, string | number | null | undefined>) {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== null && value !== undefined && value !== '') params.set(key, String(value));
  }
  const search = params.toString();
  return search ? `${path}?${search}` : path;
}

/** Every route of the storefront, with a helper to build its link. */
export const paths = {
  home: { path: '/', getHref: () => '/' },
  howBookingWorks: { path: '/how-booking-works', getHref: () => '/how-booking-works' },
  menus: {
    path: '/menus',
    getHref: (page?: number) => withQuery('/menus', { page: page && page > 1 ? page : null }),
  },
  menu: { path: '/menus/:menuId', getHref: (menuId: string) => `/menus/${enc(menuId)}` },
  dates: {
    path: '/dates',
    getHref: (query: { menuId?: string | null; month?: string | null } = {}) =>
      withQuery('/dates', { menu: query.menuId, month: query.month }),
  },
  book: {
    path: '/book/:menuId',
    getHref: (menuId: string, step: BookingStep = 'event', query: { date?: string | null } = {}) =>
      withQuery(`/book/${enc(menuId)}/${step}`, { date: query.date }),
  },
  myEvents: {
    path: '/my-events',
    getHref: (page?: number) => withQuery('/my-events', { page: page && page > 1 ? page : null }),
  },
  event: {
    path: '/my-events/:orderId',
    getHref: (orderId: string, tab: EventTab = 'overview') =>
      withQuery(`/my-events/${enc(orderId)}`, { tab: tab === 'overview' ? null : tab }),
  },
  changeGuests: {
    path: '/my-events/:orderId/change-guests',
    getHref: (orderId: string) => `/my-events/${enc(orderId)}/change-guests`,
  },
  booked: {
    path: '/my-events/:orderId/booked',
    getHref: (orderId: string, sessionId?: string | null) =>
      withQuery(`/my-events/${enc(orderId)}/booked`, { session_id: sessionId }),
  },
  signIn: {
    path: '/sign-in',
    getHref: (redirectTo?: string | null) => withRedirect('/sign-in', redirectTo),
  },
  createAccount: {
    path: '/create-account',
    getHref: (redirectTo?: string | null) => withRedirect('/create-account', redirectTo),
  },
  forgotPassword: { path: '/forgot-password', getHref: () => '/forgot-password' },
  /** The link in the reset e-mail (the API builds it): `/reset-password?token=…`. */
  resetPassword: { path: '/reset-password', getHref: () => '/reset-password' },
} as const;

function withRedirect(path: string, redirectTo?: string | null): string {
  const target = safeRedirect(redirectTo);
  return target ? `${path}?redirectTo=${encodeURIComponent(target)}` : path;
}

/**
 * Only same-site paths are followed after sign-in ("/my-events", not "//elsewhere" or
 * "https://…"), so a crafted link cannot send a person off the storefront.
 */
export function safeRedirect(target: string | null | undefined): string | null {
  if (!target || !target.startsWith('/') || target.startsWith('//') || target.startsWith('/\\')) {
    return null;
  }
  return target;
}
