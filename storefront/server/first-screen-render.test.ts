import { once } from 'node:events';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import {
  createServer,
  request,
  type IncomingHttpHeaders,
  type OutgoingHttpHeaders,
  type Server,
} from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gunzipSync } from 'node:zlib';
import { preview, type PreviewServer } from 'vite';
import { afterAll, afterEach, describe, expect, it } from 'vitest';
import { GRID_PHOTO_SIZES, photoSrcSet } from '../src/components/ui/photo-source';
import type { PublicMenu } from '../src/features/menus/api/types';
import * as prerender from '../src/prerender';
import { orchardMenu, summerMenu } from '../src/testing/booking-fixtures';
import { studioCard } from '../src/testing/fixtures';
import {
  firstScreenMiddleware,
  MAX_RENDERING,
  type FirstScreenMiddleware,
  type FirstScreenOptions,
} from './first-screen-render';

/*
 * The preview server's per-request render of the first screens, driven over real HTTP: a fake API
 * on loopback (it records what it is asked, and can be slow, fail or be down) and the middleware
 * in a real `vite preview` server, placed where firstScreenRender() places it, serving a dist/ of
 * build-time pages. The renderer is the real one (src/prerender.tsx), as the SSR bundle carries it.
 */

/** Vite's built index.html, as scripts/prerender.mjs finds it before rendering any page. */
const TEMPLATE = `<!doctype html>
<html lang="en">
  <head>
    <meta charset="UTF-8" />
    <title>Nappe — plated desserts for private events</title>
    <script type="module" crossorigin src="/assets/index-test.js"></script>
  </head>
  <body>
    <div id="root"></div>
  </body>
</html>
`;
const BUILD_TIME_PAGE = 'the page rendered at build time';
const BUILD_TIME_HOME = 'the home page rendered at build time';

/** What `npm run build` leaves in dist/ for the preview server: the build-time pages. */
const root = mkdtempSync(join(tmpdir(), 'nappe-first-screen-'));
mkdirSync(join(root, 'dist'));
writeFileSync(join(root, 'dist', 'menus.html'), BUILD_TIME_PAGE);
writeFileSync(join(root, 'dist', 'index.html'), BUILD_TIME_HOME);
afterAll(() => rmSync(root, { recursive: true, force: true }));

const servers: Server[] = [];
const previews: PreviewServer[] = [];
afterEach(async () => {
  for (const server of previews.splice(0)) await server.close();
  for (const server of servers.splice(0)) {
    server.closeAllConnections();
    server.close();
    await once(server, 'close');
  }
});

async function listen(server: Server): Promise<string> {
  servers.push(server);
  server.listen(0, '127.0.0.1');
  await once(server, 'listening');
  return `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
}

/** An address where nothing listens any more: the API down. */
async function closedPort(): Promise<string> {
  const down = createServer();
  const origin = await listen(down);
  servers.splice(servers.indexOf(down), 1);
  down.close();
  await once(down, 'close');
  return origin;
}

/** The API's public reads, as the real API answers them: a page of menus, the studio's card. */
async function startFakeApi() {
  const api = {
    origin: '',
    menus: [summerMenu, orchardMenu] as PublicMenu[],
    /** When set, what GET /api/menus answers instead of a page of `menus`. */
    menusBody: undefined as unknown,
    status: 200,
    delayMs: 0,
    requests: [] as { url: string; headers: IncomingHttpHeaders }[],
  };
  const server = createServer((req, res) => {
    api.requests.push({ url: req.url ?? '', headers: req.headers });
    const answer = () => {
      const url = new URL(req.url ?? '', 'http://api');
      const json = (status: number, body: unknown) => {
        res.writeHead(status, { 'content-type': 'application/json' });
        res.end(JSON.stringify(body));
      };
      if (api.status !== 200) return json(api.status, { statusCode: api.status, message: 'Oops' });
      if (url.pathname === '/api/studio') return json(200, studioCard);
      if (url.pathname === '/api/menus') {
        if (api.menusBody !== undefined) return json(200, api.menusBody);
        const page = Number(url.searchParams.get('page'));
        const pageSize = Number(url.searchParams.get('pageSize'));
        const items = api.menus.slice((page - 1) * pageSize, page * pageSize);
        return json(200, { items, total: api.menus.length, page, pageSize });
      }
      json(404, { statusCode: 404, message: 'Not Found' });
    };
    if (api.delayMs > 0) setTimeout(answer, api.delayMs);
    else answer();
  });
  api.origin = await listen(server);
  return api;
}

async function startStorefront({
  headers,
  ...options
}: Partial<FirstScreenOptions> & { apiOrigin: string }) {
  const fallbacks: { url: string; reason: string }[] = [];
  let middleware: FirstScreenMiddleware | undefined;
  const server = await preview({
    root,
    configFile: false,
    logLevel: 'silent',
    preview: { host: '127.0.0.1', port: 0, headers },
    plugins: [
      {
        name: 'first-screen-render-under-test',
        configurePreviewServer(server) {
          const added = firstScreenMiddleware({
            renderer: prerender,
            template: TEMPLATE,
            headers: server.config.preview.headers,
            onFallback: (url, reason) => fallbacks.push({ url, reason: String(reason) }),
            ...options,
          });
          middleware = added;
          // As firstScreenRender() adds it: after Vite's own middlewares (its compression first).
          return () => server.middlewares.use(added);
        },
      },
    ],
  });
  previews.push(server);
  const { port } = server.httpServer.address() as AddressInfo;
  return { origin: `http://127.0.0.1:${port}`, fallbacks, middleware: middleware! };
}

