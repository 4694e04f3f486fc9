// The running fake over real HTTP: express with the msw middleware (no body parser), the SDK
// over the network, the payment page walked with fetch, webhooks to a local receiver that
// verifies them with the SDK (Stripe docs, "Check the webhook signatures"), and the process
// stopping cleanly on SIGTERM / SIGINT.
import { spawn } from 'node:child_process';
import http from 'node:http';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import Stripe from 'stripe';
import { PAGE_TITLE } from './index.js';
import { startPaymentFakeServer } from './server.mjs';
import { SECRET, postForm, sessionParams, startReceiver } from './test-support.mjs';

const SERVER_PATH = fileURLToPath(new URL('./server.mjs', import.meta.url));

/** @type {Awaited<ReturnType<typeof startReceiver>>} */
let receiver;
/** @type {Awaited<ReturnType<typeof startPaymentFakeServer>>} */
let running;
/** @type {string[]} */
const logLines = [];
/** @type {Stripe} */
let stripe;

beforeAll(async () => {
  receiver = await startReceiver();
  running = await startPaymentFakeServer({
    port: 0,
    webhookUrl: receiver.url,
    webhookSecret: SECRET,
    log: (line) => logLines.push(line),
  });
  const port = Number(new URL(running.url).port);
  stripe = new Stripe('sk_test_nappe_fake', {
    host: '127.0.0.1',
    port,
    protocol: 'http',
    maxNetworkRetries: 0,
  });
});

afterAll(async () => {
  await running?.close();
  await receiver?.close();
});

beforeEach(async () => {
  const reset = await fetch(`${running.url}/__reset`, { method: 'POST' });
  expect(reset.status).toBe(204);
  receiver.received.length = 0;
  logLines.length = 0;
});

describe('the running fake on an ephemeral port', () => {
  it('walks the payment page: a decline keeps it open, 4242… pays, 303 to success_url, webhooks delivered', async () => {
    const session = await stripe.checkout.sessions.create(
      sessionParams({ customer_email: undefined }),
    );
    expect(session.url).toBe(`${running.publicBaseUrl}/pay/${session.id}`);
    expect(running.publicBaseUrl).toMatch(/^http:\/\/localhost:\d+$/);

    const page = await fetch(session.url);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain(`<h1>${PAGE_TITLE}</h1>`);
    expect(html).toContain('£80.00');

    const declined = await postForm(session.url, {
      email: 'guest@example.com',
      card_number: '4000 0000 0000 0002',
    });
    expect(declined.status).toBe(402);
    expect(await declined.text()).toContain('Your card was declined.');
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');

    const paid = await postForm(session.url, {
      email: 'guest@example.com',
      card_number: '4242 4242 4242 4242',
    });
    expect(paid.status).toBe(303);
    expect(paid.headers.get('location')).toBe(`https://shop.example/booked?session=${session.id}`);
    expect(await stripe.checkout.sessions.retrieve(session.id)).toMatchObject({
      status: 'complete',
      payment_status: 'paid',
    });

    // Delivered over HTTP before the redirect was answered; each verified on the raw body.
    expect(receiver.received.map((r) => r.error ?? r.event?.type)).toEqual([
      'payment_intent.payment_failed',
      'checkout.session.completed',
      'payment_intent.succeeded',
    ]);
    expect(receiver.received.every((r) => r.contentType.startsWith('application/json'))).toBe(true);

    const listed = await (await fetch(`${running.url}/__events`)).json();
    expect(listed.data.map((e) => e.type)).toEqual([
      'payment_intent.payment_failed',
      'checkout.session.completed',
      'payment_intent.succeeded',
    ]);
    expect(listed.data.map((e) => e.id)).toEqual(receiver.received.map((r) => r.event?.id));
    expect(listed.deliveries.map((d) => [d.ok, d.status])).toEqual([
      [true, 200],
      [true, 200],
      [true, 200],
    ]);
    const event = await stripe.events.retrieve(listed.data[1].id);
    expect(event.data.object).toMatchObject({ id: session.id, payment_status: 'paid' });
  });

  it('logs one line per request and per webhook', async () => {
    await stripe.customers.create({ email: 'log@example.com' });
    await fetch(`${running.url}/__events`);
    expect(logLines).toHaveLength(2);
    expect(logLines[0]).toMatch(/^POST \/v1\/customers 200 \d+\.\dms$/);
    expect(logLines[1]).toMatch(/^GET \/__events 200 \d+\.\dms$/);
    const intent = await stripe.paymentIntents.create({
      amount: 500,
      currency: 'gbp',
      payment_method: 'pm_card_visa',
      confirm: true,
    });
    expect(intent.status).toBe('succeeded');
    expect(
      logLines.some((line) =>
        /^webhook payment_intent\.succeeded evt_\w+ -> http:\/\/127\.0\.0\.1:\d+\/api\/payments\/webhook: delivered \(200\)$/.test(
          line,
        ),
      ),
    ).toBe(true);
  });

  it('forgets everything on POST /__reset', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    await fetch(`${running.url}/__reset`, { method: 'POST' });
    const listed = await (await fetch(`${running.url}/__events`)).json();
    expect(listed).toEqual({ object: 'list', data: [], deliveries: [] });
    expect((await fetch(session.url)).status).toBe(404);
    const error = await stripe.checkout.sessions.retrieve(session.id).catch((e) => e);
    expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
  });

  it('answers unknown paths with 404 and unknown API paths in the service envelope', async () => {
    const other = await fetch(`${running.url}/nothing-here`);
    expect(other.status).toBe(404);
    const api = await fetch(`${running.url}/v1/subscriptions`, {
      headers: { Authorization: 'Bearer sk_test_x' },
    });
    expect(api.status).toBe(404);
    expect((await api.json()).error.type).toBe('invalid_request_error');
    expect((await fetch(`${running.url}/__health`)).status).toBe(200);
  });
});

