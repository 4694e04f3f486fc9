// Storefront page timing in headless Chromium under 4× CPU throttling and a slow network, against
// a static reference page served the same way (another `vite preview`, gzip on, same machine).
// LCP, CLS and one interaction are read in the page with PerformanceObserver.
import { spawn } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import { ROOT } from '../lib/system.mjs';
import { fetchIdempotent, median, withTimeout } from './stats.mjs';

/**
 * Lighthouse's mobile "Slow 4G" figures (its default mobile throttling): 150 ms round trip,
 * 1.6 Mbps down, 750 kbps up, with a 4× CPU slowdown. Applied here with CDP as they are: every
 * request waits 150 ms and shares the bandwidth. (Lighthouse's own DevTools throttling scales
 * the latency by 3.75 and the bandwidth by 0.9 to stand for connection set-up; not done here.)
 */
export const THROTTLING = {
  name: 'Slow 4G (Lighthouse mobile figures)',
  latencyMs: 150,
  downloadKbps: 1.6 * 1024,
  uploadKbps: 750,
  cpuSlowdown: 4,
};

/** Lighthouse's mobile screen (Moto G Power): 412 × 823 CSS px at 1.75 device pixels per px. */
const SCREEN = { viewport: { width: 412, height: 823 }, deviceScaleFactor: 1.75 };

export const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/**
 * Runs in the page before any of its scripts: records LCP candidates, layout shifts without
 * recent input, paint timings and event timings (interactions) into `globalThis.__nappeVitals`.
 * Serialised by Playwright, so it uses nothing from this module.
 */
export function vitalsObserver() {
  const g = /** @type {any} */ (globalThis);
  const vitals = {
    lcp: /** @type {any[]} */ ([]),
    shifts: /** @type {any[]} */ ([]),
    events: /** @type {any[]} */ ([]),
    fcp: /** @type {number | null} */ (null),
  };
  g.__nappeVitals = vitals;
  /** @param {any} el @param {string} url */
  const describe = (el, url) => {
    if (!el) return url || '(removed element)';
    const tag = String(el.tagName).toLowerCase();
    if (tag === 'img')
      return `img ${String(url || el.currentSrc || '')
        .split('/')
        .pop()}`;
    const text = String(el.textContent || '')
      .trim()
      .replace(/\s+/g, ' ');
    return `${tag} “${text.length > 40 ? `${text.slice(0, 40)}…` : text}”`;
  };
  /** @param {string} type @param {(entry: any) => void} record @param {object} [extra] */
  const watch = (type, record, extra = {}) => {
    try {
      new g.PerformanceObserver((/** @type {any} */ list) =>
        list.getEntries().forEach(record),
      ).observe({
        type,
        buffered: true,
        ...extra,
      });
    } catch {
      // entry type not supported: the figure stays empty
    }
  };
  watch('largest-contentful-paint', (e) =>
    vitals.lcp.push({ startTime: e.startTime, size: e.size, element: describe(e.element, e.url) }),
  );
  watch('layout-shift', (e) => {
    if (!e.hadRecentInput) vitals.shifts.push({ startTime: e.startTime, value: e.value });
  });
  watch('paint', (e) => {
    if (e.name === 'first-contentful-paint') vitals.fcp = e.startTime;
  });
  const event = (/** @type {any} */ e) =>
    vitals.events.push({
      type: e.entryType,
      name: e.name,
      interactionId: e.interactionId ?? 0,
      duration: e.duration,
    });
  watch('event', (e) => e.interactionId && event(e), { durationThreshold: 16 });
  watch('first-input', event);
}

/**
 * Cumulative Layout Shift as Chrome defines it since 2021: the largest session window of
 * layout shifts (shifts less than 1 s apart, a window at most 5 s long), shifts that follow
 * recent input left out (web.dev/articles/cls, "What is CLS?" and "Session windows").
 * @param {readonly { startTime: number, value: number }[]} shifts
 */
export function clsOf(shifts) {
  let max = 0;
  let current = 0;
  let first = 0;
  let last = 0;
  for (const s of [...shifts].sort((a, b) => a.startTime - b.startTime)) {
    if (current > 0 && s.startTime - last < 1000 && s.startTime - first < 5000) {
      current += s.value;
    } else {
      current = s.value;
      first = s.startTime;
    }
    last = s.startTime;
    max = Math.max(max, current);
  }
  return max;
}

/**
 * The slowest interaction's duration, as INP reads one interaction: the longest event entry
 * (input delay + processing + time to the next paint) among the entries of each interaction,
 * `first-input` included (it is reported even under the 16 ms event-timing threshold).
 * Null when no entry arrived (every event under 16 ms and no first-input entry).
 * @param {readonly { duration: number }[]} events
 */
export function interactionOf(events) {
  return events.length ? Math.max(...events.map((e) => e.duration)) : null;
}

/**
 * @typedef {{ name: string, url: string, target: (page: import('playwright-core').Page) => import('playwright-core').Locator, interaction: string, after?: (page: import('playwright-core').Page) => Promise<unknown> }} PageCase
 */

