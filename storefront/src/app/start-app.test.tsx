import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { PublicMenu } from '../features/menus/api/types';
import { FIRST_SCREEN_DATA_ID, PREBUILT_PATH_ATTRIBUTE } from '../config/prebuilt';
import {
  API_BASE_PATH,
  firstScreenQueries,
  render,
  renderDocument,
  type FirstScreenAnswer,
} from '../prerender';
import { orchardMenu, pageOf, summerMenu } from '../testing/booking-fixtures';
import { studioCard } from '../testing/fixtures';
import { server } from '../testing/server';
import { startApp, type StartedApp } from './start-app';

/*
 * The pages rendered at build time must be taken over by React as they are. React's contract
 * for hydrateRoot (react.dev, "hydrateRoot": the first render must output the same markup as the
 * server; a mismatch is a bug React reports as a recoverable error and repairs by drawing the
 * page again on the client) is checked here: same nodes kept, no recoverable error.
 */

let started: StartedApp | undefined;
afterEach(() => {
  started?.root.unmount();
  started = undefined;
  document.body.replaceChildren();
  window.history.replaceState(null, '', '/');
  server.events.removeAllListeners();
});

/** Puts the build-time markup of `path` in the page, as the server sends it, at `address`. */
async function servePrebuilt(path: string, address = path) {
  const markup = await render(path);
  window.history.replaceState(null, '', address);
  const container = document.createElement('div');
  container.id = 'root';
  container.setAttribute(PREBUILT_PATH_ATTRIBUTE, path);
  container.innerHTML = markup;
  document.body.append(container);
  return container;
}

describe('pages rendered at build time', () => {
  it('Home: React takes the markup over without redrawing it, then fills in the data', async () => {
    const container = await servePrebuilt('/');
    const heading = screen.getByRole('heading', { level: 1 });
    expect(screen.getByText('A dessert studio')).toBeInTheDocument();
    const recoverable = vi.fn();

    started = await startApp(container, { onRecoverableError: recoverable });

    expect(started.hydrated).toBe(true);
    expect(await screen.findByText(`${studioCard.name} · ${studioCard.city}`)).toBeInTheDocument();
    const hero = within(screen.getByRole('region', { name: /evenings that matter/ }));
    expect(await hero.findByText(/^Plated desserts, finished at your table\./)).toBeInTheDocument();
    expect(screen.getByRole('heading', { level: 1 })).toBe(heading);
    expect(recoverable).not.toHaveBeenCalled();
  });

  it('Menus: the loading shapes are taken over, then the cards replace them', async () => {
    const container = await servePrebuilt('/menus');
    const heading = screen.getByRole('heading', { level: 1, name: 'Menus' });
    expect(screen.getByRole('status', { name: 'Loading the menus' })).toBeInTheDocument();
    const recoverable = vi.fn();

    started = await startApp(container, { onRecoverableError: recoverable });

    expect(await screen.findByRole('article', { name: summerMenu.name })).toBeInTheDocument();
    expect(screen.getByRole('heading', { level: 1, name: 'Menus' })).toBe(heading);
    expect(recoverable).not.toHaveBeenCalled();
  });

  it('markup rendered for another address is dropped: that page draws itself', async () => {
    // A static server answers every unknown address with index.html, which holds Home.
    const container = await servePrebuilt('/', '/how-booking-works');

    started = await startApp(container);

    expect(started.hydrated).toBe(false);
    expect(
      await screen.findByRole('heading', { level: 1, name: 'How booking works' }),
    ).toBeInTheDocument();
    await waitFor(() =>
      expect(screen.queryByRole('heading', { name: /evenings that matter/ })).toBeNull(),
    );
  });
});

/** Vite's built index.html, as the server renders pages into it. */
const TEMPLATE =
  '<!doctype html><html lang="en"><head><title>Nappe</title></head><body><div id="root"></div></body></html>';

/** The answers the server gets for the first screen at `url`: here, from the test API. */
async function answersFor(url: string): Promise<FirstScreenAnswer[]> {
  const queries = firstScreenQueries(new URL(url, window.location.origin)) ?? [];
  return Promise.all(
    queries.map(async ({ path, queryKey }) => {
      const res = await fetch(new URL(`${API_BASE_PATH}${path}`, window.location.origin));
      return { queryKey, data: await res.json() };
    }),
  );
}

/**
 * Puts the page the server renders per request for `url` in the document: #root with the
 * screen's markup, then the data it was rendered with, as the browser parses them.
 */
async function serveRendered(url: string, answers?: FirstScreenAnswer[]) {
  const { html } = await renderDocument(TEMPLATE, url, answers ?? (await answersFor(url)));
  const page = new DOMParser().parseFromString(html, 'text/html');
  window.history.replaceState(null, '', url);
  const container = document.adoptNode(page.getElementById('root')!);
  document.body.append(container, document.adoptNode(page.getElementById(FIRST_SCREEN_DATA_ID)!));
  return container;
}

