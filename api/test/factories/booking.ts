import nodemailer from 'nodemailer';
import type Mail from 'nodemailer/lib/mailer/index.js';
import { setupServer, type SetupServer } from 'msw/node';
import {
  createPaymentFake,
  type PaymentFake,
  type WebhookDelivery,
} from '@nappe/docker-free-scripts/payment-fake/index.js';
import { Role, type CancellationTier } from '@nappe/shared';
import { Clock } from '../../src/common/clock.js';
import { MAIL_TRANSPORT, type MailTransport } from '../../src/mail/mail-transport.js';
import { OutboxWorker } from '../../src/mail/outbox.worker.js';
import { StudioSettings } from '../../src/studio/entities/studio-settings.entity.js';
import { bearer, create, ingredientLine, recipeBody } from './kitchen.js';
import { createTestApp, makeSignedInUser, type TestApp } from './test-app.js';

/** Test data for bookings. Values are invented; each test states what it checks against. */

/** A clock the test moves by hand. */
export class ControlledClock extends Clock {
  private at: number;

  constructor(start: string | Date) {
    super();
    this.at = new Date(start).getTime();
  }

  override now(): Date {
    return new Date(this.at);
  }

  set(at: string | Date): void {
    this.at = new Date(at).getTime();
  }

  advance(ms: number): void {
    this.at += ms;
  }
}

/**
 * A mail transport that builds the real MIME message with nodemailer (streamTransport) and
 * keeps it, or fails like an unreachable SMTP server while `down` is set.
 */
export class RecordingTransport implements MailTransport {
  down = false;
  attempts = 0;
  readonly sent: Array<{ to: string; subject: string; raw: string; message: Mail.Options }> = [];
  private readonly stream = nodemailer.createTransport({ streamTransport: true, buffer: true });

  async sendMail(message: Mail.Options): Promise<unknown> {
    this.attempts += 1;
    if (this.down) throw new Error('connect ECONNREFUSED 127.0.0.1:1025');
    const info = (await this.stream.sendMail(message)) as { message: Buffer };
    const raw = info.message.toString('utf8');
    this.sent.push({
      to: String(message.to),
      subject: String(message.subject),
      raw,
      message,
    });
    return info;
  }
}

export interface BookingApp {
  t: TestApp;
  clock: ControlledClock;
  mail: RecordingTransport;
  drainOutbox: () => ReturnType<OutboxWorker['drainOutbox']>;
}

/**
 * Today for the tests: Friday 2026-03-06, 10:00 in Brussels (09:00 UTC; CET is UTC+1 until the
 * last Sunday of March — IANA tz database).
 */
export const TEST_NOW = '2026-03-06T09:00:00.000Z';

export async function createBookingApp(
  env: Record<string, string> = {},
  start: string = TEST_NOW,
): Promise<BookingApp> {
  const clock = new ControlledClock(start);
  const mail = new RecordingTransport();
  const t = await createTestApp(
    { STRIPE_TIMEOUT_MS: '1500', ...env },
    {
      configure: (b) =>
        b.overrideProvider(Clock).useValue(clock).overrideProvider(MAIL_TRANSPORT).useValue(mail),
    },
  );
  const worker = t.app.get(OutboxWorker);
  return { t, clock, mail, drainOutbox: () => worker.drainOutbox() };
}

export interface BookingSettingsPatch {
  dailyPlateCapacity?: number;
  depositPercent?: number;
  balanceDueDaysBefore?: number;
  finalGuestCountDaysBefore?: number;
  taxRateBp?: number;
  pricesIncludeTax?: boolean;
  cancellationTiers?: CancellationTier[];
  blackoutDates?: string[];
  timeZone?: string;
  currency?: string;
  name?: string;
}

export async function setStudio(t: TestApp, patch: BookingSettingsPatch): Promise<void> {
  await t.dataSource.getRepository(StudioSettings).update({ id: 1 }, patch);
}

export interface MenuOptions {
  name?: string;
  pricePerGuestMinor?: number;
  minGuests?: number;
  maxGuests?: number;
  leadDays?: number;
  desserts?: number;
  active?: boolean;
}

