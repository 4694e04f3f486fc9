import * as argon2 from 'argon2';
import { Role } from '@nappe/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, seedDemo } from '../src/database/demo-seed.js';
import { PaymentEntity } from '../src/payments/entities/payment.entity.js';
import { bearer, createBookingApp, type BookingApp } from './factories/booking.js';
import { signIn } from './factories/test-app.js';

let app: BookingApp;
beforeAll(async () => {
  app = await createBookingApp({}, new Date().toISOString());
  const hash = (p: string) =>
    argon2.hash(p, { type: argon2.argon2id, memoryCost: 19456, timeCost: 2, parallelism: 1 });
  await seedDemo(app.t.dataSource, hash, 'test');
});
afterAll(async () => app.t.close());

const account = (role: Role) => DEMO_ACCOUNTS.find((a) => a.role === role)!.email;

describe('demo orders (seeded without the payment service)', () => {
  it('gives the demo client one paid booking awaiting the chef and one confirmed, with seeded ledgers', async () => {
    const { token } = await signIn(app.t, account(Role.Client), DEMO_PASSWORD);
    const list = await app.t.http.get('/api/orders').set(bearer(token)).expect(200);
    // Two bookings of the booking screens plus eight confirmed events for the prep plan.
    const statuses = list.body.items.map((o: { status: string }) => o.status);
    expect(statuses.filter((s: string) => s === 'requested')).toHaveLength(1);
    expect(statuses.filter((s: string) => s === 'confirmed')).toHaveLength(9);
    for (const summary of list.body.items as Array<{
      id: string;
      totalMinor: number;
      paidMinor: number;
      balanceMinor: number;
    }>) {
      const detail = await app.t.http
        .get(`/api/orders/${summary.id}`)
        .set(bearer(token))
        .expect(200);
      const kind = (detail.body.payments as Array<{ kind: string }>)[0]?.kind;
      expect(detail.body.payments).toEqual([
        expect.objectContaining({ kind, status: 'succeeded', receiptAvailable: true }),
      ]);
      // 30 % deposit, rounded half up to the cent (money.ts), or the whole total when the
      // balance would already be due: paid + balance = total.
      expect(summary.paidMinor).toBe(
        kind === 'full' ? summary.totalMinor : Math.round((summary.totalMinor * 30) / 100),
      );
      expect(summary.paidMinor + summary.balanceMinor).toBe(summary.totalMinor);
      expect(detail.body.timeline.length).toBeGreaterThanOrEqual(2);
      expect(detail.body.guests.length).toBeGreaterThan(0);
    }
    const rows = await app.t.dataSource.getRepository(PaymentEntity).find();
    expect(rows.every((p) => p.seeded && p.providerPaymentIntentId === null)).toBe(true);
  });

  it('lets a demo booking be cancelled without calling the payment service', async () => {
    const { token } = await signIn(app.t, account(Role.Client), DEMO_PASSWORD);
    const list = await app.t.http
      .get('/api/orders?status=requested')
      .set(bearer(token))
      .expect(200);
    const id = list.body.items[0].id as string;
    const res = await app.t.http
      .post(`/api/orders/${id}/cancel`)
      .set(bearer(token))
      .send({})
      .expect(200);
    expect(res.body.status).toBe('cancelled');
    // 45 days ahead: the 30-day tier refunds everything.
    expect(res.body.paidMinor).toBe(0);
    const refund = await app.t.dataSource
      .getRepository(PaymentEntity)
      .findOneByOrFail({ orderId: id, kind: 'refund' });
    expect(refund).toMatchObject({ status: 'succeeded', seeded: true, providerRefundId: null });
  });
});