/** @returns {Promise<number>} */
function freePort() {
  return new Promise((resolve) => {
    const probe = http.createServer();
    probe.listen(0, '127.0.0.1', () => {
      const { port } = /** @type {import('node:net').AddressInfo} */ (probe.address());
      probe.close(() => resolve(port));
    });
  });
}

/**
 * @param {Record<string, string>} env
 */
function startProcess(env) {
  const child = spawn(process.execPath, [SERVER_PATH], {
    env: { ...process.env, PAYMENT_FAKE_WEBHOOK_URL: '', STRIPE_WEBHOOK_SECRET: '', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout.on('data', (chunk) => (output += chunk));
  child.stderr.on('data', (chunk) => (output += chunk));
  const exited = new Promise((resolve) =>
    child.on('exit', (code, signal) => resolve({ code, signal })),
  );
  const ready = () =>
    new Promise((resolve, reject) => {
      const started = Date.now();
      const poll = setInterval(() => {
        if (output.includes('listening on')) {
          clearInterval(poll);
          resolve(undefined);
        } else if (Date.now() - started > 10_000 || child.exitCode !== null) {
          clearInterval(poll);
          reject(new Error(`payment fake did not start: ${output}`));
        }
      }, 25);
    });
  return { child, exited, ready, output: () => output };
}

describe('node docker-free-scripts/payment-fake/server.mjs', () => {
  it.each(['SIGTERM', 'SIGINT'])('serves, then exits 0 on %s', async (signal) => {
    const port = await freePort();
    const proc = startProcess({ PAYMENT_FAKE_PORT: String(port) });
    await proc.ready();
    // Defaults when the environment is silent.
    expect(proc.output()).toContain(`listening on http://127.0.0.1:${port}`);
    expect(proc.output()).toContain(`payment pages at http://localhost:${port}/pay/`);
    expect(proc.output()).toContain('webhooks to http://localhost:3000/api/payments/webhook');
    expect((await fetch(`http://127.0.0.1:${port}/__health`)).status).toBe(200);
    proc.child.kill(signal);
    expect(await proc.exited).toEqual({ code: 0, signal: null });
    expect(proc.output()).toContain(`${signal}: payment fake shutting down`);
  });

  it('says plainly when its port is taken, and exits 1', async () => {
    const blocker = http.createServer();
    await new Promise((resolve) => blocker.listen(0, '127.0.0.1', () => resolve(undefined)));
    const { port } = /** @type {import('node:net').AddressInfo} */ (blocker.address());
    try {
      const proc = startProcess({ PAYMENT_FAKE_PORT: String(port) });
      expect(await proc.exited).toEqual({ code: 1, signal: null });
      expect(proc.output()).toContain(`Port ${port} is already in use`);
    } finally {
      await new Promise((resolve) => blocker.close(resolve));
    }
  });

  it('refuses a port that is not a number', async () => {
    const proc = startProcess({ PAYMENT_FAKE_PORT: 'twelve' });
    const exit = await proc.exited;
    expect(exit.code).not.toBe(0);
    expect(proc.output()).toContain('PAYMENT_FAKE_PORT must be a port number');
  });
});