interface Answer {
  status: number;
  headers: IncomingHttpHeaders;
  body: Buffer;
  text: string;
  ms: number;
}

/** A page load as a browser makes it (Accept: text/html), over node:http to see raw bytes. */
function get(url: string, headers: OutgoingHttpHeaders = {}, method = 'GET'): Promise<Answer> {
  const started = performance.now();
  return new Promise((resolve, reject) => {
    const req = request(url, { method, headers: { accept: 'text/html', ...headers } }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () => {
        const body = Buffer.concat(chunks);
        resolve({
          status: res.statusCode ?? 0,
          headers: res.headers,
          body,
          text: body.toString('utf8'),
          ms: performance.now() - started,
        });
      });
    });
    req.on('error', reject);
    req.end();
  });
}

/** Whether the page was rendered with its data rather than sent as built. */
const rendered = (answer: Answer) => answer.text.includes('id="first-screen-data"');

/** The JSON of the page's `<script type="application/json">`, as the browser's text of it. */
function embedded(html: string): string {
  const match = html.match(
    /<script type="application\/json" id="first-screen-data">(.*?)<\/script>/s,
  );
  if (!match?.[1]) throw new Error('no embedded data');
  return match[1];
}

/**
 * An element's attributes by name. HTML attribute names are case-insensitive (HTML Standard,
 * "Attributes"): React writes `srcSet` and `fetchPriority`, the browser reads srcset and
 * fetchpriority.
 */
