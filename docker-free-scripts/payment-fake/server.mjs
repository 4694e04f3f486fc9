#!/usr/bin/env node
// @ts-check
/**
 * The running local payment fake: the msw handlers behind express, for the demo, development
 * and browser tests. `node docker-free-scripts/payment-fake/server.mjs`
 *
 * Environment:
 *   PAYMENT_FAKE_PORT         port on 127.0.0.1 (default 12111)
 *   PAYMENT_FAKE_PUBLIC_URL   where browsers reach it (default http://localhost:<port>)
 *   PAYMENT_FAKE_WEBHOOK_URL  the app's webhook endpoint
 *                             (default http://localhost:3000/api/payments/webhook)
 *   STRIPE_WEBHOOK_SECRET     webhook signing secret (default whsec_nappe_local_demo)
 *
 * Besides the payment service's endpoints (/v1/…) and the payment page (/pay/…):
 *   POST /__reset   forget everything      GET /__events   every event and delivery so far
 */
import http from 'node:http';
import { pathToFileURL } from 'node:url';
import express from 'express';
import { createMiddleware } from '@mswjs/http-middleware';
import { createPaymentFake, PAYMENT_FAKE_DEFAULTS } from './index.js';

/** @typedef {(line: string) => void} Log */

/**
 * @param {{ publicBaseUrl: string, webhookUrl: string, webhookSecret: string, log?: Log }} options
 */
export function createPaymentFakeApp(options) {
  const log = options.log ?? ((line) => console.log(line));
  const fake = createPaymentFake({
    publicBaseUrl: options.publicBaseUrl,
    webhookUrl: options.webhookUrl,
    webhookSecret: options.webhookSecret,
    onDelivery: (record) =>
      log(
        `webhook ${record.type} ${record.eventId} -> ${record.target}: ${
          record.ok ? `delivered (${record.status ?? 'ok'})` : `NOT delivered (${record.error})`
        }`,
      ),
  });
  const app = express();
  app.disable('x-powered-by');
  app.use((req, res, next) => {
    const started = process.hrtime.bigint();
    res.on('finish', () => {
      const ms = Number(process.hrtime.bigint() - started) / 1e6;
      log(`${req.method} ${req.originalUrl} ${res.statusCode} ${ms.toFixed(1)}ms`);
    });
    next();
  });
  app.post('/__reset', (_req, res) => {
    fake.reset();
    res.status(204).end();
  });
  app.get('/__events', (_req, res) => {
    res.json({
      object: 'list',
      data: [...fake.state.events.values()],
      deliveries: fake.state.deliveries,
    });
  });
  app.get('/__health', (_req, res) => {
    res.json({ ok: true });
  });
  // The handlers read the raw request stream themselves: no body parser may run before them.
  // (The cast bridges msw's ESM and CommonJS type declarations of the same handler class.)
  const handlers = /** @type {Parameters<typeof createMiddleware>} */ (
    /** @type {unknown} */ (fake.handlers)
  );
  app.use(createMiddleware(...handlers));
  app.use((_req, res) => {
    res
      .status(404)
      .type('text/plain')
      .send('Not found. The local payment fake serves /v1/…, /pay/…, /__events and /__reset.');
  });
  return { app, fake };
}

/**
 * Listen first, so the public URL can name the port actually bound (port 0 in tests).
 * @param {{ port?: number, host?: string, publicBaseUrl?: string, webhookUrl?: string,
 *   webhookSecret?: string, log?: Log, expireEveryMs?: number }} [options]
 */
export async function startPaymentFakeServer(options = {}) {
  const host = options.host ?? PAYMENT_FAKE_DEFAULTS.host;
  const log = options.log ?? ((line) => console.log(line));
  const server = http.createServer();
  await new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? PAYMENT_FAKE_DEFAULTS.port, host, () => {
      server.off('error', reject);
      resolve(undefined);
    });
  });
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : PAYMENT_FAKE_DEFAULTS.port;
  const publicBaseUrl = options.publicBaseUrl ?? `http://localhost:${port}`;
  const webhookUrl = options.webhookUrl ?? PAYMENT_FAKE_DEFAULTS.webhookUrl;
  const { app, fake } = createPaymentFakeApp({
    publicBaseUrl,
    webhookUrl,
    webhookSecret: options.webhookSecret ?? PAYMENT_FAKE_DEFAULTS.webhookSecret,
    log,
  });
  server.on('request', app);
  // Sessions past expires_at expire even when nobody looks at them.
  const timer = setInterval(() => {
    fake
      .expireDueSessions()
      .then((ids) => {
        if (ids.length > 0) log(`expired checkout sessions: ${ids.join(', ')}`);
      })
      .catch((error) => log(`expiring sessions failed: ${String(error)}`));
  }, options.expireEveryMs ?? 30_000);
  timer.unref();

  /** @returns {Promise<void>} */
  const close = () =>
    new Promise((resolve) => {
      clearInterval(timer);
      server.close(() => resolve());
      server.closeIdleConnections();
    });
  return { server, app, fake, url: `http://${host}:${port}`, publicBaseUrl, webhookUrl, close };
}

/**
 * @param {string | undefined} value
 * @returns {number}
 */
function portFromEnv(value) {
  if (value === undefined || value === '') return PAYMENT_FAKE_DEFAULTS.port;
  const port = Number(value);
  if (!Number.isInteger(port) || port < 1 || port > 65535) {
    throw new Error(`PAYMENT_FAKE_PORT must be a port number from 1 to 65535, got "${value}"`);
  }
  return port;
}

async function main() {
  const port = portFromEnv(process.env.PAYMENT_FAKE_PORT);
  /** @type {Awaited<ReturnType<typeof startPaymentFakeServer>>} */
  let running;
  try {
    running = await startPaymentFakeServer({
      port,
      publicBaseUrl: process.env.PAYMENT_FAKE_PUBLIC_URL || undefined,
      webhookUrl: process.env.PAYMENT_FAKE_WEBHOOK_URL || undefined,
      webhookSecret: process.env.STRIPE_WEBHOOK_SECRET || undefined,
    });
  } catch (error) {
    const code = /** @type {{ code?: string }} */ (error).code;
    console.error(
      code === 'EADDRINUSE'
        ? `Port ${port} is already in use (another payment fake?). Stop it or set PAYMENT_FAKE_PORT.`
        : `The payment fake could not start: ${String(error)}`,
    );
    process.exit(1);
  }
  console.log(
    `payment fake listening on ${running.url}; payment pages at ${running.publicBaseUrl}/pay/<session>; webhooks to ${running.webhookUrl}`,
  );
  let stopping = false;
  /** @param {string} signal */
  const stop = (signal) => {
    if (stopping) return;
    stopping = true;
    console.log(`${signal}: payment fake shutting down`);
    setTimeout(() => process.exit(1), 5_000).unref();
    running.close().then(
      () => process.exit(0),
      () => process.exit(1),
    );
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  await main();
}
