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
import { createHash } from 'node:crypto';
import { existsSync, readFileSync } from 'node:fs';
import type { IncomingMessage, OutgoingHttpHeaders, ServerResponse } from 'node:http';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { gzipSync } from 'node:zlib';
import type { Plugin, ProxyOptions } from 'vite';
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

interface RenderedPage {
  body: Buffer;
  gzip: Buffer;
  etag: string;
}

type Middleware = (req: IncomingMessage, res: ServerResponse, next: () => void) => void;

export interface FirstScreenMiddleware extends Middleware {
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
  const kept = new Map<string, { at: number; page: Promise<RenderedPage | null> }>();
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

  async function render(url: string, queries: FirstScreenQuery[]): Promise<RenderedPage | null> {
    try {
      const answers = await answersTo(queries);
      const { html } = await renderer.renderDocument(template, url, answers);
      const body = Buffer.from(html);
      const hash = createHash('sha256').update(body).digest('base64url').slice(0, 27);
      // Weak: the same page whether sent gzipped or not (RFC 9110, 8.8.3).
      return { body, gzip: gzipSync(body), etag: `W/"${hash}"` };
    } catch (error) {
      onFallback(url, error);
      return null;
    }
  }

  function pageFor(url: string, queries: FirstScreenQuery[]): Promise<RenderedPage | null> {
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

  function send(req: IncomingMessage, res: ServerResponse, page: RenderedPage) {
    for (const [name, value] of Object.entries(headers)) {
      if (value !== undefined) res.setHeader(name, value);
    }
    res.setHeader('Content-Type', 'text/html; charset=utf-8');
    // Asked for again on every visit (answered 304 while unchanged): the page holds the chef's
    // current menus and the names of this build's scripts, so no copy may be used unchecked.
    res.setHeader('Cache-Control', 'no-cache');
    res.setHeader('ETag', page.etag);
    res.setHeader('Vary', 'Accept-Encoding');
    if (matchesEtag(req.headers['if-none-match'], page.etag)) {
      res.statusCode = 304;
      res.end();
      return;
    }
    const gzip = /\bgzip\b/.test(String(req.headers['accept-encoding'] ?? ''));
    const body = gzip ? page.gzip : page.body;
    if (gzip) res.setHeader('Content-Encoding', 'gzip');
    res.setHeader('Content-Length', body.length);
    res.statusCode = 200;
    res.end(req.method === 'HEAD' ? undefined : body);
  }

  const handle: Middleware = (req, res, next) => {
    const address = req.url ?? '';
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
      (page) => (page ? send(req, res, page) : next()),
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

/** If-None-Match by weak comparison (RFC 9110, 13.1.2): `*`, or any listed tag equal to ours. */
function matchesEtag(ifNoneMatch: string | undefined, etag: string): boolean {
  if (!ifNoneMatch) return false;
  const opaque = (tag: string) => tag.trim().replace(/^W\//, '');
  return ifNoneMatch.split(',').some((tag) => tag.trim() === '*' || opaque(tag) === opaque(etag));
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
      server.middlewares.use(middleware);
      server.httpServer.once('listening', () => {
        void (async () => {
          for (const page of renderer.PREBUILT_PAGES) await middleware.warm(page.path);
        })();
      });
    },
  };
}
