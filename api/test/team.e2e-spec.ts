import { Role } from '@nappe/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { OutboxMessageEntity } from '../src/mail/entities/outbox-message.entity.js';
import { StaffInvitationEntity } from '../src/studio/entities/staff-invitation.entity.js';
import { User } from '../src/users/entities/user.entity.js';
import { bearer, createBookingApp, signedIn, type BookingApp } from './factories/booking.js';
import { GOOD_PASSWORD, signIn, uniqueEmail } from './factories/test-app.js';

/**
 * The studio's team: invitations through the outbox, accepting them, role changes and removal.
 * The token rules follow OWASP ASVS 5.0 (V6.4 one-time secrets: random, single use, expiring;
 * V7.4 sessions end when an account is removed; V8.3 a role change applies at once).
 */

let b: BookingApp;
let chef: Awaited<ReturnType<typeof signedIn>>;
const DAY = 86_400_000;

beforeAll(async () => {
  b = await createBookingApp();
  chef = await signedIn(b.t, Role.Chef);
});
afterAll(async () => b.t.close());

/** Invites through the API and reads the one-time token from the queued e-mail's body. */
async function invite(
  email: string,
  role: 'staff' | 'chef' = 'staff',
  name = 'Rosa Peeters',
): Promise<{ id: string; token: string; message: OutboxMessageEntity }> {
  const res = await b.t.http
    .post('/api/studio/invitations')
    .set(bearer(chef.token))
    .send({ email, name, role })
    .expect(201);
  const message = await b.t.dataSource.getRepository(OutboxMessageEntity).findOneOrFail({
    where: { toAddress: email.toLowerCase(), kind: 'staff_invitation' },
    order: { createdAt: 'DESC' },
  });
  const match = /accept-invitation\?token=([A-Za-z0-9_-]+)/.exec(message.textBody);
  if (!match) throw new Error(`no link in the invitation e-mail: ${message.textBody}`);
  return { id: (res.body as { id: string }).id, token: match[1]!, message };
}

const accept = (token: string, password = GOOD_PASSWORD, name = 'Rosa Peeters') =>
  b.t.http.post('/api/auth/accept-invitation').send({ token, name, password });

