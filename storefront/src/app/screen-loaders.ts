import type { Page } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { menuQueryOptions } from '../features/menus/api/get-menu';
import { MENUS_PAGE_SIZE, menusPath, menusQueryOptions } from '../features/menus/api/get-menus';
import type { PublicMenu } from '../features/menus/api/types';
import { STUDIO_PATH, studioQueryOptions } from '../features/studio/api/get-studio';
import { preloadPublicGet } from '../lib/api-client';
import { pageFromSearch } from '../lib/page';
import { MENU_NOT_FOUND, warm } from './loaders';

/**
 * The loaders of the screens a visit usually starts on, in the entry rather than in each
 * screen's chunk: their requests go out together with the request for the screen's code, not
 * after it has arrived.
 */
export interface ScreenLoaderOptions {
  /**
   * True while the page on screen is one the server sent already rendered, before React has
   * taken it over. React must first render exactly that markup, so the loaders wait for nothing
   * and put nothing in the cache: markup rendered at build time shows no data (first-screen.ts
   * has already asked for it; the screens' queries receive the answers once React has taken
   * over); markup rendered per request shows the answers it came with, which start-app.tsx has
   * put in the cache.
   */
  showingPrebuiltPage?: () => boolean;
}

const never = () => false;

/** How many menus Home features. */
export const FEATURED_MENUS = 3;

/*
 * What each of these screens asks for before React has taken the page over: first-screen.ts
 * calls them the moment the entry starts running, so their loaders then have nothing to do.
 */

/** Every screen: the studio's card (header and footer). */
export function preloadLayout(): void {
  preloadPublicGet(STUDIO_PATH);
}

export function preloadHome(): void {
  preloadPublicGet(menusPath(1, FEATURED_MENUS));
}

/**
 * The page of menus. Its first photo is not preloaded from here: the preview server renders Menus
 * with its data (storefront/server), so the <img> is in the HTML before any script runs; on the
 * build-time fallback the photo waits for the cards (the entry stays within its 150 KiB budget).
 */
export function preloadMenus(url: URL): void {
  const page = pageFromSearch(url.searchParams.get('page'));
  preloadPublicGet<Page<PublicMenu>>(menusPath(page, MENUS_PAGE_SIZE));
}

export const layoutLoader =
  (queryClient: QueryClient, { showingPrebuiltPage = never }: ScreenLoaderOptions = {}) =>
  () => {
    if (!showingPrebuiltPage()) void queryClient.prefetchQuery(studioQueryOptions());
    return null;
  };

/** Home shows its sections at once and fills them in: it starts its requests and waits for none. */
export const homeLoader =
  (queryClient: QueryClient, { showingPrebuiltPage = never }: ScreenLoaderOptions = {}) =>
  () => {
    if (!showingPrebuiltPage())
      void queryClient.prefetchQuery(menusQueryOptions(1, FEATURED_MENUS));
    return null;
  };

export const menusLoader =
  (queryClient: QueryClient, { showingPrebuiltPage = never }: ScreenLoaderOptions = {}) =>
  async ({ request }: LoaderFunctionArgs) => {
    if (showingPrebuiltPage()) return null;
    const page = pageFromSearch(new URL(request.url).searchParams.get('page'));
    await warm(queryClient, menusQueryOptions(page));
    return null;
  };

export const menuDetailLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await warm(queryClient, menuQueryOptions(params.menuId ?? ''), MENU_NOT_FOUND);
    return null;
  };
