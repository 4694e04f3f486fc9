/** Every route of the kitchen app, with a helper to build its link. */
export const paths = {
  today: { path: '/', getHref: () => '/' },
  team: {
    path: '/studio/team',
    getHref: (page?: number) => (page && page > 1 ? `/studio/team?page=${page}` : '/studio/team'),
  },
  ingredients: { path: '/kitchen/ingredients', getHref: () => '/kitchen/ingredients' },
  newIngredient: { path: '/kitchen/ingredients/new', getHref: () => '/kitchen/ingredients/new' },
  ingredient: {
    path: '/kitchen/ingredients/:id',
    getHref: (id: string) => `/kitchen/ingredients/${encodeURIComponent(id)}`,
  },
  recipes: { path: '/kitchen/recipes', getHref: () => '/kitchen/recipes' },
  newRecipe: { path: '/kitchen/recipes/new', getHref: () => '/kitchen/recipes/new' },
  recipe: {
    path: '/kitchen/recipes/:id',
    getHref: (id: string) => `/kitchen/recipes/${encodeURIComponent(id)}`,
  },
  recipeScale: {
    path: '/kitchen/recipes/:id/scale',
    getHref: (id: string, query?: { grams: number } | { plates: number; dessertId: string }) => {
      const base = `/kitchen/recipes/${encodeURIComponent(id)}/scale`;
      if (!query) return base;
      const params =
        'grams' in query
          ? new URLSearchParams({ grams: String(query.grams) })
          : new URLSearchParams({ plates: String(query.plates), dessertId: query.dessertId });
      return `${base}?${params}`;
    },
  },
  desserts: { path: '/kitchen/desserts', getHref: () => '/kitchen/desserts' },
  newDessert: { path: '/kitchen/desserts/new', getHref: () => '/kitchen/desserts/new' },
  dessert: {
    path: '/kitchen/desserts/:id',
    getHref: (id: string) => `/kitchen/desserts/${encodeURIComponent(id)}`,
  },
  menus: { path: '/kitchen/menus', getHref: () => '/kitchen/menus' },
  newMenu: { path: '/kitchen/menus/new', getHref: () => '/kitchen/menus/new' },
  menu: {
    path: '/kitchen/menus/:id',
    getHref: (id: string) => `/kitchen/menus/${encodeURIComponent(id)}`,
  },
  orders: {
    path: '/orders',
    getHref: (query?: string) => (query ? `/orders?${query}` : '/orders'),
  },
  order: {
    path: '/orders/:id',
    getHref: (id: string) => `/orders/${encodeURIComponent(id)}`,
  },
  calendar: {
    path: '/calendar',
    getHref: (month?: string) => (month ? `/calendar?month=${month}` : '/calendar'),
  },
  allergyNotes: { path: '/allergy-notes', getHref: () => '/allergy-notes' },
  orderAllergyNotes: {
    path: '/allergy-notes/:orderId',
    getHref: (orderId: string) => `/allergy-notes/${encodeURIComponent(orderId)}`,
  },
  briefing: {
    path: '/allergy-notes/:orderId/briefing',
    getHref: (orderId: string) => `/allergy-notes/${encodeURIComponent(orderId)}/briefing`,
  },
  prepPlan: {
    path: '/prep/plan',
    getHref: (range?: { from: string; to: string }) =>
      range ? `/prep/plan?${new URLSearchParams(range)}` : '/prep/plan',
  },
  prepSchedule: {
    path: '/prep/schedule',
    getHref: (date?: string) =>
      date ? `/prep/schedule?${new URLSearchParams({ date })}` : '/prep/schedule',
  },
  prepLabels: {
    path: '/prep/labels',
    getHref: (date?: string) =>
      date ? `/prep/labels?${new URLSearchParams({ date })}` : '/prep/labels',
  },
  insights: { path: '/insights', getHref: () => '/insights' },
  settings: { path: '/studio/settings', getHref: () => '/studio/settings' },
  acceptInvitation: { path: '/accept-invitation', getHref: () => '/accept-invitation' },
  forgotPassword: { path: '/forgot-password', getHref: () => '/forgot-password' },
  /** The link in the reset e-mail (the API builds it): `/reset-password?token=…`. */
  resetPassword: { path: '/reset-password', getHref: () => '/reset-password' },
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