/** A page is quiet after this long with no request in flight and no new performance entry. */
const QUIET_MS = 3000;
/** …or, at the latest, this long after the load event (then the run is marked unsettled). */
const SETTLE_MAX_MS = 45_000;

/**
 * Waits until the page has been quiet for QUIET_MS: no request in flight or started, and no new
 * LCP, layout-shift, event or resource entry. Polling runs in the page, so a busy main thread
 * (the throttled CPU rendering what the last response brought) also counts as activity.
 * `networkidle` is not enough: a single-page app often renders for seconds after its scripts
 * arrive, then asks the API for data.
 * @param {import('playwright-core').Page} page
 * @param {{ inFlight: number, lastActivity: number }} network updated by the page's request events
 * @returns {Promise<boolean>} whether the page settled before SETTLE_MAX_MS
 */
async function waitUntilQuiet(page, network) {
  const deadline = Date.now() + SETTLE_MAX_MS;
  let lastCount = -1;
  for (;;) {
    const count = await page.evaluate(() => {
      const g = /** @type {any} */ (globalThis);
      const v = g.__nappeVitals;
      return v.lcp.length + v.shifts.length + v.events.length + g.performance.getEntries().length;
    });
    if (count !== lastCount) {
      lastCount = count;
      network.lastActivity = Date.now();
    }
    const idle = Date.now() - network.lastActivity;
    if (network.inFlight <= 0 && idle >= QUIET_MS) return true;
    if (Date.now() > deadline) return false;
    await page.waitForTimeout(250);
  }
}

/**
 * One cold load of `pageCase` in a fresh context (empty cache), throttled, then one click.
 * @param {import('playwright-core').Browser} browser
 * @param {PageCase} pageCase
 */
async function measureOnce(browser, pageCase) {
  const context = await browser.newContext(SCREEN);
  try {
    const page = await context.newPage();
    page.setDefaultTimeout(30_000);
    const network = { inFlight: 0, lastActivity: Date.now() };
    const started = () => {
      network.inFlight += 1;
      network.lastActivity = Date.now();
    };
    const ended = () => {
      network.inFlight -= 1;
      network.lastActivity = Date.now();
    };
    page.on('request', started);
    page.on('requestfinished', ended);
    page.on('requestfailed', ended);
    const cdp = await context.newCDPSession(page);
    await cdp.send('Network.enable');
    await cdp.send('Network.emulateNetworkConditions', {
      offline: false,
      latency: THROTTLING.latencyMs,
      downloadThroughput: (THROTTLING.downloadKbps * 1024) / 8,
      uploadThroughput: (THROTTLING.uploadKbps * 1024) / 8,
    });
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: THROTTLING.cpuSlowdown });
    await page.addInitScript(vitalsObserver);
    await page.goto(pageCase.url, { waitUntil: 'load', timeout: 60_000 });
    const target = pageCase.target(page);
    await target.waitFor({ state: 'visible' });
    // LCP and CLS are read once the page is quiet (its data arrived and was rendered).
    const settled = await waitUntilQuiet(page, network);
    /** @type {() => any} */
    const read = () => /** @type {any} */ (globalThis).__nappeVitals;
    const loaded = await page.evaluate(read);
    await target.click();
    await pageCase.after?.(page);
    await waitUntilQuiet(page, network);
    const done = await page.evaluate(read);
    const lcp = loaded.lcp.at(-1);
    return {
      settled,
      lcpMs: lcp ? lcp.startTime : null,
      lcpElement: lcp ? String(lcp.element) : '(none)',
      fcpMs: loaded.fcp,
      cls: clsOf(loaded.shifts),
      interactionMs: interactionOf(done.events),
    };
  } finally {
    await context.close();
  }
}

/**
 * Starts `vite preview` for `root` on `port` (loopback) and waits for it to answer.
 * @param {{ cwd: string, port: number, env?: Record<string, string>, args?: string[] }} options
 */
