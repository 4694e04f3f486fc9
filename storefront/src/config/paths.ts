/** Every route of the storefront, with a helper to build its link. */
export const paths = {
  home: { path: '/', getHref: () => '/' },
  howBookingWorks: { path: '/how-booking-works', getHref: () => '/how-booking-works' },
  myEvents: { path: '/my-events', getHref: () => '/my-events' },
  signIn: {
    path: '/sign-in',
    getHref: (redirectTo?: string | null) => withRedirect('/sign-in', redirectTo),
  },
  createAccount: {
    path: '/create-account',
    getHref: (redirectTo?: string | null) => withRedirect('/create-account', redirectTo),
  },
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
