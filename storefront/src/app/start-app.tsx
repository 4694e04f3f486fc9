import type { QueryClient, QueryKey } from '@tanstack/react-query';
import { createRoot, hydrateRoot, type Root, type RootOptions } from 'react-dom/client';
import { createBrowserRouter, type DataRouter } from 'react-router';
import { OTHER_PAGE_ATTRIBUTE, PREBUILT_PATH_ATTRIBUTE } from '../config/prebuilt';
// Kept after react-dom, not sorted to the top: the bundle lays modules out in first-import order,
// and this entry (it also exports Chakra parts) placed before React DOM makes the startup script
// compress about 0.9 KiB worse.
import { createQueryClient } from '@nappe/web-kit/react';
import { App, routerInitialized } from './app';
import { firstScreenData } from './first-screens';
import { createRoutes } from './router';

export interface StartedApp {
  root: Root;
  router: DataRouter;
  queryClient: QueryClient;
  /** Whether React took over markup the server sent rather than drawing the page. */
  hydrated: boolean;
}

/**
 * Starts the storefront in `container`. Home and Menus arrive as HTML already rendered, so they
 * show before any script has run: by the server per request with their data
 * (server/first-screen-render.ts), else at build time in their loading state
 * (scripts/prerender.mjs). React then takes that markup over (hydrates it) instead of drawing
 * the page again. Any other page starts empty.
 */
export async function startApp(
  container: HTMLElement,
  options: Pick<RootOptions, 'onRecoverableError'> = {},
): Promise<StartedApp> {
  let showingPrebuiltPage =
    container.getAttribute(PREBUILT_PATH_ATTRIBUTE) === window.location.pathname;

  const queryClient = createQueryClient();
  // The answers the server rendered this markup with, if it did: in the cache before the first
  // render, so that React renders the same markup and no screen asks for them again.
  const answers = showingPrebuiltPage && firstScreenData();
  if (answers) {
    for (const [key, data] of JSON.parse(answers.textContent!) as [QueryKey, unknown][])
      queryClient.setQueryData(key, data);
  }
  // Made before the first render, so the screen's code and data start loading at once.
  const router = createBrowserRouter(
    createRoutes(queryClient, { showingPrebuiltPage: () => showingPrebuiltPage }),
  );
  const app = <App queryClient={queryClient} router={router} />;

  if (showingPrebuiltPage) {
    // Hydration must render what the markup shows: the screen itself, not the loading
    // fallback, so it waits for the screen's code; the page stays readable (and its links
    // work) meanwhile.
    await routerInitialized(router);
    const root = hydrateRoot(container, app, options);
    showingPrebuiltPage = false;
    return { root, router, queryClient, hydrated: true };
  }

  // Markup rendered for another address (see OTHER_PAGE_ATTRIBUTE) is not this page's.
  container.replaceChildren();
  container.removeAttribute(PREBUILT_PATH_ATTRIBUTE);
  document.documentElement.removeAttribute(OTHER_PAGE_ATTRIBUTE);
  const root = createRoot(container, options);
  root.render(app);
  return { root, router, queryClient, hydrated: false };
}
