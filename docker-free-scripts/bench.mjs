// `npm run bench`: measures side by side in one run and writes docs/benchmarks.md.
// Everything runs on loopback, bounded in time; nothing leaves the machine.
import { fork, spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { cpus, freemem, tmpdir, totalmem, type as osType, release } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import autocannon from 'autocannon';
import { buildAll, migrateAndSeed, ROOT, systemConfig } from './lib/system.mjs';

const DURATION_S = Number(process.env.BENCH_SECONDS ?? 8);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 50);

/**
 * @param {string} url
 * @param {Partial<import('autocannon').Options>} options
 */
async function load(url, options = {}) {
  const result = await autocannon({
    url,
    connections: CONNECTIONS,
    duration: DURATION_S,
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
  const deadline = Date.now() + 30_000;
  for (;;) {
    try {
      const res = await fetch(probe);
      if (res.ok) break;
    } catch {
      // not yet
    }
    if (Date.now() > deadline) throw new Error(`${script} did not answer ${probe}`);
    await new Promise((r) => setTimeout(r, 200));
  }
  return child;
}

/** @param {import('node:child_process').ChildProcess} child */
async function stop(child) {
  child.kill('SIGTERM');
  await new Promise((r) => child.once('exit', r));
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

const fmt = (/** @type {number} */ n, digits = 0) =>
  n.toLocaleString('en-GB', { maximumFractionDigits: digits, minimumFractionDigits: digits });

if (process.env.NAPPE_SKIP_BUILD !== '1') buildAll();

const dataDir = mkdtempSync(join(tmpdir(), 'nappe-bench-'));
const config = systemConfig({
  ...process.env,
  NAPPE_API_PORT: '3202',
  DATABASE_PATH: join(dataDir, 'bench.sqlite'),
});
migrateAndSeed(config);

/** @type {{ name: string, rps: number, p50: number, p99: number, non2xx: number, errors: number, total: number }[]} */
const http = [];
try {
  const bare = await startServer(
    'docker-free-scripts/bench/node-hello.mjs',
    { PORT: '3200' },
    'http://127.0.0.1:3200/',
  );
  http.push({ name: 'bare node:http hello', ...(await load('http://127.0.0.1:3200/')) });
  await stop(bare);

  const nest = await startServer(
    'docker-free-scripts/bench/nest-hello.mjs',
    { PORT: '3201' },
    'http://127.0.0.1:3201/hello',
  );
  http.push({ name: 'Nest hello (no middleware)', ...(await load('http://127.0.0.1:3201/hello')) });
  await stop(nest);

  const api = await startServer(
    'api/dist/main.js',
    {
      PORT: '3202',
      DATABASE_PATH: config.databasePath,
      LOG_LEVEL: 'warn',
      THROTTLE_LIMIT: '100000000',
      NODE_ENV: 'development',
    },
    'http://127.0.0.1:3202/api/health',
  );
  http.push({
    name: 'app hello: GET /api/health through all middleware (+ SELECT 1)',
    ...(await load('http://127.0.0.1:3202/api/health')),
  });
  http.push({
    name: 'public menu read: GET /api/menus',
    ...(await load('http://127.0.0.1:3202/api/menus')),
  });
  await stop(api);
} finally {
  rmSync(dataDir, { recursive: true, force: true });
}

const bundles = { storefront: initialJs('storefront'), admin: initialJs('admin') };
const budgets = { storefront: 150, admin: 250 };

const bareRps = http[0]?.rps ?? 1;
const nestRps = http[1]?.rps ?? 1;
const cpu = cpus()[0]?.model ?? 'unknown CPU';
const git = spawnSync('git', ['rev-parse', '--short', 'HEAD'], {
  cwd: ROOT,
  encoding: 'utf8',
}).stdout.trim();
const lines = [
  '# Benchmarks',
  '',
  `Measured by \`npm run bench\` on ${new Date().toISOString().slice(0, 16).replace('T', ' ')} UTC at commit ${git}.`,
  `Machine: ${cpus().length} × ${cpu}, ${fmt(totalmem() / 2 ** 30, 1)} GiB memory (${fmt(freemem() / 2 ** 30, 1)} GiB free), ${osType()} ${release()}, Node ${process.version}.`,
  `Load: autocannon, ${CONNECTIONS} connections for ${DURATION_S} s per row, client and server on the same ${cpus().length} cores over loopback, one after another.`,
  '',
  '## HTTP',
  '',
  '| what | req/s | p50 ms | p99 ms | non-2xx | errors | vs bare node | vs Nest hello |',
  '|---|---:|---:|---:|---:|---:|---:|---:|',
  ...http.map(
    (r) =>
      `| ${r.name} | ${fmt(r.rps)} | ${fmt(r.p50, 1)} | ${fmt(r.p99, 1)} | ${r.non2xx} | ${r.errors} | ${fmt((r.rps / bareRps) * 100)} % | ${fmt((r.rps / nestRps) * 100)} % |`,
  ),
  '',
  'Target: menu read p99 ≤ 20 ms at 50 connections.',
  '',
  '## Initial JavaScript per app (entry + modulepreloads, gzip -9)',
  '',
  '| app | files | raw KiB | gzip KiB | budget KiB | within |',
  '|---|---:|---:|---:|---:|---|',
  ...Object.entries(bundles).map(
    ([app, b]) =>
      `| ${app} | ${b.files} | ${fmt(b.rawKiB, 1)} | ${fmt(b.gzipKiB, 1)} | ${budgets[/** @type {'storefront' | 'admin'} */ (app)]} | ${b.gzipKiB <= budgets[/** @type {'storefront' | 'admin'} */ (app)] ? 'yes' : '**no**'} |`,
  ),
  '',
];
const menuRow = http.find((r) => r.name.startsWith('public menu read'));
const unmet = [
  ...(menuRow && menuRow.p99 > 20
    ? [
        `menu read p99 ${fmt(menuRow.p99, 1)} ms > 20 ms at ${CONNECTIONS} connections (client and server share ${cpus().length} cores)`,
      ]
    : []),
  ...Object.entries(bundles)
    .filter(([app, b]) => b.gzipKiB > budgets[/** @type {'storefront' | 'admin'} */ (app)])
    .map(
      ([app, b]) =>
        `${app} initial JS ${fmt(b.gzipKiB, 1)} KiB > ${budgets[/** @type {'storefront' | 'admin'} */ (app)]} KiB`,
    ),
];
lines.push(
  '## Targets not met in this run',
  '',
  ...(unmet.length ? unmet.map((u) => `- ${u}`) : ['- none']),
  '',
);
mkdirSync(join(ROOT, 'docs'), { recursive: true });
writeFileSync(join(ROOT, 'docs', 'benchmarks.md'), lines.join('\n'));
console.log(lines.join('\n'));
