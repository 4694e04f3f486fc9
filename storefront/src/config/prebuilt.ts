/**
 * Pages whose markup the server sends, so that they show before any script has run. Each is
 * rendered at build time (in the loading state, with no data) into the file a static server finds
 * for its address (`/` → index.html, `/menus` → menus.html). The preview server renders Menus per
 * request with its data instead (server/first-screen-render.ts), and falls back to that file.
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

/**
 * The id of the `<script type="application/json">` after #root in a page rendered per request:
 * the answers (`[queryKey, data]` pairs) its markup was rendered with, which the app puts in its
 * query cache before taking the markup over. Absent from the pages rendered at build time.
 */
export const FIRST_SCREEN_DATA_ID = 'first-screen-data';