function attributes(tag: string): Record<string, string> {
  const decode = (value: string) =>
    value
      .replace(/&quot;/g, '"')
      .replace(/&#x27;/g, "'")
      .replace(/&lt;/g, '<')
      .replace(/&gt;/g, '>')
      .replace(/&amp;/g, '&');
  return Object.fromEntries(
    [...tag.matchAll(/\s([\w-]+)="([^"]*)"/g)].map((m) => [m[1]!.toLowerCase(), decode(m[2]!)]),
  );
}

const menusAnswer = (items: PublicMenu[], page = 1, pageSize = 12) => ({
  items,
  total: 2,
  page,
  pageSize,
});

describe('the first screens, rendered per request with their data', () => {
  it('Menus: the HTML holds the cards and the first photo’s <img>, and the data it was rendered with', async () => {
    const api = await startFakeApi();
    const storefront = await startStorefront({
      apiOrigin: api.origin,
      headers: { 'x-preview-header': 'kept' },
    });

    const page = await get(`${storefront.origin}/menus`);

    expect(page.status).toBe(200);
    expect(page.headers['content-type']).toBe('text/html; charset=utf-8');
    expect(page.headers['cache-control']).toBe('no-cache');
    expect(page.headers['x-preview-header']).toBe('kept');
    expect(page.text).toContain(summerMenu.name);
    expect(page.text).toContain(orchardMenu.name);
    expect(page.text).toContain('<title>Menus');
    expect(page.text.match(/<title>/g)).toHaveLength(1);
    // The page's largest image, findable by the browser's preload scanner in the HTML itself,
    // with the srcset and sizes the client's Photo gives it (start-app.test.tsx checks that
    // React hydrates this markup as it is).
    const img = attributes(page.text.match(/<img\b[^>]*>/)?.[0] ?? '');
    expect(img.srcset).toBe(photoSrcSet(summerMenu.photos[0]!));
    expect(img.sizes).toBe(GRID_PHOTO_SIZES);
    expect(img.loading).toBe('eager');
    expect(img.fetchpriority).toBe('high');
    expect(JSON.parse(embedded(page.text))).toEqual([
      [['studio', 'card'], studioCard],
      [['menus', 'list', { page: 1, pageSize: 12 }], menusAnswer([summerMenu, orchardMenu])],
    ]);
    expect(api.requests.map((r) => r.url).sort()).toEqual([
      '/api/menus?page=1&pageSize=12',
      '/api/studio',
    ]);
    expect(storefront.fallbacks).toEqual([]);
  });

  it('Menus ?page=2 asks for the second page; Home stays the build-time page', async () => {
    const api = await startFakeApi();
    const storefront = await startStorefront({ apiOrigin: api.origin });

    const second = await get(`${storefront.origin}/menus?page=2`);
    const home = await get(`${storefront.origin}/`);

    expect(second.status).toBe(200);
    expect(JSON.parse(embedded(second.text))[1]).toEqual([
      ['menus', 'list', { page: 2, pageSize: 12 }],
      menusAnswer([], 2),
    ]);
    expect(home.text).toBe(BUILD_TIME_HOME);
    expect(api.requests.map((r) => r.url).sort()).toEqual([
      '/api/menus?page=2&pageSize=12',
      '/api/studio',
    ]);
  });

  it('never passes the visitor’s cookies or Authorization on to the API', async () => {
    const api = await startFakeApi();
    const storefront = await startStorefront({ apiOrigin: api.origin });

    const page = await get(`${storefront.origin}/menus`, {
      cookie: 'nappe_refresh=secret-refresh-token',
      authorization: 'Bearer secret-access-token',
    });

    expect(page.status).toBe(200);
    expect(api.requests).toHaveLength(2);
    for (const { headers } of api.requests) {
      expect(headers.cookie).toBeUndefined();
      expect(headers.authorization).toBeUndefined();
    }
    expect(page.text).not.toContain('secret');
  });

  it('a menu name written as HTML stays data: no element can be closed or added', async () => {
    const api = await startFakeApi();
    const hostile = {
      ...summerMenu,
      name: '</script><script>alert(1)</script>',
      // U+2028 and U+2029: line ends to older JavaScript parsers, plain characters to JSON.
      description: 'Lemon\u2028curd & <!-- meringue --> \u2029 <b>torched</b>',
    };
    api.menus = [hostile];
    const storefront = await startStorefront({ apiOrigin: api.origin });

    const page = await get(`${storefront.origin}/menus`);

    expect(page.status).toBe(200);
    // The template's module script, the guard and the data: no other.
    expect(page.text.match(/<script/g)).toHaveLength(3);
    expect(page.text).not.toContain('<script>alert(1)');
    const json = embedded(page.text);
    expect(json).not.toMatch(/[<>&\u2028\u2029]/);
    expect(JSON.parse(json)[1][1].items[0]).toEqual(hostile);
    // React wrote the name as text.
    expect(page.text).toContain('&lt;/script&gt;&lt;script&gt;alert(1)&lt;/script&gt;');
  });

  it('falls back to the build-time page when the API is down', async () => {
    const storefront = await startStorefront({ apiOrigin: await closedPort() });

    const page = await get(`${storefront.origin}/menus`);

    expect(page.status).toBe(200);
    expect(page.text).toBe(BUILD_TIME_PAGE);
    expect(storefront.fallbacks).toHaveLength(1);
    expect(storefront.fallbacks[0]!.url).toBe('/menus');
  });

  it('falls back when the API answers an error', async () => {
    const api = await startFakeApi();
    api.status = 500;
    const storefront = await startStorefront({ apiOrigin: api.origin });

    const page = await get(`${storefront.origin}/menus`);

    expect(page.text).toBe(BUILD_TIME_PAGE);
    expect(storefront.fallbacks[0]!.reason).toMatch(/answered 500/);
  });

  it('falls back within its timeout when the API is slow, without waiting for the answer', async () => {
    const api = await startFakeApi();
    api.delayMs = 5000;
    const storefront = await startStorefront({ apiOrigin: api.origin, timeoutMs: 200 });

    const page = await get(`${storefront.origin}/menus`);

    expect(page.text).toBe(BUILD_TIME_PAGE);
    expect(page.ms).toBeGreaterThanOrEqual(190);
    expect(page.ms).toBeLessThan(2500);
    expect(storefront.fallbacks[0]!.reason).toMatch(/timeout|abort/i);
  });

  it('falls back when an answer cannot be shown (a page of menus without its list)', async () => {
    const api = await startFakeApi();
    api.menusBody = { total: 2, page: 1, pageSize: 12 };
    const storefront = await startStorefront({ apiOrigin: api.origin });

    const page = await get(`${storefront.origin}/menus`);

    expect(page.text).toBe(BUILD_TIME_PAGE);
    // React could not render the screen (a TypeError reading the missing list): nothing sent.
    expect(storefront.fallbacks.map((f) => f.reason)).toEqual([
      expect.stringMatching(/^TypeError/),
    ]);
  });

  it('requests arriving together share one render and one set of API requests', async () => {
    const api = await startFakeApi();
    api.delayMs = 50;
    const storefront = await startStorefront({ apiOrigin: api.origin });

    const pages = await Promise.all(
      Array.from({ length: 5 }, () => get(`${storefront.origin}/menus`)),
    );

    expect(pages.map((p) => p.status)).toEqual([200, 200, 200, 200, 200]);
    expect(new Set(pages.map((p) => p.text)).size).toBe(1);
    expect(api.requests).toHaveLength(2);
  });

  it('renders at most MAX_RENDERING different addresses at once; any more get the build-time page', async () => {
    const api = await startFakeApi();
    api.delayMs = 300;
    // Far beyond the API's 300 ms: on a busy machine the first renders, each holding the event
    // loop, made the last answers miss the default 500 ms, which is not what this test is about.
    const storefront = await startStorefront({ apiOrigin: api.origin, timeoutMs: 10_000 });

    const pages = await Promise.all(
      Array.from({ length: MAX_RENDERING + 2 }, (_, i) =>
        get(`${storefront.origin}/menus?page=${i + 1}`),
      ),
    );

    expect(pages.filter(rendered)).toHaveLength(MAX_RENDERING);
    expect(pages.filter((p) => p.text === BUILD_TIME_PAGE)).toHaveLength(2);
    expect(api.requests).toHaveLength(MAX_RENDERING * 2);
    expect(storefront.fallbacks.map((f) => f.reason)).toEqual([
      expect.stringMatching(/being rendered/),
      expect.stringMatching(/being rendered/),
    ]);
  });

  it('a render is reused for two seconds, then the API is asked again (a chef’s edit shows)', async () => {
    const api = await startFakeApi();
    let clock = 1_000_000;
    const storefront = await startStorefront({ apiOrigin: api.origin, now: () => clock });

    await get(`${storefront.origin}/menus`);
    clock += 1999;
    await get(`${storefront.origin}/menus`);
    expect(api.requests).toHaveLength(2);

    api.menus = [{ ...summerMenu, name: 'Late Summer Garden' }];
    clock += 1;
    const edited = await get(`${storefront.origin}/menus`);
    expect(api.requests).toHaveLength(4);
    expect(edited.text).toContain('Late Summer Garden');
  });

  it('a failure is reused too: a hanging API does not hold every visitor for its timeout', async () => {
    const api = await startFakeApi();
    api.delayMs = 5000;
    let clock = 0;
    const storefront = await startStorefront({
      apiOrigin: api.origin,
      timeoutMs: 1000,
      now: () => clock,
    });

    await get(`${storefront.origin}/menus`);
    clock += 1000;
    const again = await get(`${storefront.origin}/menus`);

    expect(again.text).toBe(BUILD_TIME_PAGE);
    // Half the timeout: a busy machine took 100 ms to send the build-time page.
    expect(again.ms).toBeLessThan(500);
    expect(api.requests).toHaveLength(2);
  });

  it('answers 304 to a browser that has the same page, gzip to one that accepts it, headers to HEAD', async () => {
    const api = await startFakeApi();
    let clock = 0;
    const storefront = await startStorefront({ apiOrigin: api.origin, now: () => clock });
    const page = await get(`${storefront.origin}/menus`);
    // Weak (RFC 9110, 8.8.1): the same tag whether the page is sent gzipped or not.
    const etag = String(page.headers.etag);
    expect(etag).toMatch(/^W\/".+"$/);

    // A browser revalidates with the tag it was given (RFC 9110, 13.1.2).
    const unchanged = await get(`${storefront.origin}/menus`, { 'if-none-match': etag });
    expect(unchanged.status).toBe(304);
    expect(unchanged.body).toHaveLength(0);

    const gzipped = await get(`${storefront.origin}/menus`, { 'accept-encoding': 'gzip, br' });
    expect(gzipped.headers['content-encoding']).toBe('gzip');
    expect(gzipped.headers.vary).toBe('Accept-Encoding');
    expect(gzipped.headers.etag).toBe(etag);
    expect(gunzipSync(gzipped.body).toString('utf8')).toBe(page.text);
    expect(gzipped.body.length).toBeLessThan(page.body.length / 3);

    const head = await get(`${storefront.origin}/menus`, {}, 'HEAD');
    expect(head.status).toBe(200);
    expect(head.body).toHaveLength(0);
    expect(head.headers.etag).toBe(etag);
    expect(head.headers['content-type']).toBe(page.headers['content-type']);

    // Once the render is no longer reused, a chef's edit is a new page: the old tag gets it whole.
    api.menus = [{ ...summerMenu, name: 'Late Summer Garden' }];
    clock += 2000;
    const changed = await get(`${storefront.origin}/menus`, { 'if-none-match': etag });
    expect(changed.status).toBe(200);
    expect(changed.text).toContain('Late Summer Garden');
    expect(changed.headers.etag).not.toBe(etag);
  });

  it('other addresses, other methods and requests that are not page loads pass through to Vite', async () => {
    const api = await startFakeApi();
    const storefront = await startStorefront({ apiOrigin: api.origin });

    const passed = await Promise.all([
      get(`${storefront.origin}/`),
      get(`${storefront.origin}/dates`),
      get(`${storefront.origin}/menus/`),
      get(`${storefront.origin}/menus.html`),
      get(`${storefront.origin}//menus`),
      get(`${storefront.origin}/menus`, { accept: 'application/json' }),
      get(`${storefront.origin}/menus`, {}, 'POST'),
    ]);

    // Vite's own answers: its HTML fallback's pages, and 404 to what is not a page load.
    expect(passed.map((answer) => [answer.status, answer.text])).toEqual([
      [200, BUILD_TIME_HOME],
      [200, BUILD_TIME_HOME],
      [200, BUILD_TIME_HOME],
      [200, BUILD_TIME_PAGE],
      [200, BUILD_TIME_PAGE],
      [404, ''],
      [404, ''],
    ]);
    expect(api.requests).toEqual([]);
  });
});

describe('warming up at start', () => {
  it('renders each page rendered per request once for nobody: nothing kept, nothing logged', async () => {
    const api = await startFakeApi();
    const storefront = await startStorefront({ apiOrigin: api.origin });

    for (const { path } of prerender.PREBUILT_PAGES) await storefront.middleware.warm(path);
    expect(api.requests.map((r) => r.url).sort()).toEqual([
      '/api/menus?page=1&pageSize=12',
      '/api/studio',
    ]);
    const page = await get(`${storefront.origin}/menus`);

    expect(page.text).toContain(summerMenu.name);
    expect(api.requests).toHaveLength(4);
    expect(storefront.fallbacks).toEqual([]);
  });

  it('with the API not started yet, warms up without the data and says nothing', async () => {
    const storefront = await startStorefront({ apiOrigin: await closedPort() });

    await expect(storefront.middleware.warm('/menus')).resolves.toBeUndefined();
    expect(storefront.fallbacks).toEqual([]);
  });
});

describe('the render itself', () => {
  it('gives the same markup every time: no state (styles, cache) carries from one render to the next', async () => {
    const answers = [
      { queryKey: ['studio', 'card'], data: studioCard },
      {
        queryKey: ['menus', 'list', { page: 1, pageSize: 12 }],
        data: menusAnswer([summerMenu, orchardMenu]),
      },
    ];
    const first = await prerender.render('/menus', answers);
    await prerender.render('/', []);
    const again = await prerender.render('/menus', answers);

    expect(again).toBe(first);
    // Emotion writes each element's styles beside it when rendering outside a browser.
    expect(first).toContain('<style data-emotion=');
  });

  it('knows what Menus reads, and renders no other page per request', () => {
    const at = (path: string) => prerender.firstScreenQueries(new URL(path, 'http://localhost'));
    expect(at('/menus?page=3')?.map((q) => q.path)).toEqual([
      '/studio',
      '/menus?page=3&pageSize=12',
    ]);
    // Read leniently, as the screen reads it (lib/page.ts): not a page number → page 1.
    expect(at('/menus?page=abc')?.[1]?.queryKey).toEqual([
      'menus',
      'list',
      { page: 1, pageSize: 12 },
    ]);
    expect(at('/')).toBeNull();
    expect(at('/menus/menu-summer')).toBeNull();
    expect(at('/how-booking-works')).toBeNull();
  });
});
