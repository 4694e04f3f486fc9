// `npm run bench`: measures side by side in one run and writes docs/benchmarks.md.
// Everything runs on loopback, on this script's own ports (3200–3209, 4200–4209), bounded in
// time; nothing leaves the machine. Rows, in order:
//   HTTP: bare node:http hello, Nest hello, the app's hello, the public menu read;
//   durable order write: the disk's fsync ceiling, SQLite's commit ceiling on the same disk,
//     POST /api/orders through the app (then the database is checked against the 201s);
//   prep plan for 1,000 confirmed orders against reading the same rows with better-sqlite3;
//   initial JavaScript per app;
//   storefront LCP, CLS and interaction in Chromium, throttled, against a static reference page.
// Environment: BENCH_SECONDS (8), BENCH_CONNECTIONS (50), BENCH_ORDER_CONNECTIONS (10),
// BENCH_PLAN_DAYS (30), BENCH_PLAN_RUNS (7), BENCH_PAGE_RUNS (3), NAPPE_SKIP_BUILD=1.
// NAPPE_BENCH_ONLY=pages: only the storefront rows (initial JavaScript, page timing), against the
// same seeded API; the results go to standard output only, docs/benchmarks.md is left as it is.
import { fork, spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { cpus, freemem, loadavg, tmpdir, totalmem, type as osType, release } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import autocannon from 'autocannon';
import * as prettier from 'prettier';
import { measureOrderWrites, UNPAID_PER_CLIENT } from './bench/order-writes.mjs';
import { measurePages, THROTTLING } from './bench/page-vitals.mjs';
import { measurePrepPlan } from './bench/prep-plan.mjs';
import { runJsonScript } from './bench/stats.mjs';
import { assertPortsFree, buildAll, migrateAndSeed, ROOT, systemConfig } from './lib/system.mjs';

const DURATION_S = Number(process.env.BENCH_SECONDS ?? 8);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 50);
const ORDER_CONNECTIONS = Number(process.env.BENCH_ORDER_CONNECTIONS ?? 10);
const PLAN_ORDERS = 1000;
const PLAN_DAYS = Number(process.env.BENCH_PLAN_DAYS ?? 30);
/** The plan's orders start this many days ahead, past every seeded demo booking. */
const PLAN_START_DAYS = 60;
const PLAN_RUNS = Number(process.env.BENCH_PLAN_RUNS ?? 7);
const PAGE_RUNS = Number(process.env.BENCH_PAGE_RUNS ?? 3);
const ONLY = process.env.NAPPE_BENCH_ONLY ?? '';
if (ONLY !== '' && ONLY !== 'pages') {
  throw new Error(`NAPPE_BENCH_ONLY=${ONLY}: the only part that runs alone is "pages"`);
}
/** Only the storefront rows: for working on the pages without the ten minutes of the rest. */
const PAGES_ONLY = ONLY === 'pages';

/** This script's ports; nothing else may listen there (checked before anything starts). */
const PORTS = {
  bare: 3200,
  nest: 3201,
  api: 3202,
  /** Nothing listens on these two: the bench API must never reach a real mail or payment server. */
  noSmtp: 3208,
  noPayments: 3209,
  storefront: 4200,
  reference: 4201,
};

/** Published targets this run is checked against. */
const TARGETS = {
  menuP99Ms: 20, // issue 6: menu read p99 ≤ 20 ms at 50 connections
  lcpMs: 2000, // issue 6: LCP ≤ 2.0 s under throttling
  lcpGoodMs: 2500, // Core Web Vitals "good" (web.dev)
  cls: 0.1, // Core Web Vitals "good" (web.dev)
  inpMs: 200, // Core Web Vitals "good" (web.dev)
  initialJsKiB: { storefront: 150, admin: 250 }, // issue 6
};

/**
 * @param {string} url
 * @param {Partial<import('autocannon').Options>} options
 */
async function load(url, options = {}) {
  const result = await autocannon({
    url,
    connections: CONNECTIONS,
    duration: DURATION_S,
    timeout: 20,
    ...options,
  });
  return {
    rps: result.requests.average,
    p50: result.latency.p50,
    p99: result.latency.p99,
    non2xx: result.non2xx,
    errors: result.errors,
    total: result.requests.total,
  };
}

