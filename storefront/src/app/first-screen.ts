import { paths } from '../config/paths';
import { preloadHome, preloadLayout, preloadMenus } from './screen-loaders';

/**
 * The screens a visit usually starts on. main.tsx imports this module before anything else, so
 * on those addresses the screen's code, the screens' recipes and the screen's data are asked for
 * the moment the entry starts running, while React, the router and the theme are still being
 * set up, rather than after: the router then finds them on their way.
 */
export const homeScreen = () => import('./routes/home');
export const menusScreen = () => import('./routes/menus');
export const screenRecipes = () => import('../theme/screen-recipes');

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
    preloadLayout();
    screen.data(url);
  }
}