async function startPreview({ cwd, port, env = {}, args = [] }) {
  const vite = join(ROOT, 'node_modules', 'vite', 'bin', 'vite.js');
  const child = spawn(
    process.execPath,
    [vite, 'preview', ...args, '--port', String(port), '--strictPort', '--host', '127.0.0.1'],
    { cwd, env: { ...process.env, NODE_ENV: 'production', ...env }, stdio: 'ignore' },
  );
  const exited = new Promise((resolve) => child.once('exit', resolve));
  const deadline = Date.now() + 30_000;
  for (;;) {
    try {
      const res = await fetch(`http://127.0.0.1:${port}/`, { signal: AbortSignal.timeout(2000) });
      if (res.ok) break;
    } catch {
      // not yet
    }
    if (child.exitCode !== null || Date.now() > deadline) {
      child.kill('SIGTERM');
      throw new Error(`vite preview in ${cwd} did not answer on port ${port}`);
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  return {
    stop: async () => {
      child.kill('SIGTERM');
      await exited;
    },
  };
}

/**
 * The static reference page: a heading, a paragraph and one image — the first menu's photo,
 * the same WebP files and `srcset` the storefront shows — in plain HTML with no script.
 * @param {string} dir written to `dir/dist`
 * @param {string} api
 */
async function writeReferencePage(dir, api) {
  const res = await fetchIdempotent(`${api}/menus`, { signal: AbortSignal.timeout(10_000) });
  const menus =
    /** @type {{ items: { name: string, photos: { url: string, thumbnailUrl: string, width: number, height: number }[] }[] }} */ (
      await res.json()
    );
  const menu = menus.items.find((m) => m.photos.length > 0);
  const photo = menu?.photos[0];
  if (!menu || !photo) throw new Error('no menu photo for the reference page');
  const dist = join(dir, 'dist');
  mkdirSync(dist, { recursive: true });
  const origin = new URL(api).origin;
  for (const [url, file] of [
    [photo.url, 'photo-large.webp'],
    [photo.thumbnailUrl, 'photo-small.webp'],
  ]) {
    const image = await fetchIdempotent(`${origin}${url}`, {
      signal: AbortSignal.timeout(10_000),
    });
    if (!image.ok) throw new Error(`GET ${url} answered ${image.status}`);
    writeFileSync(join(dist, file), Buffer.from(await image.arrayBuffer()));
  }
  writeFileSync(
    join(dist, 'index.html'),
    `<!doctype html>
<html lang="en">
  <head>
    <meta charset="utf-8" />
    <meta name="viewport" content="width=device-width, initial-scale=1" />
    <title>Reference page</title>
    <style>
      body { font-family: system-ui, sans-serif; max-width: 60rem; margin: 0 auto; padding: 1rem; }
      img { display: block; width: 100%; height: auto; }
    </style>
  </head>
  <body>
    <h1>Plated desserts for the evenings that matter</h1>
    <p>A plain page with a heading, a paragraph and one photo, served by the same static server as the storefront: the floor for any page on this machine and network.</p>
    <img src="/photo-large.webp" srcset="/photo-small.webp 400w, /photo-large.webp ${photo.width}w" sizes="100vw" width="${photo.width}" height="${photo.height}" alt="${menu.name.replace(/[<>&"]/g, '')}" fetchpriority="high" />
  </body>
</html>
`,
  );
}

/**
 * @param {{ api: string, apiUrl: string, storefrontPort: number, referencePort: number, runs: number, dataDir: string }} options
 * `api`: the API base (…/api) for the reference photo; `apiUrl`: the API origin the storefront's
 * preview proxies `/api` to.
 */
export async function measurePages({ api, apiUrl, storefrontPort, referencePort, runs, dataDir }) {
  const referenceDir = join(dataDir, 'reference-page');
  await writeReferencePage(referenceDir, api);
  const storefront = await startPreview({
    cwd: join(ROOT, 'storefront'),
    port: storefrontPort,
    env: { API_URL: apiUrl },
  });
  const reference = await startPreview({ cwd: referenceDir, port: referencePort });
  const browser = await chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: CHROMIUM_ARGS,
    timeout: 60_000,
  });
  const base = `http://127.0.0.1:${storefrontPort}`;
  /** @type {PageCase[]} */
  const cases = [
    {
      name: 'static reference page',
      url: `http://127.0.0.1:${referencePort}/`,
      target: (page) => page.locator('p').first(),
      interaction: 'click on the paragraph',
    },
    {
      name: 'storefront Home',
      url: `${base}/`,
      target: (page) => page.getByRole('link', { name: 'See the menus' }),
      interaction: 'click “See the menus”',
      after: (page) => page.waitForURL(/\/menus$/),
    },
    {
      name: 'storefront Menus',
      url: `${base}/menus`,
      target: (page) => page.locator('main a[href^="/menus/"]').first(),
      interaction: 'click the first menu’s name',
      after: (page) => page.waitForURL(/\/menus\/[^/]+$/),
    },
  ];
  try {
    const results = [];
    for (const pageCase of cases) {
      /** @type {Awaited<ReturnType<typeof measureOnce>>[]} */
      const samples = [];
      for (let i = 0; i < runs; i += 1) {
        samples.push(
          await withTimeout(
            measureOnce(browser, pageCase),
            180_000,
            `${pageCase.name}, run ${i + 1}`,
          ),
        );
      }
      const numbers = (/** @type {(s: (typeof samples)[number]) => number | null} */ pick) =>
        samples.map(pick).filter((v) => v !== null);
      const lcps = numbers((s) => s.lcpMs);
      const interactions = numbers((s) => s.interactionMs);
      results.push({
        name: pageCase.name,
        interaction: pageCase.interaction,
        runs,
        lcpMs: median(lcps),
        lcpElement: samples.at(-1)?.lcpElement ?? '(none)',
        fcpMs: median(numbers((s) => s.fcpMs)),
        cls: median(samples.map((s) => s.cls)),
        /** Median of the runs that reported an event entry; null when none did (all < 16 ms). */
        interactionMs: interactions.length ? median(interactions) : null,
        interactionRuns: interactions.length,
        /** Runs that were still busy SETTLE_MAX_MS after their load event. */
        unsettledRuns: samples.filter((s) => !s.settled).length,
      });
    }
    return { browser: `Chromium ${browser.version()}`, results };
  } finally {
    await browser.close();
    await storefront.stop();
    await reference.stop();
  }
}
