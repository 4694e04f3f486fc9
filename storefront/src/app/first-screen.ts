import { paths } from '../config/paths';
import { FIRST_SCREEN_DATA_ID } from '../config/prebuilt';
import { preloadHome, preloadLayout, preloadMenus } from './screen-loaders';

/**
 * The screens a visit usually starts on. main.tsx imports this module before anything else, so
 * on those addresses the screen's code, the screens' recipes and the screen's data are asked for
 * the moment the entry starts running, while React, the router and the theme are still being
 * set up, rather than after: the router then finds them on their way. A page the server rendered
 * with its data (server/first-screen-render.ts) carries that data: it is not asked for again.
 */
export const homeScreen = () => import('./routes/home');
export const menusScreen = () => import('./routes/menus');
export const screenRecipes = () => import('../theme/screen-recipes');

/** The data a page rendered per request carries (see FIRST_SCREEN_DATA_ID), or null. */
export const firstScreenData = () => document.getElementById(FIRST_SCREEN_DATA_ID);

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