/** Every address the app asks the API for from now on. */
function recordApiRequests(): string[] {
  const asked: string[] = [];
  server.events.on('request:start', ({ request }) => {
    const url = new URL(request.url);
    asked.push(url.pathname + url.search);
  });
  return asked;
}
const dataRequests = (asked: string[]) =>
  asked.filter((path) => /^\/api\/(studio|menus)\b/.test(path));

/**
 * Whether React has taken `node` over: react-dom keeps the node's fiber on it under a
 * `__reactFiber$` key once hydrated (an internal of react-dom, here only to know when to look).
 */
const takenOver = (node: Element) => Object.keys(node).some((k) => k.startsWith('__reactFiber$'));

describe('pages rendered per request with their data', () => {
  it('Menus: React takes the cards and the photo over as they are, and asks the API for none of it', async () => {
    const container = await serveRendered('/menus');
    const article = screen.getByRole('article', { name: summerMenu.name });
    const img = article.querySelector('img')!;
    expect(img.getAttribute('srcset')).toContain(summerMenu.photos[0]!.url);
    expect(screen.getByRole('article', { name: orchardMenu.name })).toBeInTheDocument();
    const asked = recordApiRequests();
    const recoverable = vi.fn();

    started = await startApp(container, { onRecoverableError: recoverable });

    expect(started.hydrated).toBe(true);
    await waitFor(() => expect(takenOver(img)).toBe(true));
    // Time for any query that wanted to fetch on mount to do so.
    await new Promise((resolve) => setTimeout(resolve, 200));
    expect(screen.getByRole('article', { name: summerMenu.name })).toBe(article);
    expect(article.querySelector('img')).toBe(img);
    expect(recoverable).not.toHaveBeenCalled();
    expect(dataRequests(asked)).toEqual([]);
  });

  it('a menu name written as HTML arrives as data and is shown as text, in both renders', async () => {
    const hostile: PublicMenu = {
      ...summerMenu,
      name: '</script><script>alert(1)</script>',
      description: 'Lemon\u2028curd & <!-- meringue --> \u2029 <b>torched</b>',
    };
    server.use(
      http.get(`${API_BASE_PATH}/menus`, () => HttpResponse.json(pageOf([hostile], 1, 12))),
    );
    const container = await serveRendered('/menus');
    // The data is one element, its text the JSON the server wrote; no element was added.
    expect(document.querySelectorAll('script')).toHaveLength(1);
    expect(container.querySelector('script, b')).toBeNull();
    const data = document.getElementById(FIRST_SCREEN_DATA_ID)!.textContent!;
    expect(JSON.parse(data)[1][1].items[0]).toEqual(hostile);
    const article = screen.getByRole('article', { name: hostile.name });
    const recoverable = vi.fn();

    started = await startApp(container, { onRecoverableError: recoverable });

    await waitFor(() => expect(takenOver(article)).toBe(true));
    expect(screen.getByRole('heading', { level: 2, name: hostile.name })).toBeInTheDocument();
    expect(recoverable).not.toHaveBeenCalled();
  });

  it('another page of menus is rendered and taken over with its own answers', async () => {
    const many = Array.from({ length: 13 }, (_, i) => ({
      ...orchardMenu,
      id: `menu-${i + 1}`,
      name: `Menu number ${i + 1}`,
    }));
    server.use(
      http.get(`${API_BASE_PATH}/menus`, ({ request }) => {
        const page = Number(new URL(request.url).searchParams.get('page'));
        return HttpResponse.json({
          ...pageOf(many.slice((page - 1) * 12, page * 12), page, 12),
          total: many.length,
        });
      }),
    );
    const container = await serveRendered('/menus?page=2');
    expect(screen.getByRole('article', { name: 'Menu number 13' })).toBeInTheDocument();
    expect(screen.getByText('Page 2 of 2')).toBeInTheDocument();
    const asked = recordApiRequests();
    const recoverable = vi.fn();

    started = await startApp(container, { onRecoverableError: recoverable });

    const previous = screen.getByRole('link', { name: 'Previous page' });
    await waitFor(() => expect(takenOver(previous)).toBe(true));
    await new Promise((resolve) => setTimeout(resolve, 200));
    expect(recoverable).not.toHaveBeenCalled();
    expect(dataRequests(asked)).toEqual([]);
  });
});

describe('first-screen.ts, as the entry starts', () => {
  /** Runs first-screen.ts afresh, as the entry does, on the page now in the document. */
  async function startEntry() {
    vi.resetModules();
    await import('./first-screen');
  }

  it('on a page rendered with its data, asks the API for none of it', async () => {
    await serveRendered('/menus');
    const asked = recordApiRequests();

    await startEntry();
    await new Promise((resolve) => setTimeout(resolve, 200));

    expect(dataRequests(asked)).toEqual([]);
  });

  it('on a page rendered at build time, asks for the screen’s data at once', async () => {
    await servePrebuilt('/menus');
    const asked = recordApiRequests();

    await startEntry();

    await waitFor(() =>
      expect(dataRequests(asked).sort()).toEqual(['/api/menus?page=1&pageSize=12', '/api/studio']),
    );
  });
});
