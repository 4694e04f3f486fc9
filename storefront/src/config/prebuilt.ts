/**
 * Pages whose markup is rendered at build time (in the loading state, with no data) into the HTML
 * the server sends, so that they show before any script has run. Each is written to the file a
 * static server finds for its address (`/` → index.html, `/menus` → menus.html).
 */
export const PREBUILT_PAGES = [
  { path: '/', file: 'index.html' },
  { path: '/menus', file: 'menus.html' },
] as const;

/** Set on #root to the address its markup was rendered for. */
export const PREBUILT_PATH_ATTRIBUTE = 'data-prebuilt-path';

/**
 * Set on <html>, before the body is read, when the address is not the one the markup was
 * rendered for (a static server answers unknown addresses with index.html, which holds Home):
 * #root is then hidden, and the app empties it and starts as on any other page.
 */
export const OTHER_PAGE_ATTRIBUTE = 'data-other-page';
