// The pages in PREBUILT_PAGES rendered outside the browser, from the same routes and screens as the
// browser: at build time with no data, each screen in its loading state (scripts/prerender.mjs);
// Menus also per request, with its public data (server/first-screen-render.ts, which imports the
// SSR bundle of this file that scripts/prerender.mjs keeps in server/dist). Never shipped to the
// browser, which hydrates this markup (start-app.tsx).
import { createQueryClient } from '@nappe/web-kit/react';
import type { QueryKey } from '@tanstack/react-query';
import { renderToString } from 'react-dom/server';
import { createMemoryRouter } from 'react-router';
import { App, routerInitialized } from './app/app';
import { createRoutes } from './app/router';
import { env } from './config/env';
import { paths } from './config/paths';
import {
  FIRST_SCREEN_DATA_ID,
  OTHER_PAGE_ATTRIBUTE,
  PREBUILT_PATH_ATTRIBUTE,
} from './config/prebuilt';
import { MENUS_PAGE_SIZE, menusPath, menusQueryOptions } from './features/menus/api/get-menus';
import { STUDIO_PATH, studioQueryOptions } from './features/studio/api/get-studio';
import { pageFromSearch } from './lib/page';

export { OTHER_PAGE_ATTRIBUTE, PREBUILT_PAGES, PREBUILT_PATH_ATTRIBUTE } from './config/prebuilt';

/** Where the API is, on the storefront's own origin (the server proxies it). */
export const API_BASE_PATH = env.apiBasePath;

/** A public GET a first screen reads: its address under API_BASE_PATH, and the query it fills. */
export interface FirstScreenQuery {
  path: string;
  queryKey: QueryKey;
}

/** The answer to a FirstScreenQuery, as the API sent it. */
export interface FirstScreenAnswer {
  queryKey: QueryKey;
  data: unknown;
}

/**
 * For a page rendered per request with its data, what its screen reads from the API before it can
 * show anything but its loading state: the same public GETs, for the same query keys, as its
 * loaders and first-screen.ts ask for. Null for every other page.
 *
 * Only Menus is rendered per request: its largest element is the first card's photo, which the
 * build-time page cannot hold. Home's largest element is its heading, already in the build-time
 * page: rendered per request, it painted later, the first byte waiting for the API and the render
 * and the page growing from 89 to 137 KiB of HTML (npm run bench, 4× CPU and Slow 4G: LCP 1,868
 * → 2,372 ms, first paint 1,220 → 2,140 ms).
 */
export function firstScreenQueries(url: URL): FirstScreenQuery[] | null {
  const layout = { path: STUDIO_PATH, queryKey: studioQueryOptions().queryKey };
  if (url.pathname === paths.menus.path) {
    const page = pageFromSearch(url.searchParams.get('page'));
    const menus = menusQueryOptions(page, MENUS_PAGE_SIZE);
    return [layout, { path: menusPath(page, MENUS_PAGE_SIZE), queryKey: menus.queryKey }];
  }
  return null;
}

/**
 * The markup of the app at `url` (a path with its query string): with no answers, as React
 * renders it before any data has arrived; with answers, as it renders once they are in the cache.
 */
export async function render(
  url: string,
  answers: readonly FirstScreenAnswer[] = [],
): Promise<string> {
  const queryClient = createQueryClient();
  for (const { queryKey, data } of answers) queryClient.setQueryData(queryKey, data);
  const router = createMemoryRouter(
    // The loaders ask for nothing: the answers, if any, are already in the cache.
    createRoutes(queryClient, { showingPrebuiltPage: () => true }),
    { initialEntries: [url] },
  );
  await routerInitialized(router);
  if (router.state.errors) {
    throw new Error(`Rendering ${url} failed: ${JSON.stringify(router.state.errors)}`);
  }
  try {
    return renderToString(<App queryClient={queryClient} router={router} />);
  } finally {
    router.dispose();
    queryClient.clear();
  }
}

const SCRIPT_UNSAFE: Record<string, string> = {
  '<': '\\u003c',
  '>': '\\u003e',
  '&': '\\u0026',
  '\u2028': '\\u2028',
  '\u2029': '\\u2029',
};

/**
 * JSON that can sit inside a <script> element: no `</script>` or `<!--` can end or change the
 * element (HTML Standard, "Restrictions for contents of script elements"), and no U+2028/2029
 * line separators, which older JavaScript parsers read as line ends. The escapes are JSON's own
 * \uXXXX, so JSON.parse gives back exactly the same value.
 */
export function jsonForScript(value: unknown): string {
  return JSON.stringify(value).replace(/[<>&\u2028\u2029]/g, (c) => SCRIPT_UNSAFE[c] ?? c);
}

export interface RenderedDocument {
  html: string;
  /**
   * The page's one inline script (hides markup rendered for another address): the same text for
   * a page whether rendered at build time or per request, so one CSP hash per page allows it.
   */
  guard: string;
}

const EMPTY_ROOT = '<div id="root"></div>';

/**
 * The whole HTML document of the page at `url`: Vite's built index.html (`template`), with the
 * screen's markup in #root, its <title>, the guard script and, when rendered with answers, those
 * answers as JSON after #root for the app to put in its cache before taking the markup over.
 */
export async function renderDocument(
  template: string,
  url: string,
  answers: readonly FirstScreenAnswer[] = [],
): Promise<RenderedDocument> {
  if (!template.includes(EMPTY_ROOT)) throw new Error(`The template has no ${EMPTY_ROOT}`);
  if (!template.includes('</head>')) throw new Error('The template has no </head>');
  const { pathname } = new URL(url, 'http://localhost');
  let markup = await render(url, answers);
  // The screen's <title> (React puts it in <head> in the browser) replaces the template's.
  const title = markup.match(/<title>.*?<\/title>/s)?.[0];
  if (title) markup = markup.replace(title, '');
  // Runs before the body is read: on any other address, the markup must not show even briefly.
  const guard = `if(location.pathname!==${JSON.stringify(pathname)})document.documentElement.setAttribute(${JSON.stringify(OTHER_PAGE_ATTRIBUTE)},'')`;
  const data = answers.length
    ? `<script type="application/json" id="${FIRST_SCREEN_DATA_ID}">${jsonForScript(
        answers.map((a) => [a.queryKey, a.data]),
      )}</script>`
    : '';
  // Functions as replacements: a `$` in the markup or the data must stay a `$`.
  const html = template
    .replace(/<title>.*?<\/title>/s, (original) => title ?? original)
    .replace(
      '</head>',
      () =>
        `  <script>${guard}</script>\n    <style>[${OTHER_PAGE_ATTRIBUTE}] #root{display:none}</style>\n  </head>`,
    )
    .replace(
      EMPTY_ROOT,
      () => `<div id="root" ${PREBUILT_PATH_ATTRIBUTE}="${pathname}">${markup}</div>${data}`,
    );
  return { html, guard };
}
