import { expect, test, type Request } from '@playwright/test';
import { urls } from '../support/env';

// Menus is rendered per request with its data by the preview server (storefront/server/
// first-screen-render.ts): the HTML as fetched already holds the cards and the first photo's
// <img>, and React takes that markup over without asking the API for the same data again.

interface Photo {
  url: string;
}
interface PublicMenu {
  id: string;
  name: string;
  photos: Photo[];
  desserts: { photos: Photo[] }[];
}

/** Text as React writes it into HTML (HTML Standard, "Serialising HTML fragments", escaping). */
const asHtmlText = (text: string) =>
  text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');

async function firstMenu(request: import('@playwright/test').APIRequestContext) {
  const res = await request.get(`${urls.storefront}/api/menus?page=1&pageSize=12`);
  expect(res.status()).toBe(200);
  const menu = ((await res.json()) as { items: PublicMenu[] }).items[0];
  if (!menu) throw new Error('The demo studio has no menu');
  const photo = menu.photos[0] ?? menu.desserts.find((d) => d.photos.length > 0)?.photos[0];
  return { menu, photo };
}

test('the Menus HTML, as fetched, holds the first menu’s name, its photo’s <img> and the data', async ({
  request,
}) => {
  const { menu, photo } = await firstMenu(request);

  const res = await request.get(`${urls.storefront}/menus`, { headers: { accept: 'text/html' } });

  expect(res.status()).toBe(200);
  expect(res.headers()['cache-control']).toBe('no-cache');
  const html = await res.text();
  expect(html).toContain(asHtmlText(menu.name));
  expect(html).toContain('<script type="application/json" id="first-screen-data">');
  const img = html.match(/<img\b[^>]*>/)?.[0] ?? '';
  expect(img).toMatch(/fetchpriority="high"/i);
  if (photo) expect(img).toContain(photo.url);
});

test('React takes the rendered Menus over: no request for its data, no hydration error', async ({
  page,
}) => {
  const { menu } = await firstMenu(page.request);
  const dataRequests: string[] = [];
  const onRequest = (req: Request) => {
    const { pathname } = new URL(req.url());
    if (/^\/api\/(menus|studio)\b/.test(pathname)) dataRequests.push(req.url());
  };
  const errors: string[] = [];
  page.on('request', onRequest);
  page.on('console', (message) => {
    if (message.type() === 'error' && /hydrat/i.test(message.text())) errors.push(message.text());
  });
  page.on('pageerror', (error) => errors.push(error.message));

  // The app asks who is signed in once React has taken the page over (the markup shows before).
  const takenOver = page.waitForRequest(/\/api\/auth\/refresh$/);
  await page.goto(`${urls.storefront}/menus`);
  const card = page.getByRole('article', { name: menu.name });
  await expect(card).toBeVisible();
  await takenOver;
  // The menu's link is now the router's: its page opens within the app.
  await card.getByRole('link', { name: menu.name, exact: true }).click();
  await expect(page).toHaveURL(new RegExp(`/menus/${menu.id}$`));
  await expect(page.getByRole('heading', { level: 1, name: menu.name })).toBeVisible();

  // The menu's own page asks for the menu; the list and the studio were never asked for again.
  expect(dataRequests.filter((url) => !url.includes(`/api/menus/${menu.id}`))).toEqual([]);
  expect(errors).toEqual([]);
});