/** A menu made through the chef's API: one ingredient, one recipe, `desserts` plated desserts. */
export async function makeMenu(
  t: TestApp,
  chef: string,
  options: MenuOptions = {},
): Promise<string> {
  const ingredient = await create(t, chef, '/api/ingredients', {
    name: 'Caster sugar',
    purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 180 },
    allergens: { contains: [], mayContain: [] },
    dietary: { animalOrigins: [], alcohol: false },
  });
  const recipe = await create(
    t,
    chef,
    '/api/recipes',
    recipeBody([ingredientLine(ingredient, 500)], {
      name: 'Sugar tuile',
      yieldG: 450,
      storage: 'dry',
      shelfLifeHours: 72,
    }),
  );
  const dessertIds: string[] = [];
  for (let i = 0; i < (options.desserts ?? 1); i += 1) {
    dessertIds.push(
      await create(t, chef, '/api/desserts', {
        name: `Tuile plate ${i + 1}`,
        components: [{ recipeId: recipe, quantity: 20, unit: 'g' }],
      }),
    );
  }
  return create(t, chef, '/api/menus', {
    name: options.name ?? 'Winter tuile supper',
    dessertIds,
    pricePerGuestMinor: options.pricePerGuestMinor ?? 1200,
    minGuests: options.minGuests ?? 2,
    maxGuests: options.maxGuests ?? 200,
    leadDays: options.leadDays ?? 3,
    active: options.active ?? true,
  });
}

export function orderBody(menuId: string, overrides: Record<string, unknown> = {}) {
  return {
    menuId,
    eventDate: '2026-06-20',
    serviceTime: '19:30',
    venueAddressLines: ['Rue des Invités 12', '9000 Gent'],
    occasion: 'Birthday dinner',
    contactPhone: '+32 470 12 34 56',
    guestCount: 20,
    acceptTerms: true,
    ...overrides,
  };
}

let keyCounter = 0;
export const newKey = (label = 'book') => `${label}-${process.pid}-${(keyCounter += 1)}`;

export async function bookOrder(
  t: TestApp,
  token: string,
  menuId: string,
  overrides: Record<string, unknown> = {},
): Promise<{ id: string; body: Record<string, unknown> }> {
  const res = await t.http
    .post('/api/orders')
    .set(bearer(token))
    .set('Idempotency-Key', newKey())
    .send(orderBody(menuId, overrides));
  if (res.status !== 201)
    throw new Error(`booking answered ${res.status}: ${JSON.stringify(res.body)}`);
  return { id: (res.body as { id: string }).id, body: res.body as Record<string, unknown> };
}

export interface FakeHarness {
  fake: PaymentFake;
  server: SetupServer;
  /** While set, webhooks wait in `held` until `release()`. */
  hold: boolean;
  held: WebhookDelivery[];
  /** The app's answer to each delivered webhook. */
  answers: Array<{ type: string; eventId: string; status: number }>;
  deliver: (delivery: WebhookDelivery) => Promise<number>;
  release: () => Promise<void>;
  close: () => void;
}

export const FAKE_BASE_URL = 'http://localhost:12111';

/**
 * The payment fake in-process: msw intercepts the SDK's calls; each signed webhook is posted
 * straight to the app's endpoint (raw body and Stripe-Signature) through supertest.
 */
export function startPaymentFake(app: BookingApp): FakeHarness {
  const harness: FakeHarness = {
    fake: undefined as unknown as PaymentFake,
    server: undefined as unknown as SetupServer,
    hold: false,
    held: [],
    answers: [],
    deliver: async ({ rawBody, signature, event }) => {
      const res = await app.t.http
        .post('/api/payments/webhook')
        .set('Stripe-Signature', signature)
        .set('Content-Type', 'application/json')
        .send(rawBody);
      harness.answers.push({ type: event.type, eventId: event.id, status: res.status });
      return res.status;
    },
    release: async () => {
      const waiting = harness.held.splice(0);
      for (const d of waiting) await harness.deliver(d);
    },
    close: () => harness.server.close(),
  };
  harness.fake = createPaymentFake({
    publicBaseUrl: FAKE_BASE_URL,
    webhookSecret: app.t.env.STRIPE_WEBHOOK_SECRET,
    now: () => app.clock.now().getTime(),
    deliver: async (delivery) => {
      if (harness.hold) harness.held.push(delivery);
      else await harness.deliver(delivery);
    },
  });
  harness.server = setupServer(...harness.fake.handlers);
  harness.server.listen({ onUnhandledRequest: 'bypass' });
  return harness;
}

/** Pays a checkout on the fake's payment page, as a browser submits the form. */
export async function payOnPage(
  checkoutUrl: string,
  cardNumber = '4242 4242 4242 4242',
  email = 'payer@example.test',
): Promise<Response> {
  return fetch(checkoutUrl, {
    method: 'POST',
    headers: { 'Content-Type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ email, card_number: cardNumber }),
    redirect: 'manual',
  });
}

export async function signedIn(t: TestApp, role: Role) {
  return makeSignedInUser(t, role);
}

export { bearer };
