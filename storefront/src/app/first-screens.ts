import { FIRST_SCREEN_DATA_ID } from '../config/prebuilt';

/**
 * The screens a visit usually starts on, and the data a page rendered per request carries. No
 * side effect on import: the router and the tests import this; only the entry runs
 * first-screen.ts, which starts these early.
 */
export const homeScreen = () => import('./routes/home');
export const menusScreen = () => import('./routes/menus');
export const screenRecipes = () => import('../theme/screen-recipes');

/** The data a page rendered per request carries (see FIRST_SCREEN_DATA_ID), or null. */
export const firstScreenData = () => document.getElementById(FIRST_SCREEN_DATA_ID);