describe('invitations', () => {
  it('only the chef invites, lists and revokes (401 / 403 for staff and clients)', async () => {
    await b.t.http.post('/api/studio/invitations').send({}).expect(401);
    for (const role of [Role.Staff, Role.Client]) {
      const who = await signedIn(b.t, role);
      await b.t.http
        .post('/api/studio/invitations')
        .set(bearer(who.token))
        .send({ email: uniqueEmail('x'), name: 'X', role: 'staff' })
        .expect(403);
      await b.t.http.get('/api/studio/invitations').set(bearer(who.token)).expect(403);
      await b.t.http
        .delete('/api/studio/invitations/00000000-0000-4000-8000-000000000000')
        .set(bearer(who.token))
        .expect(403);
    }
  });

  it('refuses a bad invitation body with readable messages (400)', async () => {
    const cases: Array<[Record<string, unknown>, RegExp]> = [
      [{ email: 'not-an-address', name: 'A', role: 'staff' }, /email: Enter an e-mail address/],
      [{ email: uniqueEmail(), name: '', role: 'staff' }, /name: Tell us your name/],
      [
        { email: uniqueEmail(), name: 'A', role: 'client' },
        /role: The role is either staff or chef/,
      ],
      [{ email: uniqueEmail(), name: 'A\r\nBcc: x@y.z', role: 'staff' }, /fit on one line/],
      [{ email: uniqueEmail(), name: 'A', role: 'staff', isAdmin: true }, /Unrecognized key/i],
    ];
    for (const [body, message] of cases) {
      const res = await b.t.http
        .post('/api/studio/invitations')
        .set(bearer(chef.token))
        .send(body)
        .expect(400);
      expect((res.body as { message: string[] }).message.join('\n')).toMatch(message);
    }
  });

  it('sends a one-time link through the outbox; accepting it signs the new staff member in', async () => {
    const email = uniqueEmail('staff');
    const { id, token, message } = await invite(email.toUpperCase());
    // 32 random bytes → 43 base64url characters (RFC 4648 §5, no padding).
    expect(token).toHaveLength(43);
    expect(message.textBody).toContain(
      `${b.t.env.PUBLIC_ADMIN_URL}/accept-invitation?token=${token}`,
    );
    expect(message.status).toBe('pending');
    // Only a hash of the token is stored.
    const row = await b.t.dataSource.getRepository(StaffInvitationEntity).findOneByOrFail({ id });
    expect(row.tokenHash).not.toContain(token);
    expect(row.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(row.expiresAt.getTime() - b.clock.now().getTime()).toBe(7 * DAY);

    const list = await b.t.http.get('/api/studio/invitations').set(bearer(chef.token)).expect(200);
    const listed = (list.body as Array<Record<string, unknown>>).find((i) => i.id === id);
    expect(listed).toMatchObject({ email, role: 'staff', invitedBy: chef.user.name });
    expect(Object.keys(listed!)).not.toContain('tokenHash');

    // The worker really sends it.
    await b.drainOutbox();
    expect(b.mail.sent.some((m) => m.to === email && m.raw.includes('accept-invitation'))).toBe(
      true,
    );

    const res = await accept(token).expect(200);
    const session = res.body as { accessToken: string; user: { role: string; email: string } };
    expect(session.user).toMatchObject({ role: 'staff', email });
    const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
    expect(cookies.some((c) => /^nappe_refresh=.*HttpOnly/i.test(c))).toBe(true);
    const me = await b.t.http.get('/api/auth/me').set(bearer(session.accessToken)).expect(200);
    expect(me.body).toMatchObject({ role: 'staff', name: 'Rosa Peeters' });
    // And the password works for a normal sign-in.
    await signIn(b.t, email, GOOD_PASSWORD);
    // The used invitation is no longer pending.
    const after = await b.t.http.get('/api/studio/invitations').set(bearer(chef.token)).expect(200);
    expect((after.body as Array<{ id: string }>).some((i) => i.id === id)).toBe(false);

    // Reusing the link: 400 with a clear message.
    const reuse = await accept(token).expect(400);
    expect((reuse.body as { message: string[] }).message[0]).toMatch(/already been used/);
  });

  it('refuses an expired, revoked or made-up token (400), and weak passwords', async () => {
    const expired = await invite(uniqueEmail('late'));
    b.clock.advance(7 * DAY);
    const res = await accept(expired.token).expect(400);
    expect((res.body as { message: string[] }).message[0]).toMatch(/has expired/);
    b.clock.advance(-7 * DAY);

    const revoked = await invite(uniqueEmail('revoked'));
    await b.t.http
      .delete(`/api/studio/invitations/${revoked.id}`)
      .set(bearer(chef.token))
      .expect(204);
    await b.t.http
      .delete(`/api/studio/invitations/${revoked.id}`)
      .set(bearer(chef.token))
      .expect(404);
    const r2 = await accept(revoked.token).expect(400);
    expect((r2.body as { message: string[] }).message[0]).toMatch(/withdrawn/);

    const unknown = await accept('A'.repeat(43)).expect(400);
    expect((unknown.body as { message: string[] }).message[0]).toMatch(/not valid/);

    const fresh = await invite(uniqueEmail('weak'));
    const short = await accept(fresh.token, 'short').expect(400);
    expect((short.body as { message: string[] }).message.join()).toMatch(/at least 12 characters/);
    // A common password (zxcvbn's dictionary) is refused, and the link still works afterwards.
    const common = await accept(fresh.token, 'password1234').expect(400);
    expect((common.body as { message: string[] }).message.join()).toMatch(/too easy to guess/);
    await accept(fresh.token).expect(200);
  });

  it('refuses inviting someone who already has an account (409)', async () => {
    const client = await signedIn(b.t, Role.Client);
    const res = await b.t.http
      .post('/api/studio/invitations')
      .set(bearer(chef.token))
      .send({ email: client.user.email, name: 'Client', role: 'staff' })
      .expect(409);
    expect((res.body as { message: string }).message).toMatch(/client account/);
  });
});

describe('roles and removal', () => {
  it('only the chef changes roles and removes members (403 for staff and clients)', async () => {
    const target = await signedIn(b.t, Role.Staff);
    for (const role of [Role.Staff, Role.Client]) {
      const who = await signedIn(b.t, role);
      await b.t.http
        .patch(`/api/users/${target.user.id}/role`)
        .set(bearer(who.token))
        .send({ role: 'chef' })
        .expect(403);
      await b.t.http.delete(`/api/users/${target.user.id}`).set(bearer(who.token)).expect(403);
    }
  });

  it('a role change applies on the member’s next request, with the same token', async () => {
    const staff = await signedIn(b.t, Role.Staff);
    await b.t.http.get('/api/studio/settings').set(bearer(staff.token)).expect(403);
    const res = await b.t.http
      .patch(`/api/users/${staff.user.id}/role`)
      .set(bearer(chef.token))
      .send({ role: 'chef' })
      .expect(200);
    expect(res.body).toMatchObject({ id: staff.user.id, role: 'chef' });
    await b.t.http.get('/api/studio/settings').set(bearer(staff.token)).expect(200);
    await b.t.http
      .patch(`/api/users/${staff.user.id}/role`)
      .set(bearer(chef.token))
      .send({ role: 'staff' })
      .expect(200);
    await b.t.http.get('/api/studio/settings').set(bearer(staff.token)).expect(403);
    await b.t.http
      .patch(`/api/users/${staff.user.id}/role`)
      .set(bearer(chef.token))
      .send({ role: 'client' })
      .expect(400);
    await b.t.http
      .patch(`/api/users/${staff.user.id}/role`)
      .set(bearer(chef.token))
      .send({ role: 'chef', email: 'x@y.z' })
      .expect(400);
  });

  it('removal ends every session of the member at once (401) and keeps the account row', async () => {
    const staff = await signedIn(b.t, Role.Staff);
    const second = await signIn(b.t, staff.user.email, staff.password);
    await b.t.http.get('/api/auth/me').set(bearer(staff.token)).expect(200);
    await b.t.http.delete(`/api/users/${staff.user.id}`).set(bearer(chef.token)).expect(204);
    await b.t.http.get('/api/auth/me').set(bearer(staff.token)).expect(401);
    await b.t.http.get('/api/auth/me').set(bearer(second.token)).expect(401);
    await b.t.http
      .post('/api/auth/refresh')
      .set('Origin', 'http://localhost:5173')
      .set('Cookie', second.cookie)
      .expect(401);
    await b.t.http
      .post('/api/auth/login')
      .send({ email: staff.user.email, password: staff.password })
      .expect(401);
    const row = await b.t.dataSource.getRepository(User).findOneByOrFail({ id: staff.user.id });
    expect(row.removedAt).not.toBeNull();
    // Gone from the team list, and a second removal finds nobody.
    const list = await b.t.http.get('/api/users?pageSize=100').set(bearer(chef.token)).expect(200);
    expect((list.body as { items: Array<{ id: string }> }).items.map((u) => u.id)).not.toContain(
      staff.user.id,
    );
    await b.t.http.delete(`/api/users/${staff.user.id}`).set(bearer(chef.token)).expect(404);
  });

  it('a removed member invited again gets the same account back', async () => {
    const staff = await signedIn(b.t, Role.Staff);
    await b.t.http.delete(`/api/users/${staff.user.id}`).set(bearer(chef.token)).expect(204);
    const { token } = await invite(staff.user.email, 'staff', 'Back Again');
    const res = await accept(token, GOOD_PASSWORD, 'Back Again').expect(200);
    expect((res.body as { user: { id: string } }).user.id).toBe(staff.user.id);
  });

  it('clients are not team members here (409), unknown ids are 404, bad ids 400', async () => {
    const client = await signedIn(b.t, Role.Client);
    await b.t.http
      .patch(`/api/users/${client.user.id}/role`)
      .set(bearer(chef.token))
      .send({ role: 'staff' })
      .expect(409);
    await b.t.http.delete(`/api/users/${client.user.id}`).set(bearer(chef.token)).expect(409);
    await b.t.http.get('/api/auth/me').set(bearer(client.token)).expect(200);
    await b.t.http
      .delete('/api/users/00000000-0000-4000-8000-000000000000')
      .set(bearer(chef.token))
      .expect(404);
    await b.t.http.delete('/api/users/not-a-uuid').set(bearer(chef.token)).expect(400);
  });
});

describe('the last chef', () => {
  it('cannot be demoted or removed (409); with a second chef they can', async () => {
    const solo = await createBookingApp();
    try {
      const only = await signedIn(solo.t, Role.Chef);
      const demote = await solo.t.http
        .patch(`/api/users/${only.user.id}/role`)
        .set(bearer(only.token))
        .send({ role: 'staff' })
        .expect(409);
      expect((demote.body as { message: string }).message).toMatch(/at least one chef/);
      await solo.t.http.delete(`/api/users/${only.user.id}`).set(bearer(only.token)).expect(409);
      await solo.t.http.get('/api/studio/settings').set(bearer(only.token)).expect(200);

      const other = await signedIn(solo.t, Role.Chef);
      await solo.t.http
        .patch(`/api/users/${only.user.id}/role`)
        .set(bearer(only.token))
        .send({ role: 'staff' })
        .expect(200);
      // Now `other` is the last chef.
      await solo.t.http.delete(`/api/users/${other.user.id}`).set(bearer(other.token)).expect(409);
    } finally {
      await solo.t.close();
    }
  });
});

describe('removing oneself', () => {
  it('a chef cannot remove their own account (409), even with a second chef; the other chef can', async () => {
    const solo = await createBookingApp();
    try {
      const first = await signedIn(solo.t, Role.Chef);
      const second = await signedIn(solo.t, Role.Chef);
      const res = await solo.t.http
        .delete(`/api/users/${first.user.id}`)
        .set(bearer(first.token))
        .expect(409);
      expect((res.body as { message: string }).message).toMatch(/your own account/);
      await solo.t.http.get('/api/auth/me').set(bearer(first.token)).expect(200);
      await solo.t.http.delete(`/api/users/${first.user.id}`).set(bearer(second.token)).expect(204);
      await solo.t.http.get('/api/auth/me').set(bearer(first.token)).expect(401);
    } finally {
      await solo.t.close();
    }
  });
});

describe('accept-invitation throttling (as sign-in, OWASP ASVS 5.0 V6.3.1)', () => {
  it('answers 429 with Retry-After after too many attempts from one address', async () => {
    const statuses: number[] = [];
    let retryAfter: string | undefined;
    for (let i = 0; i < 12; i += 1) {
      const res = await accept(`${'B'.repeat(42)}${i % 10}`);
      statuses.push(res.status);
      if (res.status === 429) retryAfter = res.headers['retry-after'] as string | undefined;
    }
    expect(statuses).toContain(429);
    expect(statuses.filter((s) => s !== 429).every((s) => s === 400 || s === 200)).toBe(true);
    expect(Number(retryAfter)).toBeGreaterThan(0);
  });
});
