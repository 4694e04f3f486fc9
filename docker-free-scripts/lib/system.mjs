// Starts the whole Nappe system on one machine without containers: the API, both apps (built,
// served by `vite preview`), the mail inbox (maildev) and the payment fake. Used by `npm run demo`
// and by the browser tests, so both run exactly the same processes.
import { spawnSync } from 'node:child_process';
import { createServer } from 'node:net';
import { existsSync, mkdirSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Writable } from 'node:stream';
import concurrently from 'concurrently';

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');

export const DEMO_PASSWORD = 'plated-demo-2026';
export const DEMO_ACCOUNTS = [
  { role: 'chef', email: 'chef@nappe.test', app: 'admin' },
  { role: 'staff', email: 'staff@nappe.test', app: 'admin' },
  { role: 'client', email: 'client@nappe.test', app: 'storefront' },
];

/** @type {(value: string | undefined, fallback: number) => number} */
const int = (value, fallback) => (value ? Number.parseInt(value, 10) : fallback);

/**
 * @typedef {{ api: number, storefront: number, admin: number, smtp: number, mailWeb: number, payments: number }} Ports
 * @typedef {{ ports: Ports, urls: Record<'api' | 'apiDocs' | 'storefront' | 'admin' | 'mail' | 'payments', string>, databasePath: string }} SystemConfig
 */

/**
 * Ports and addresses, overridable from the environment (the browser tests use their own set).
 * @param {NodeJS.ProcessEnv} env
 * @returns {SystemConfig}
 */
export function systemConfig(env = process.env) {
  const ports = {
    api: int(env.NAPPE_API_PORT, 3000),
    storefront: int(env.NAPPE_STOREFRONT_PORT, 5173),
    admin: int(env.NAPPE_ADMIN_PORT, 5174),
    smtp: int(env.NAPPE_SMTP_PORT, 1025),
    mailWeb: int(env.NAPPE_MAIL_WEB_PORT, 1080),
    payments: int(env.NAPPE_PAYMENT_PORT, 12111),
  };
  const urls = {
    api: `http://localhost:${ports.api}/api`,
    apiDocs: `http://localhost:${ports.api}/api/docs`,
    storefront: `http://localhost:${ports.storefront}`,
    admin: `http://localhost:${ports.admin}`,
    mail: `http://localhost:${ports.mailWeb}`,
    payments: `http://localhost:${ports.payments}`,
  };
  const databasePath = resolve(ROOT, env.DATABASE_PATH ?? 'data/nappe.sqlite');
  return { ports, urls, databasePath };
}

/**
 * @param {string} command
 * @param {string[]} args
 * @param {import('node:child_process').SpawnSyncOptions} options
 */
function run(command, args, options = {}) {
  const result = spawnSync(command, args, { cwd: ROOT, stdio: 'inherit', ...options });
  if (result.status !== 0) {
    throw new Error(`${command} ${args.join(' ')} failed with exit code ${result.status}`);
  }
}

/**
 * Builds shared, the API and both apps (production bundles); `live`: shared and the API only.
 * @param {{ live?: boolean }} [options]
 */
export function buildAll({ live = false } = {}) {
  if (!live) return run('npm', ['run', 'build', '--silent']);
  // Served from source, the apps need no bundle: build what the API runs.
  run('npm', ['run', 'build', '--silent', '-w', 'shared']);
  run('npm', ['run', 'build', '--silent', '-w', 'api']);
}

/**
 * The environment every process of the system shares.
 * @param {SystemConfig} config
 * @param {Record<string, string>} extra
 */
function systemEnv(config, extra = {}) {
  const { ports, databasePath } = config;
  const appOrigins = [ports.storefront, ports.admin].flatMap((p) => [
    `http://localhost:${p}`,
    `http://127.0.0.1:${p}`,
  ]);
  return {
    ...process.env,
    NODE_ENV: process.env.NODE_ENV ?? 'development',
    PORT: String(ports.api),
    HOST: '127.0.0.1',
    DATABASE_PATH: databasePath,
    CORS_ORIGINS: appOrigins.join(','),
    API_URL: `http://127.0.0.1:${ports.api}`,
    PUBLIC_STOREFRONT_URL: `http://localhost:${ports.storefront}`,
    PUBLIC_ADMIN_URL: `http://localhost:${ports.admin}`,
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(ports.smtp),
    STRIPE_API_HOST: 'localhost',
    STRIPE_API_PORT: String(ports.payments),
    STRIPE_API_PROTOCOL: 'http',
    PAYMENT_FAKE_PORT: String(ports.payments),
    PAYMENT_FAKE_WEBHOOK_URL: `http://127.0.0.1:${ports.api}/api/payments/webhook`,
    ...extra,
  };
}

