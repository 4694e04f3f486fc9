import { paths } from '../config/paths';
import { firstScreenData, homeScreen, menusScreen, screenRecipes } from './first-screens';
import { preloadHome, preloadLayout, preloadMenus } from './screen-loaders';

/**
 * Starts the first screen early. main.tsx imports this module before anything else, so
 * on those addresses the screen's code, the screens' recipes and the screen's data are asked for
 * the moment the entry starts running, while React, the router and the theme are still being
 * set up, rather than after: the router then finds them on their way. A page the server rendered
 * with its data (server/first-screen-render.ts) carries that data: it is not asked for again.
 * Only main.tsx imports this module (its requests would otherwise start wherever it is imported,
 * a test's before its fake API is listening).
 */
if (typeof window !== 'undefined') {
  const url = new URL(window.location.href);
  const screen =
    url.pathname === paths.home.path
      ? { code: homeScreen, data: preloadHome }
      : url.pathname === paths.menus.path
        ? { code: menusScreen, data: preloadMenus }
        : null;
  if (screen) {
    // A failure here shows when the router asks for the same module: its error page says why.
    screen.code().catch(() => undefined);
    screenRecipes().catch(() => undefined);
    if (!firstScreenData()) {
      preloadLayout();
      screen.data(url);
    }
  }
}
