import { Role } from '@nappe/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { OutboxMessageEntity } from '../src/mail/entities/outbox-message.entity.js';
import { PaymentEntity } from '../src/payments/entities/payment.entity.js';
import {
  bearer,
  bookOrder,
  createBookingApp,
  makeMenu,
  payOnPage,
  setStudio,
  signedIn,
  startPaymentFake,
  TEST_NOW,
  type BookingApp,
  type FakeHarness,
} from './factories/booking.js';

/**
 * What the chef's Orders screens need of the API beyond the booking flow: the plates each order
 * takes from the day's capacity in the list (for the Calendar), and a cancellation refunded in
 * full when the chef chooses it (issue #5: "cancel (refund by policy or in full, chef's choice)").
 */

let app: BookingApp;
let pay: FakeHarness;
let chef: string;
let menu: string;

beforeAll(async () => {
  app = await createBookingApp();
  pay = startPaymentFake(app);
  chef = (await signedIn(app.t, Role.Chef)).token;
  // €12.00 per guest, two plated desserts per guest; 30 % deposit;
  // tiers 30 d → 100 %, 14 d → 50 %, 0 d → 0 % (the factory's studio, DEFAULT_STUDIO_SETTINGS).
  menu = await makeMenu(app.t, chef, { pricePerGuestMinor: 1200, desserts: 2 });
});
afterAll(async () => {
  pay.close();
  await app.t.close();
});
beforeEach(async () => {
  app.clock.set(TEST_NOW);
  await setStudio(app.t, { timeZone: 'Europe/Brussels', dailyPlateCapacity: 1000 });
});

const payments = () => app.t.dataSource.getRepository(PaymentEntity);
const outbox = () => app.t.dataSource.getRepository(OutboxMessageEntity);

/** A client books 20 guests on 2026-06-20, pays the 30 % deposit (€72.00), the chef confirms. */
async function confirmedOrder(): Promise<{ id: string; client: string }> {
  const client = (await signedIn(app.t, Role.Client)).token;
  const { id } = await bookOrder(app.t, client, menu);
  const co = await app.t.http
    .post(`/api/orders/${id}/checkout`)
    .set(bearer(client))
    .send({ plan: 'deposit' })
    .expect(200);
  expect((await payOnPage(co.body.checkoutUrl as string)).status).toBe(303);
  await app.t.http
    .post(`/api/orders/${id}/confirm`)
    .set(bearer(chef))
    .send({ overrideReason: 'Checked with the client by phone' })
    .expect(200);
  return { id, client };
}

describe('the order list for the chef', () => {
  it('gives each order the plates it takes from the day: guests × desserts', async () => {
    const { id } = await confirmedOrder();
    const res = await app.t.http
      .get('/api/orders?status=confirmed&pageSize=100')
      .set(bearer(chef))
      .expect(200);
    const row = (res.body.items as Array<{ id: string; guestCount: number; plates: number }>).find(
      (o) => o.id === id,
    );
    // 20 guests × 2 desserts on the menu (DESIGN.md: an order's plates = guests × desserts).
    expect(row).toMatchObject({ guestCount: 20, plates: 40 });
  });
});

describe('the chef cancels: refund by the policy or in full', () => {
  it('refunds everything paid when the chef chooses "full", even inside the 0 % tier', async () => {
    const { id } = await confirmedOrder();
    app.clock.set('2026-06-13T08:00:00Z'); // 7 days before the event: the 0 % tier
    const preview = await app.t.http
      .post(`/api/orders/${id}/cancellation-preview`)
      .set(bearer(chef))
      .expect(200);
    expect(preview.body.refund).toMatchObject({
      refundPercent: 0,
      paidMinor: 7200,
      refundMinor: 0,
    });

    const res = await app.t.http
      .post(`/api/orders/${id}/cancel`)
      .set(bearer(chef))
      .send({ reason: 'Our oven failed', refund: 'full' })
      .expect(200);
    expect(res.body).toMatchObject({ status: 'cancelled', paidMinor: 0 });
    const refunds = await payments().findBy({ orderId: id, kind: 'refund' });
    expect(refunds.map((r) => [r.status, r.amountMinor])).toEqual([['succeeded', 7200]]);
    expect(res.body.timeline.at(-1)).toMatchObject({
      fromStatus: 'confirmed',
      toStatus: 'cancelled',
      actor: { role: 'chef' },
      summary: 'Cancelled by the studio; €72.00 refunded in full (the studio’s choice)',
      reason: 'Our oven failed',
    });
    const mail = await outbox().findOneByOrFail({ orderId: id, kind: 'order_cancelled' });
    expect(mail.textBody).toContain('everything you paid (€72.00) is refunded');
  });

  it('refunds by the policy when the chef does not choose (7 days before → 0 %)', async () => {
    const { id } = await confirmedOrder();
    app.clock.set('2026-06-13T08:00:00Z');
    const res = await app.t.http
      .post(`/api/orders/${id}/cancel`)
      .set(bearer(chef))
      .send({ reason: 'The client asked us to' })
      .expect(200);
    expect(res.body).toMatchObject({ status: 'cancelled', paidMinor: 7200 });
    expect(await payments().countBy({ orderId: id, kind: 'refund' })).toBe(0);
    expect(res.body.timeline.at(-1).summary).toBe(
      'Cancelled by the studio; €0.00 refunded (0 % under the policy)',
    );
  });

  it('refuses a full refund asked by the client (403) and leaves the booking as it was', async () => {
    const { id, client } = await confirmedOrder();
    const res = await app.t.http
      .post(`/api/orders/${id}/cancel`)
      .set(bearer(client))
      .send({ refund: 'full' })
      .expect(403);
    expect(res.body.message).toBe('Only the studio can refund a cancellation in full.');
    const order = await app.t.http.get(`/api/orders/${id}`).set(bearer(client)).expect(200);
    expect(order.body.status).toBe('confirmed');
    expect(await payments().countBy({ orderId: id, kind: 'refund' })).toBe(0);
  });

  it('refuses an unknown refund choice or field (400)', async () => {
    const { id } = await confirmedOrder();
    await app.t.http
      .post(`/api/orders/${id}/cancel`)
      .set(bearer(chef))
      .send({ refund: 'half' })
      .expect(400);
    await app.t.http
      .post(`/api/orders/${id}/cancel`)
      .set(bearer(chef))
      .send({ refundMinor: 1 })
      .expect(400);
    const order = await app.t.http.get(`/api/orders/${id}`).set(bearer(chef)).expect(200);
    expect(order.body.status).toBe('confirmed');
  });
});