/**
 * Starts a node script as a child process and waits for it to answer `probe`.
 * @param {string} script
 * @param {Record<string, string>} env
 * @param {string} probe
 */
async function startServer(script, env, probe) {
  const child = fork(script, [], { cwd: ROOT, env: { ...process.env, ...env }, stdio: 'ignore' });
  const deadline = Date.now() + 60_000;
  for (;;) {
    try {
      const res = await fetch(probe, { signal: AbortSignal.timeout(2000) });
      if (res.ok) break;
    } catch {
      // not yet
    }
    if (child.exitCode !== null || Date.now() > deadline) {
      child.kill('SIGTERM');
      throw new Error(`${script} did not answer ${probe}`);
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  return child;
}

/** @param {import('node:child_process').ChildProcess} child */
async function stop(child) {
  if (child.exitCode !== null) return;
  const exited = new Promise((r) => child.once('exit', r));
  child.kill('SIGTERM');
  const timer = setTimeout(() => child.kill('SIGKILL'), 15_000);
  await exited;
  clearTimeout(timer);
}

/** Initial JavaScript of a built app: the entry script plus every modulepreload, gzip. */
function initialJs(/** @type {string} */ app) {
  const dist = join(ROOT, app, 'dist');
  const html = readFileSync(join(dist, 'index.html'), 'utf8');
  const files = [
    ...html.matchAll(/<script[^>]+type="module"[^>]+src="([^"]+)"/g),
    ...html.matchAll(/<link[^>]+rel="modulepreload"[^>]+href="([^"]+)"/g),
  ].map((m) => /** @type {string} */ (m[1]));
  const unique = [...new Set(files)];
  let raw = 0;
  let gzip = 0;
  for (const file of unique) {
    const bytes = readFileSync(join(dist, file.replace(/^\//, '')));
    raw += bytes.length;
    gzip += gzipSync(bytes, { level: 9 }).length;
  }
  return { files: unique.length, rawKiB: raw / 1024, gzipKiB: gzip / 1024 };
}

/** The file system and device holding `dir`, as `df` names them. */
function diskOf(/** @type {string} */ dir) {
  const df = spawnSync('df', ['-T', '-P', dir], { encoding: 'utf8', timeout: 10_000 });
  const [device, type] = (df.stdout ?? '').trim().split('\n').pop()?.split(/\s+/) ?? [];
  return type ? `${type} on ${device}` : 'unknown file system';
}

/** Progress on standard error; the results go to standard output and docs/benchmarks.md. */
const step = (/** @type {string} */ what) =>
  console.error(`bench ${new Date().toISOString().slice(11, 19)}: ${what}`);

const fmt = (/** @type {number} */ n, digits = 0) =>
  Number.isFinite(n)
    ? n.toLocaleString('en-GB', { maximumFractionDigits: digits, minimumFractionDigits: digits })
    : '–';
const pct = (/** @type {number} */ part, /** @type {number} */ whole) =>
  `${fmt((part / whole) * 100)} %`;

/** What the storefront rows need: shared, the API they read from and the storefront itself. */
function buildForPages() {
  for (const workspaces of [['shared'], ['api', 'storefront']]) {
    const args = ['run', 'build', '--silent', ...workspaces.flatMap((w) => ['-w', w])];
    const result = spawnSync('npm', args, { cwd: ROOT, stdio: 'inherit' });
    if (result.status !== 0) throw new Error(`npm ${args.join(' ')} failed`);
  }
}

await assertPortsFree(Object.values(PORTS));
if (process.env.NAPPE_SKIP_BUILD !== '1') {
  if (PAGES_ONLY) buildForPages();
  else buildAll();
}

const startedAt = new Date();
const loadBefore = loadavg();
const dataDir = mkdtempSync(join(tmpdir(), 'nappe-bench-'));
const disk = diskOf(dataDir);
const config = systemConfig({
  ...process.env,
  NAPPE_API_PORT: String(PORTS.api),
  DATABASE_PATH: join(dataDir, 'bench.sqlite'),
});
migrateAndSeed(config);

const apiOrigin = `http://127.0.0.1:${PORTS.api}`;
const api = `${apiOrigin}/api`;
const storefrontOrigins = [
  `http://127.0.0.1:${PORTS.storefront}`,
  `http://localhost:${PORTS.storefront}`,
];

/** Every measured row, one after another; the servers it starts are stopped whatever happens. */
async function measureAll() {
  /** @type {{ name: string, rps: number, p50: number, p99: number, non2xx: number, errors: number, total: number }[]} */
  const http = [];
  step('HTTP hello rows');
  const bare = await startServer(
    'docker-free-scripts/bench/node-hello.mjs',
    { PORT: String(PORTS.bare) },
    `http://127.0.0.1:${PORTS.bare}/`,
  );
  http.push({ name: 'bare node:http hello', ...(await load(`http://127.0.0.1:${PORTS.bare}/`)) });
  await stop(bare);

  const nest = await startServer(
    'docker-free-scripts/bench/nest-hello.mjs',
    { PORT: String(PORTS.nest) },
    `http://127.0.0.1:${PORTS.nest}/hello`,
  );
  http.push({
    name: 'Nest hello (no middleware)',
    ...(await load(`http://127.0.0.1:${PORTS.nest}/hello`)),
  });
  await stop(nest);

  step('disk and SQLite ceilings');
  // The ceilings, in the same directory as the bench database, while nothing else writes.
  const scripts = join(ROOT, 'docker-free-scripts', 'bench');
  const ceiling = { timeoutMs: (DURATION_S * 2 + 60) * 1000, cwd: ROOT };
  /** @type {{ append: Ceiling, overwrite: Ceiling }} */
  const fsync = await runJsonScript(
    join(scripts, 'fsync-ceiling.mjs'),
    [dataDir, String(DURATION_S)],
    ceiling,
  );
  /** @type {Ceiling & { journalMode: string }} */
  const sqlite = await runJsonScript(
    join(scripts, 'sqlite-ceiling.mjs'),
    [dataDir, String(DURATION_S)],
    ceiling,
  );

  return withApi(async () => {
    step('app hello and menu read');
    http.push({
      name: 'app hello: GET /api/health/live through all middleware (a heap check, no database)',
      ...(await load(`${api}/health/live`)),
    });
    http.push({ name: 'public menu read: GET /api/menus', ...(await load(`${api}/menus`)) });

    step('durable order writes');
    // Enough clients that the unpaid-booking cap never refuses a booking: sized from SQLite's
    // ceiling, which the app cannot beat.
    const clients = Math.min(
      400,
      Math.max(
        ORDER_CONNECTIONS,
        Math.ceil((sqlite.perSecond * DURATION_S * 1.25) / UNPAID_PER_CLIENT),
      ),
    );
    const orders = await measureOrderWrites({
      api,
      databasePath: config.databasePath,
      seconds: DURATION_S,
      connections: ORDER_CONNECTIONS,
      clients,
    });

    step(`prep plan: adding ${PLAN_ORDERS} confirmed orders, then timing`);
    const plan = await measurePrepPlan({
      api,
      databasePath: config.databasePath,
      count: PLAN_ORDERS,
      days: PLAN_DAYS,
      startDays: PLAN_START_DAYS,
      runs: PLAN_RUNS,
    });

    const pages = await measureStorefrontPages();
    return { http, fsync, sqlite, orders, plan, pages };
  });
}

function measureStorefrontPages() {
  step(`storefront pages in Chromium, ${PAGE_RUNS} runs each`);
  return measurePages({
    api,
    apiUrl: apiOrigin,
    storefrontPort: PORTS.storefront,
    referencePort: PORTS.reference,
    runs: PAGE_RUNS,
    dataDir,
  });
}

/**
 * Runs `measure` against the app's API on the seeded database, started for it and stopped after
 * whatever happens.
 * @template T
 * @param {() => Promise<T>} measure
 * @returns {Promise<T>}
 */
async function withApi(measure) {
  const server = await startServer(
    'api/dist/main.js',
    {
      NODE_ENV: 'development',
      PORT: String(PORTS.api),
      HOST: '127.0.0.1',
      DATABASE_PATH: config.databasePath,
      LOG_LEVEL: 'warn',
      THROTTLE_LIMIT: '100000000',
      AUTH_THROTTLE_LIMIT: '100000',
      REFRESH_THROTTLE_LIMIT: '100000',
      QUOTE_THROTTLE_LIMIT: '100000',
      MAX_UNPAID_ORDERS_PER_CLIENT: String(UNPAID_PER_CLIENT),
      OUTBOX_WORKER_ENABLED: 'false',
      GUEST_DATA_PURGE_ENABLED: 'false',
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(PORTS.noSmtp),
      STRIPE_API_HOST: '127.0.0.1',
      STRIPE_API_PORT: String(PORTS.noPayments),
      STRIPE_API_PROTOCOL: 'http',
      CORS_ORIGINS: storefrontOrigins.join(','),
      PUBLIC_STOREFRONT_URL: storefrontOrigins[0] ?? '',
    },
    `${api}/health`,
  );
  try {
    return await measure();
  } finally {
    await stop(server);
  }
}

/** @typedef {{ ops: number, seconds: number, perSecond: number, p50: number, p99: number, median: number, max: number }} Ceiling */

/** @type {(app: string) => number} */
const budgetOf = (app) => TARGETS.initialJsKiB[/** @type {'storefront' | 'admin'} */ (app)];

/** @param {Record<string, ReturnType<typeof initialJs>>} bundles */
function initialJsLines(bundles) {
  return [
    '## Initial JavaScript per app (entry + modulepreloads, gzip -9)',
    '',
    '| app | files | raw KiB | gzip KiB | budget KiB | within |',
    '|---|---:|---:|---:|---:|---|',
    ...Object.entries(bundles).map(
      ([app, b]) =>
        `| ${app} | ${b.files} | ${fmt(b.rawKiB, 1)} | ${fmt(b.gzipKiB, 1)} | ${budgetOf(app)} | ${b.gzipKiB <= budgetOf(app) ? 'yes' : '**no**'} |`,
    ),
    '',
  ];
}

/** @param {Awaited<ReturnType<typeof measurePages>>} pages */
function pageLines(pages) {
  const pageRows = pages.results;
  const reference = pageRows[0];
  return [
    '## Storefront pages in Chromium, throttled, against a static reference page',
    '',
    `${pages.browser}, headless, ${THROTTLING.cpuSlowdown}× CPU slowdown (CDP \`Emulation.setCPUThrottlingRate\`) and the network profile ${THROTTLING.name}: ${THROTTLING.latencyMs} ms latency, ${fmt(THROTTLING.downloadKbps / 1024, 1)} Mbps down, ${THROTTLING.uploadKbps} kbps up (CDP \`Network.emulateNetworkConditions\`, added to every request as it stands), 412 × 823 viewport at 1.75×. Both the built storefront and the reference page (a heading, a paragraph and the first menu’s photo, the same WebP files, no script) are served by \`vite preview\` with gzip (NODE_ENV=production; the storefront's Menus is rendered per request with its data by its preview plugin, storefront/server); the storefront’s \`/api\` is proxied to the bench API. Each run is a cold load in a fresh browser context; ${PAGE_RUNS} runs per page, medians. LCP: the last \`largest-contentful-paint\` entry once the page is quiet (3 s with no request in flight and no new performance entry, polled in the page so a busy main thread counts as activity; at most 45 s after the load event); CLS: the largest session window of \`layout-shift\` entries without recent input, up to the interaction; interaction: the longest \`event\` (or \`first-input\`) entry of one click, INP-style (input delay + processing + next paint), one interaction only, so not a field INP.`,
    '',
    '| page | LCP ms | LCP element (last run) | FCP ms | CLS | interaction | interaction ms | LCP vs reference |',
    '|---|---:|---|---:|---:|---|---:|---:|',
    ...pageRows.map(
      (p) =>
        `| ${p.name}${p.unsettledRuns ? ` (${p.unsettledRuns} of ${p.runs} runs not quiet after 45 s)` : ''} | ${fmt(p.lcpMs)} | ${p.lcpElement.replace(/\|/g, '\\|')} | ${fmt(p.fcpMs)} | ${fmt(p.cls, 3)} | ${p.interaction} | ${p.interactionMs === null ? '< 16 (no entry)' : `${fmt(p.interactionMs)}${p.interactionRuns < p.runs ? ` (${p.interactionRuns} of ${p.runs} runs; the others < 16)` : ''}`} | ${reference ? `${fmt(p.lcpMs / reference.lcpMs, 2)} ×` : '–'} |`,
    ),
    '',
    `Targets: LCP ≤ ${fmt(TARGETS.lcpMs / 1000, 1)} s under this throttling (issue 6). The commonly published Core Web Vitals thresholds for "good" (web.dev): LCP ≤ ${fmt(TARGETS.lcpGoodMs / 1000, 1)} s, CLS ≤ ${TARGETS.cls}, INP ≤ ${TARGETS.inpMs} ms.`,
    '',
  ];
}

/**
 * The storefront's targets a run missed: initial JS over budget, then LCP, CLS and interaction.
 * @param {Record<string, ReturnType<typeof initialJs>>} bundles
 * @param {Awaited<ReturnType<typeof measurePages>>} pages
 */
function unmetPageTargets(bundles, pages) {
  /** @type {string[]} */
  const unmet = [];
  for (const [app, b] of Object.entries(bundles)) {
    if (b.gzipKiB > budgetOf(app))
      unmet.push(`${app} initial JS ${fmt(b.gzipKiB, 1)} KiB > ${budgetOf(app)} KiB`);
  }
  const reference = pages.results[0];
  const throttled = `${THROTTLING.cpuSlowdown}× CPU, ${THROTTLING.name}`;
  for (const p of pages.results.slice(1)) {
    if (p.lcpMs > TARGETS.lcpMs) {
      unmet.push(
        `${p.name} LCP ${fmt(p.lcpMs)} ms > ${fmt(TARGETS.lcpMs)} ms under ${throttled} (issue 6)${p.lcpMs > TARGETS.lcpGoodMs ? `, and over the ${fmt(TARGETS.lcpGoodMs)} ms Core Web Vitals "good" threshold` : ''}; the static reference page: ${fmt(reference?.lcpMs ?? Number.NaN)} ms`,
      );
    }
    if (p.cls > TARGETS.cls) {
      unmet.push(`${p.name} CLS ${fmt(p.cls, 3)} > ${TARGETS.cls} (Core Web Vitals "good")`);
    }
    if (p.interactionMs !== null && p.interactionMs > TARGETS.inpMs) {
      unmet.push(
        `${p.name} interaction (${p.interaction}) ${fmt(p.interactionMs)} ms > ${TARGETS.inpMs} ms (INP "good") under ${throttled}`,
      );
    }
  }
  return unmet;
}

if (PAGES_ONLY) {
  /** @type {Awaited<ReturnType<typeof measurePages>>} */
  let pages;
  try {
    pages = await withApi(measureStorefrontPages);
  } finally {
    rmSync(dataDir, { recursive: true, force: true });
  }
  const bundles = { storefront: initialJs('storefront') };
  const unmet = unmetPageTargets(bundles, pages);
  const loadAfter = loadavg();
  const markdown = await prettier.format(
    [
      '# Storefront rows only (NAPPE_BENCH_ONLY=pages; docs/benchmarks.md left as it was)',
      '',
      `Measured on ${startedAt.toISOString().slice(0, 16).replace('T', ' ')} UTC, ${cpus().length} cores; load average ${fmt(loadBefore[0] ?? 0, 1)} at the start, ${fmt(loadAfter[0] ?? 0, 1)} at the end.`,
      '',
      ...initialJsLines(bundles),
      ...pageLines(pages),
      '## Targets not met in this run',
      '',
      ...(unmet.length ? unmet.map((u) => `- ${u}`) : ['- none']),
      '',
    ].join('\n'),
    { ...(await prettier.resolveConfig(join(ROOT, 'docs', 'benchmarks.md'))), parser: 'markdown' },
  );
  console.log(markdown);
  process.exit(0);
}

/** @type {Awaited<ReturnType<typeof measureAll>>} */
let measured;
try {
  measured = await measureAll();
} finally {
  rmSync(dataDir, { recursive: true, force: true });
}
const { http, fsync, sqlite, orders, plan, pages } = measured;

const bundles = { storefront: initialJs('storefront'), admin: initialJs('admin') };

const bareRps = http[0]?.rps ?? 1;
const nestRps = http[1]?.rps ?? 1;
const cpu = cpus()[0]?.model ?? 'unknown CPU';
const git = spawnSync('git', ['rev-parse', '--short', 'HEAD'], {
  cwd: ROOT,
  encoding: 'utf8',
}).stdout.trim();
const loadAfter = loadavg();

// ---------------------------------------------------------------- durable order write
const { append, overwrite } = fsync;
const orderRows = [
  {
    name: '(a) disk: append 4 KiB + fsync(), one writer',
    perSecond: append.perSecond,
    p50: append.p50,
    p99: append.p99,
  },
  {
    name: '(a′) disk: rewrite 4 KiB in place + fdatasync(), one writer',
    perSecond: overwrite.perSecond,
    p50: overwrite.p50,
    p99: overwrite.p99,
  },
  {
    name: `(b) SQLite: one small INSERT per transaction, journal_mode=${sqlite.journalMode}, synchronous=FULL, one writer`,
    perSecond: sqlite.perSecond,
    p50: sqlite.p50,
    p99: sqlite.p99,
  },
  {
    name: `(c) app: POST /api/orders by ${orders.clients} signed-in clients, ${orders.connections} connections, 201s only`,
    perSecond: orders.perSecond,
    p50: orders.p50,
    p99: orders.p99,
  },
];
const otherStatuses = Object.entries(orders.statuses).filter(([s]) => s !== '201');

// ---------------------------------------------------------------- prep plan
const planRatio = plan.plan.medianMs / plan.select.medianMs;

const lines = [
  '# Benchmarks',
  '',
  `Measured by \`npm run bench\` on ${startedAt.toISOString().slice(0, 16).replace('T', ' ')} UTC at commit ${git}.`,
  `Machine: ${cpus().length} × ${cpu}, ${fmt(totalmem() / 2 ** 30, 1)} GiB memory (${fmt(freemem() / 2 ** 30, 1)} GiB free), ${osType()} ${release()}, Node ${process.version}; load average ${fmt(loadBefore[0] ?? 0, 1)} at the start, ${fmt(loadAfter[0] ?? 0, 1)} at the end.`,
  `Data directory: ${disk}. Load: autocannon, one row after another, client and server on the same ${cpus().length} cores over loopback.`,
  '',
  '## HTTP',
  '',
  `autocannon, ${CONNECTIONS} connections for ${DURATION_S} s per row.`,
  '',
  '| what | req/s | p50 ms | p99 ms | non-2xx | errors | vs bare node | vs Nest hello |',
  '|---|---:|---:|---:|---:|---:|---:|---:|',
  ...http.map(
    (r) =>
      `| ${r.name} | ${fmt(r.rps)} | ${fmt(r.p50, 1)} | ${fmt(r.p99, 1)} | ${r.non2xx} | ${r.errors} | ${pct(r.rps, bareRps)} | ${pct(r.rps, nestRps)} |`,
  ),
  '',
  `Target: menu read p99 ≤ ${TARGETS.menuP99Ms} ms at 50 connections.`,
  '',
  '## Durable order write against the disk’s fsync ceiling',
  '',
  `Each row ${DURATION_S} s, in the bench’s data directory (${disk}). (a) and (a′) bound what any durable write on this disk can reach: a commit with synchronous=FULL waits for at least one such flush (SQLite’s WAL grows by appending, then is rewritten in place from its start after a checkpoint). (b) uses the app’s own connection pragmas (\`prepareSqlite\` from api/dist). (c) books the first public menu for its smallest party with one guest requirement, each request with its own Idempotency-Key, dates spread over 2,000 days so that the daily capacity never refuses a booking; every booking is one transaction of several statements (order, guest, consents, audit event) and a reference number.`,
  '',
  '| what | per s | p50 ms | p99 ms | % of (a) | % of (a′) | % of (b) |',
  '|---|---:|---:|---:|---:|---:|---:|',
  ...orderRows.map(
    (r) =>
      `| ${r.name} | ${fmt(r.perSecond)} | ${fmt(r.p50, 1)} | ${fmt(r.p99, 1)} | ${pct(r.perSecond, append.perSecond)} | ${pct(r.perSecond, overwrite.perSecond)} | ${pct(r.perSecond, sqlite.perSecond)} |`,
  ),
  '',
  `Check after the run: orders in the database ${fmt(orders.stored)} = ${fmt(orders.created)} answered 201 + ${orders.cutOff} committed while autocannon was stopping (answer not read); missing ${orders.missing}, duplicates ${orders.duplicates}, unknown ${orders.unknown} — ${orders.ok ? '**consistent**' : '**INCONSISTENT**'}. Other answers: ${otherStatuses.length ? otherStatuses.map(([s, n]) => `${n} × ${s}`).join(', ') : 'none'}; connection errors ${orders.errors}, timeouts ${orders.timeouts}.`,
  '',
  '## Prep plan for 1,000 confirmed orders against reading the same rows',
  '',
  `${fmt(plan.seeded.orders)} confirmed orders (${fmt(plan.seeded.guests)} guest requirements, ${plan.seeded.substitutions} recorded substitutions) over ${PLAN_DAYS} days, ${plan.seeded.from} to ${plan.seeded.to}, written with the app’s entities from api/dist and priced by the shared quote function. The plan: \`GET /api/prep/plan?from&to\` as the chef, one request at a time after one warm-up, time until the whole body is read. The read: better-sqlite3 on the same file, \`SELECT *\` of the same confirmed orders, their guests and their substitutions (the rows the plan reads from the order tables; the catalogue it also reads is not counted).`,
  '',
  '| what | runs | median ms | max ms | response KiB | orders |',
  '|---|---:|---:|---:|---:|---:|',
  `| plan, ${fmt(plan.seeded.orders)} orders over ${PLAN_DAYS} days | ${plan.plan.runs} | ${fmt(plan.plan.medianMs, 1)} | ${fmt(plan.plan.maxMs, 1)} | ${fmt(plan.plan.bytes / 1024, 1)} | ${fmt(plan.plan.orders)} |`,
  `| SELECT the same orders (${fmt(plan.select.orders)}), guests (${fmt(plan.select.guests)}) and substitutions (${plan.select.substitutions}) | ${plan.select.runs} | ${fmt(plan.select.medianMs, 1)} | ${fmt(plan.select.maxMs, 1)} | – | ${fmt(plan.select.orders)} |`,
  `| plan, demo range (${plan.demo.from} to ${plan.demo.to}, the seeded demo studio) | ${plan.demo.runs} | ${fmt(plan.demo.medianMs, 1)} | ${fmt(plan.demo.maxMs, 1)} | ${fmt(plan.demo.bytes / 1024, 1)} | ${fmt(plan.demo.orders)} |`,
  '',
  `The plan takes ${fmt(planRatio, 1)} × the time of the plain read of its order rows (medians).`,
  '',
  ...initialJsLines(bundles),
  ...pageLines(pages),
];

const menuRow = http.find((r) => r.name.startsWith('public menu read'));
/** @type {string[]} */
const unmet = [];
if (menuRow && menuRow.p99 > TARGETS.menuP99Ms) {
  unmet.push(
    `menu read p99 ${fmt(menuRow.p99, 1)} ms > ${TARGETS.menuP99Ms} ms at ${CONNECTIONS} connections (client and server share ${cpus().length} cores)`,
  );
}
if (!orders.ok) {
  unmet.push(
    `orders in the database (${orders.stored}) do not match the 201 answers (${orders.created}; ${orders.cutOff} cut off, ${orders.missing} missing, ${orders.duplicates} duplicates, ${orders.unknown} unknown)`,
  );
}
const fivexx = otherStatuses.filter(([status]) => status.startsWith('5'));
if (fivexx.length > 0) {
  unmet.push(`order writes answered 5xx: ${fivexx.map(([s, n]) => `${n} × ${s}`).join(', ')}`);
}
unmet.push(...unmetPageTargets(bundles, pages));
lines.push(
  '## Targets not met in this run',
  '',
  ...(unmet.length ? unmet.map((u) => `- ${u}`) : ['- none']),
  '',
);

const target = join(ROOT, 'docs', 'benchmarks.md');
const markdown = await prettier.format(lines.join('\n'), {
  ...(await prettier.resolveConfig(target)),
  parser: 'markdown',
});
mkdirSync(join(ROOT, 'docs'), { recursive: true });
writeFileSync(target, markdown);
console.log(markdown);
// A database that disagrees with the answers the clients got is a failure, not a figure.
if (!orders.ok) process.exitCode = 1;
