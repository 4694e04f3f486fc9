// Build-time render of the pages in PREBUILT_PAGES (run by scripts/prerender.mjs, never shipped):
// the same routes and screens as the browser, with no data, so each screen shows its loading
// state. The browser then hydrates this markup (main.tsx).
import { renderToString } from 'react-dom/server';
import { createMemoryRouter } from 'react-router';
import { App, routerInitialized } from './app/app';
import { createRoutes } from './app/router';
import { createQueryClient } from './lib/query-client';

export { OTHER_PAGE_ATTRIBUTE, PREBUILT_PAGES, PREBUILT_PATH_ATTRIBUTE } from './config/prebuilt';

/** The markup of the app at `path`, as React renders it before any data has arrived. */
export async function render(path: string): Promise<string> {
  const queryClient = createQueryClient();
  const router = createMemoryRouter(
    createRoutes(queryClient, { showingPrebuiltPage: () => true }),
    {
      initialEntries: [path],
    },
  );
  await routerInitialized(router);
  if (router.state.errors) {
    throw new Error(
      `Rendering ${path} at build time failed: ${JSON.stringify(router.state.errors)}`,
    );
  }
  try {
    return renderToString(<App queryClient={queryClient} router={router} />);
  } finally {
    router.dispose();
    queryClient.clear();
  }
}
