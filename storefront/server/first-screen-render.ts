// The first screen with its data, rendered per request by the preview server (`vite preview`,
// which serves the built storefront in the demo, the bench and the browser tests): `GET /menus`
// (with `?page=`) is answered with the HTML the browser would end up with, the cards and the first
// photo's <img> included, so the photo loads and paints before any script has run; React then
// takes the same markup over with the same data (start-app.tsx). Which pages, and why only Menus:
// firstScreenQueries in src/prerender.tsx.
//
// Only public data is ever rendered: the API's public GETs, asked for without the visitor's
// cookies or Authorization. When the API is slow, down or answers an error, the build-time page
// (dist/menus.html: the loading state, no data) is served as before.
//
// Only the render is ours. The page is sent as the preview server sends its built HTML (Vite's
// `send`: weak ETag, 304, `Cache-Control: no-cache`, HEAD), and Vite's compression, which gzips
// every answer of the middlewares after it, gzips it.
import { existsSync, readFileSync } from 'node:fs';
import type { IncomingMessage, OutgoingHttpHeaders } from 'node:http';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { send, type Connect, type Plugin, type ProxyOptions } from 'vite';
import type {
  API_BASE_PATH,
  FirstScreenAnswer,
  FirstScreenQuery,
  firstScreenQueries,
  PREBUILT_PAGES,
  renderDocument,
} from '../src/prerender';

/** How long the API has to answer all of a page's GETs before the build-time page is sent. */
export const API_TIMEOUT_MS = 500;

/**
 * How long a rendered page (or a failure to render it) is reused for the same address: requests
 * arriving together share one render and one set of API requests, and a chef's edit shows on the
 * next load two seconds later at most.
 */
export const RENDER_KEPT_MS = 2000;

/** Addresses kept at once (each address is one page of menus). */
const MAX_KEPT = 50;

/**
 * Different addresses being rendered at once, at most: any more are sent the build-time page, so
 * that a flood of made-up addresses (`?page=9999`, `?x=1`, …) costs the API and the render little.
 */
export const MAX_RENDERING = 4;

/** What the SSR bundle of src/prerender.tsx (server/dist/prerender.js) gives this server. */
export interface FirstScreenRenderer {
  API_BASE_PATH: typeof API_BASE_PATH;
  PREBUILT_PAGES: typeof PREBUILT_PAGES;
  firstScreenQueries: typeof firstScreenQueries;
  renderDocument: typeof renderDocument;
}

export interface FirstScreenOptions {
  renderer: FirstScreenRenderer;
  /** Vite's built index.html, before any page was rendered into it. */
  template: string;
  /** Where the API listens (the preview server's proxy target), e.g. `http://127.0.0.1:3000`. */
  apiOrigin: string;
  timeoutMs?: number;
  keptMs?: number;
  /** Headers every answer of the preview server carries (`preview.headers`). */
  headers?: OutgoingHttpHeaders;
  /** Told why a page was sent as built rather than rendered with its data. */
  onFallback?: (url: string, reason: unknown) => void;
  now?: () => number;
}

export interface FirstScreenMiddleware extends Connect.NextHandleFunction {
  /**
   * Renders the page at `url` once for nobody (kept for nobody, never logged), so that the first
   * visitor does not wait for the render's code to load and warm up: about a second on this
   * machine, against tens of milliseconds once warm.
   */
  warm(url: string): Promise<void>;
}

/**
 * Connect middleware answering the addresses of the pages rendered per request with the page and
 * its data, or passing them on (`next()`) to the static files when that cannot be done in time.
 */
