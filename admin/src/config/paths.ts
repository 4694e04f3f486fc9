/** Every route of the kitchen app, with a helper to build its link. */
export const paths = {
  today: { path: '/', getHref: () => '/' },
  team: {
    path: '/studio/team',
    getHref: (page?: number) => (page && page > 1 ? `/studio/team?page=${page}` : '/studio/team'),
  },
  signIn: {
    path: '/sign-in',
    getHref: (redirectTo?: string | null) => {
      const target = safeRedirect(redirectTo);
      return target && target !== '/'
        ? `/sign-in?redirectTo=${encodeURIComponent(target)}`
        : '/sign-in';
    },
  },
} as const;

/**
 * Only same-site paths are followed after sign-in ("/studio/team", not "//elsewhere" or
 * "https://…"), so a crafted link cannot send a person off the app.
 */
export function safeRedirect(target: string | null | undefined): string | null {
  if (!target || !target.startsWith('/') || target.startsWith('//') || target.startsWith('/\\')) {
    return null;
  }
  return target;
}