/**
 * Applies migrations and seeds the demo studio into an empty database.
 * @param {SystemConfig} config
 */
export function migrateAndSeed(config) {
  mkdirSync(dirname(config.databasePath), { recursive: true });
  run('node', ['api/dist/database/cli.js', 'seed'], { env: systemEnv(config) });
}

/**
 * Starts every process. Returns the concurrently handle; `stop()` ends them all.
 * Output is prefixed with the process name; `quiet` drops it (the browser tests).
 * @param {SystemConfig} config
 * `live` serves both apps from their sources with Vite's dev server (edits show at once)
 * instead of the built bundles.
 * @param {{ quiet?: boolean, live?: boolean, env?: Record<string, string> }} options
 */
export function startSystem(config, { quiet = false, live = false, env = {} } = {}) {
  const sharedEnv = systemEnv(config, env);
  const vite = join(ROOT, 'node_modules', 'vite', 'bin', 'vite.js');
  const serve = live ? '' : ' preview';
  // The built apps' servers render Menus per request with React: its production build is 2–4×
  // faster than the development one (the API keeps the demo's development settings).
  const appEnv = live ? sharedEnv : { ...sharedEnv, NODE_ENV: 'production' };
  const commands = [
    { name: 'api', command: 'node api/dist/main.js', env: sharedEnv, prefixColor: 'magenta' },
    {
      name: 'storefront',
      command: `node ${vite}${serve} --port ${config.ports.storefront} --strictPort`,
      cwd: join(ROOT, 'storefront'),
      env: appEnv,
      prefixColor: 'yellow',
    },
    {
      name: 'admin',
      command: `node ${vite}${serve} --port ${config.ports.admin} --strictPort`,
      cwd: join(ROOT, 'admin'),
      env: appEnv,
      prefixColor: 'green',
    },
    {
      name: 'mail',
      command: `node node_modules/maildev/bin/maildev --ip 127.0.0.1 --web-ip 127.0.0.1 --smtp ${config.ports.smtp} --web ${config.ports.mailWeb} --silent`,
      env: sharedEnv,
      prefixColor: 'cyan',
    },
  ];
  if (existsSync(join(ROOT, 'docker-free-scripts', 'payment-fake', 'server.mjs'))) {
    commands.push({
      name: 'payments',
      command: 'node docker-free-scripts/payment-fake/server.mjs',
      env: sharedEnv,
      prefixColor: 'blue',
    });
  }
  const handle = concurrently(commands, {
    cwd: ROOT,
    prefix: 'name',
    killOthersOn: ['failure', 'success'],
    outputStream: quiet ? devNull() : process.stdout,
    handleInput: false,
  });
  const stop = () => {
    for (const command of handle.commands) command.kill('SIGTERM');
  };
  return { ...handle, stop };
}

function devNull() {
  return new Writable({ write: (_chunk, _encoding, callback) => callback() });
}

/**
 * Waits until every service answers, or throws naming the ones that did not.
 * @param {SystemConfig} config
 */
export async function waitUntilReady(config, timeoutMs = 90_000) {
  const { ports } = config;
  /** @type {Record<string, string>} */
  const probes = {
    api: `http://127.0.0.1:${ports.api}/api/health`,
    storefront: `http://localhost:${ports.storefront}/`,
    admin: `http://localhost:${ports.admin}/`,
    mail: `http://127.0.0.1:${ports.mailWeb}/healthz`,
  };
  if (existsSync(join(ROOT, 'docker-free-scripts', 'payment-fake', 'server.mjs'))) {
    probes.payments = `http://127.0.0.1:${ports.payments}/__events`;
  }
  const deadline = Date.now() + timeoutMs;
  const pending = new Set(Object.keys(probes));
  while (pending.size > 0) {
    for (const name of [...pending]) {
      try {
        const res = await fetch(probes[name], { signal: AbortSignal.timeout(2000) });
        if (res.ok) pending.delete(name);
      } catch {
        // not up yet
      }
    }
    if (pending.size === 0) break;
    if (Date.now() > deadline)
      throw new Error(`Not ready after ${timeoutMs / 1000} s: ${[...pending].join(', ')}`);
    await new Promise((r) => setTimeout(r, 300));
  }
}

/**
 * Fails when something already listens on one of `ports`, so a test never talks to another
 * process's server by mistake.
 * @param {number[]} ports
 */
export async function assertPortsFree(ports) {
  for (const port of ports) {
    await new Promise((resolve, reject) => {
      const probe = createServer();
      probe.once('error', () =>
        reject(new Error(`Port ${port} is already in use; stop what runs there first.`)),
      );
      probe.listen(port, '127.0.0.1', () => probe.close(() => resolve(undefined)));
    });
  }
}