export function firstScreenMiddleware({
  renderer,
  template,
  apiOrigin,
  timeoutMs = API_TIMEOUT_MS,
  keptMs = RENDER_KEPT_MS,
  headers = {},
  onFallback = () => undefined,
  now = Date.now,
}: FirstScreenOptions): FirstScreenMiddleware {
  const kept = new Map<string, { at: number; page: Promise<string | null> }>();
  let rendering = 0;

  async function ask(query: FirstScreenQuery, signal: AbortSignal): Promise<FirstScreenAnswer> {
    const path = `${renderer.API_BASE_PATH}${query.path}`;
    // Public data only: nothing of the visitor's request (cookies, Authorization) goes along.
    const res = await fetch(new URL(path, apiOrigin), {
      headers: { accept: 'application/json' },
      redirect: 'error',
      signal,
    });
    if (!res.ok) throw new Error(`GET ${path} answered ${res.status}`);
    return { queryKey: query.queryKey, data: await res.json() };
  }

  function answersTo(queries: FirstScreenQuery[]): Promise<FirstScreenAnswer[]> {
    const signal = AbortSignal.timeout(timeoutMs);
    return Promise.all(queries.map((query) => ask(query, signal)));
  }

  async function render(url: string, queries: FirstScreenQuery[]): Promise<string | null> {
    try {
      const answers = await answersTo(queries);
      return (await renderer.renderDocument(template, url, answers)).html;
    } catch (error) {
      onFallback(url, error);
      return null;
    }
  }

  function pageFor(url: string, queries: FirstScreenQuery[]): Promise<string | null> {
    const at = now();
    for (const [key, entry] of kept) if (at - entry.at >= keptMs) kept.delete(key);
    const hit = kept.get(url);
    if (hit) return hit.page;
    if (rendering >= MAX_RENDERING) {
      onFallback(url, new Error(`${rendering} other pages are being rendered`));
      return Promise.resolve(null);
    }
    rendering += 1;
    const page = render(url, queries).finally(() => {
      rendering -= 1;
    });
    kept.set(url, { at, page });
    if (kept.size > MAX_KEPT) kept.delete(kept.keys().next().value!);
    return page;
  }

  const handle: Connect.NextHandleFunction = (req, res, next) => {
    // As asked for: Vite's HTML fallback, before this middleware, has rewritten req.url
    // (`/menus?page=2` to `/menus.html`).
    const address = req.originalUrl ?? req.url ?? '';
    if (
      (req.method !== 'GET' && req.method !== 'HEAD') ||
      !acceptsHtml(req) ||
      !address.startsWith('/') ||
      address.startsWith('//')
    ) {
      return next();
    }
    const url = new URL(address, 'http://localhost');
    const queries = renderer.firstScreenQueries(url);
    if (!queries) return next();
    pageFor(url.pathname + url.search, queries).then(
      (page) => {
        if (!page) return next();
        // Vite's compression answers gzip or not by Accept-Encoding but does not say so; a cache
        // between here and the browser must know (RFC 9110, 12.5.5).
        res.setHeader('Vary', 'Accept-Encoding');
        // `Cache-Control: no-cache` (send's default): asked for again on every visit, 304 while
        // unchanged, as the page holds the chef's current menus and this build's script names.
        send(req, res, page, 'text/html; charset=utf-8', { headers });
      },
      () => next(),
    );
  };

  async function warm(url: string): Promise<void> {
    const queries = renderer.firstScreenQueries(new URL(url, 'http://localhost'));
    if (!queries) return;
    // Without the API (not started yet, say), the render without data warms most of it.
    const answers = await answersTo(queries).catch(() => []);
    await renderer.renderDocument(template, url, answers).catch(() => undefined);
  }

  return Object.assign(handle, { warm });
}

/** As Vite's own HTML fallback decides: a page load, not a request for data or a file. */
function acceptsHtml(req: IncomingMessage): boolean {
  const accept = req.headers.accept;
  return !accept || accept.includes('text/html') || accept.includes('*/*');
}

/** An error's message, with its cause's (fetch says "fetch failed", its cause says why). */
function reasonOf(reason: unknown): string {
  if (!(reason instanceof Error)) return String(reason);
  return reason.cause instanceof Error
    ? `${reason.message}: ${reason.cause.message}`
    : reason.message;
}

function proxyTarget(proxy: string | ProxyOptions | undefined): string | undefined {
  if (typeof proxy === 'string') return proxy;
  return typeof proxy?.target === 'string' ? proxy.target : undefined;
}

/**
 * The Vite plugin: in `vite preview` only (the dev server renders in the browser, from source).
 * It needs what `npm run build` leaves in server/dist (scripts/prerender.mjs); without it, or
 * without an `/api` proxy, the preview server serves the build-time pages as before.
 */
export function firstScreenRender(): Plugin {
  return {
    name: 'nappe:first-screen-render',
    async configurePreviewServer(server) {
      const { config } = server;
      const logger = config.logger;
      const serverDist = join(config.root, 'server', 'dist');
      const bundle = join(serverDist, 'prerender.js');
      const templateFile = join(serverDist, 'template.html');
      const skip = (why: string) =>
        logger.warn(`First screens are served as built, without their data: ${why}.`);
      if (!existsSync(bundle) || !existsSync(templateFile)) {
        return skip('server/dist is missing (npm run build makes it)');
      }
      const template = readFileSync(templateFile, 'utf8');
      const entry = template.match(/<script type="module"[^>]* src="\/([^"]+)"/)?.[1];
      if (!entry || !existsSync(join(config.root, config.build.outDir, entry))) {
        return skip('server/dist is not from the same build as dist/ (run npm run build)');
      }
      const renderer = (await import(pathToFileURL(bundle).href)) as FirstScreenRenderer;
      const apiOrigin = proxyTarget(config.preview.proxy?.[renderer.API_BASE_PATH]);
      if (!apiOrigin) return skip(`no proxy for ${renderer.API_BASE_PATH}`);
      const middleware = firstScreenMiddleware({
        renderer,
        template,
        apiOrigin,
        headers: config.preview.headers,
        onFallback: (url, reason) =>
          logger.warn(`${url} served as built, without its data: ${reasonOf(reason)}`, {
            timestamp: true,
          }),
      });
      server.httpServer.once('listening', () => {
        void (async () => {
          for (const page of renderer.PREBUILT_PAGES) await middleware.warm(page.path);
        })();
      });
      // Returned, it is added after Vite's own middlewares (proxy, compression, static files, HTML
      // fallback), so that its compression carries the page; before Vite's index.html, which
      // sends the build-time page when this middleware passes the request on.
      return () => server.middlewares.use(middleware);
    },
  };
}
